import { DataTypes, type QueryInterface } from "sequelize";
import { ref, timestamps, uuidId as id } from "@/models/migration-columns";

/**
 * Web Push alerts: one row per browser and park (the endpoint and keys its push service gave it),
 * and the deliveries table learns its channel. A push delivery points at its subscription; when
 * the push service says the subscription is gone the row is removed and the delivery, failed,
 * stays for staff to see (SET NULL). One e-mail per (notice, rider), one push per (notice, browser).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      "push_subscriptions",
      {
        id,
        user_id: ref("users"),
        park_id: ref("parks"),
        endpoint: { type: DataTypes.STRING(1000), allowNull: false },
        p256dh: { type: DataTypes.STRING(200), allowNull: false },
        auth: { type: DataTypes.STRING(100), allowNull: false },
        trail_ids: { type: DataTypes.JSONB, allowNull: true },
        kinds: { type: DataTypes.JSONB, allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("push_subscriptions", ["park_id", "endpoint"], { unique: true, transaction });
    await qi.addIndex("push_subscriptions", ["user_id"], { transaction });
    await qi.addColumn("notice_deliveries", "channel", { type: DataTypes.STRING(8), allowNull: false, defaultValue: "email" }, { transaction });
    await qi.addColumn("notice_deliveries", "push_subscription_id", ref("push_subscriptions", "SET NULL", true), { transaction });
    await qi.removeIndex("notice_deliveries", ["notice_id", "user_id"], { transaction });
    await qi.sequelize.query(`CREATE UNIQUE INDEX notice_deliveries_one_email ON notice_deliveries (notice_id, user_id) WHERE channel = 'email'`, { transaction });
    await qi.sequelize.query(`CREATE UNIQUE INDEX notice_deliveries_one_push ON notice_deliveries (notice_id, push_subscription_id) WHERE channel = 'push'`, { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query(`DELETE FROM notice_deliveries WHERE channel <> 'email'`, { transaction });
    await qi.sequelize.query("DROP INDEX IF EXISTS notice_deliveries_one_push", { transaction });
    await qi.sequelize.query("DROP INDEX IF EXISTS notice_deliveries_one_email", { transaction });
    await qi.addIndex("notice_deliveries", ["notice_id", "user_id"], { unique: true, transaction });
    await qi.removeColumn("notice_deliveries", "push_subscription_id", { transaction });
    await qi.removeColumn("notice_deliveries", "channel", { transaction });
    await qi.dropTable("push_subscriptions", { transaction });
  });
}
