import { DataTypes, type QueryInterface } from "sequelize";
import { timestamps, uuidId as id } from "@/models/migration-columns";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      "users",
      {
        id,
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        password_hash: { type: DataTypes.STRING(100), allowNull: false },
        site_role: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "rider" },
        units: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        disabled_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.createTable(
      "parks",
      {
        id,
        slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(100), allowNull: false },
        time_zone: { type: DataTypes.STRING(64), allowNull: false },
        center_lon: { type: DataTypes.DOUBLE, allowNull: false },
        center_lat: { type: DataTypes.DOUBLE, allowNull: false },
        base_elevation_m: { type: DataTypes.INTEGER, allowNull: false },
        summit_elevation_m: { type: DataTypes.INTEGER, allowNull: false },
        fictional: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        map_layers: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        ...timestamps,
      },
      { transaction },
    );
    await qi.createTable(
      "park_memberships",
      {
        id,
        park_id: { type: DataTypes.UUID, allowNull: false, references: { model: "parks", key: "id" }, onDelete: "CASCADE" },
        user_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
        role: { type: DataTypes.STRING(16), allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("park_memberships", ["park_id", "user_id"], { unique: true, transaction });
    await qi.addIndex("park_memberships", ["user_id"], { transaction });
    await qi.createTable(
      "invitations",
      {
        id,
        park_id: { type: DataTypes.UUID, allowNull: false, references: { model: "parks", key: "id" }, onDelete: "CASCADE" },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        invited_by: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
        expires_at: { type: DataTypes.DATE, allowNull: false },
        accepted_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.createTable(
      "sign_in_attempts",
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        email: { type: DataTypes.STRING(254), allowNull: false },
        ip: { type: DataTypes.STRING(64), allowNull: false },
        succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
        attempted_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("sign_in_attempts", ["email", "attempted_at"], { transaction });
    await qi.addIndex("sign_in_attempts", ["ip", "attempted_at"], { transaction });
    await qi.createTable(
      "audit_events",
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        park_id: { type: DataTypes.UUID, allowNull: true, references: { model: "parks", key: "id" }, onDelete: "CASCADE" },
        actor_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
        action: { type: DataTypes.STRING(64), allowNull: false },
        subject_type: { type: DataTypes.STRING(32), allowNull: true },
        subject_id: { type: DataTypes.STRING(64), allowNull: true },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("audit_events", ["park_id", "created_at"], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ["audit_events", "sign_in_attempts", "invitations", "park_memberships", "parks", "users"]) {
    await qi.dropTable(table);
  }
}
