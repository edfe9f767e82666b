import { DataTypes, type QueryInterface } from "sequelize";
import { ref, timestamps, uuidId as id } from "@/models/migration-columns";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    // One row per revision; exactly one current revision per trail and park-local date.
    await qi.createTable(
      "trail_reports",
      {
        id,
        trail_id: ref("trails"),
        park_id: ref("parks"),
        report_date: { type: DataTypes.DATEONLY, allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        is_current: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        status: { type: DataTypes.STRING(8), allowNull: false },
        reason: { type: DataTypes.STRING(200), allowNull: true },
        surfaces: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        features: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        note: { type: DataTypes.STRING(1000), allowNull: true },
        reporter_id: ref("users", "SET NULL", true),
        reported_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("trail_reports", ["trail_id", "report_date", "revision"], { unique: true, transaction });
    await qi.addIndex("trail_reports", ["trail_id", "report_date"], {
      unique: true,
      where: { is_current: true },
      name: "trail_reports_one_current",
      transaction,
    });
    await qi.addIndex("trail_reports", ["park_id", "report_date"], { where: { is_current: true }, name: "trail_reports_board", transaction });

    await qi.createTable(
      "park_states",
      {
        id,
        park_id: ref("parks"),
        state: { type: DataTypes.STRING(16), allowNull: false },
        message: { type: DataTypes.STRING(300), allowNull: false },
        starts_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        ends_at: { type: DataTypes.DATE, allowNull: true },
        cleared_at: { type: DataTypes.DATE, allowNull: true },
        created_by: ref("users", "SET NULL", true),
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("park_states", ["park_id", "cleared_at"], { transaction });

    await qi.createTable(
      "hazards",
      {
        id,
        park_id: ref("parks"),
        trail_id: ref("trails", "SET NULL", true),
        kind: { type: DataTypes.STRING(24), allowNull: false },
        note: { type: DataTypes.STRING(1000), allowNull: true },
        lon: { type: DataTypes.DOUBLE, allowNull: false },
        lat: { type: DataTypes.DOUBLE, allowNull: false },
        reported_by: ref("users", "SET NULL", true),
        reported_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        resolved_at: { type: DataTypes.DATE, allowNull: true },
        resolved_by: ref("users", "SET NULL", true),
        lock_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("hazards", ["park_id", "resolved_at"], { transaction });

    await qi.createTable(
      "photos",
      {
        id,
        hazard_id: ref("hazards"),
        storage_key: { type: DataTypes.STRING(200), allowNull: false },
        thumb_key: { type: DataTypes.STRING(200), allowNull: false },
        content_type: { type: DataTypes.STRING(32), allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        uploaded_by: ref("users", "SET NULL", true),
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("photos", ["hazard_id"], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ["photos", "hazards", "park_states", "trail_reports"]) await qi.dropTable(table);
}
