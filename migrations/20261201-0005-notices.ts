import { DataTypes, type QueryInterface } from "sequelize";
import { ref, timestamps, uuidId as id } from "@/models/migration-columns";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      "subscriptions",
      {
        id,
        user_id: ref("users"),
        park_id: ref("parks"),
        email: { type: DataTypes.STRING(254), allowNull: false },
        trail_ids: { type: DataTypes.JSONB, allowNull: true },
        kinds: { type: DataTypes.JSONB, allowNull: false, defaultValue: ["closure", "reopening", "advisory"] },
        confirmed_at: { type: DataTypes.DATE, allowNull: true },
        unsubscribed_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("subscriptions", ["user_id", "park_id"], { unique: true, transaction });
    await qi.addIndex("subscriptions", ["park_id", "confirmed_at", "unsubscribed_at"], { transaction });
    await qi.createTable(
      "notices",
      {
        id,
        park_id: ref("parks"),
        kind: { type: DataTypes.STRING(16), allowNull: false },
        trail_ids: { type: DataTypes.JSONB, allowNull: true },
        subject: { type: DataTypes.STRING(150), allowNull: false },
        message: { type: DataTypes.STRING(4000), allowNull: false },
        closed_until: { type: DataTypes.DATE, allowNull: true },
        recipient_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        created_by: ref("users", "SET NULL", true),
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("notices", ["park_id", "created_at"], { transaction });
    await qi.createTable(
      "notice_deliveries",
      {
        id,
        notice_id: ref("notices"),
        user_id: ref("users"),
        email: { type: DataTypes.STRING(254), allowNull: false },
        state: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "queued" },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        last_error: { type: DataTypes.STRING(500), allowNull: true },
        message_id: { type: DataTypes.STRING(200), allowNull: false },
        claimed_at: { type: DataTypes.DATE, allowNull: true },
        claimed_by: { type: DataTypes.STRING(64), allowNull: true },
        sent_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("notice_deliveries", ["notice_id", "user_id"], { unique: true, transaction });
    await qi.addIndex("notice_deliveries", ["notice_id", "state"], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ["notice_deliveries", "notices", "subscriptions"]) await qi.dropTable(table);
}
