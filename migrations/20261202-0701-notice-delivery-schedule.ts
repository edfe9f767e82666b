import { DataTypes, type QueryInterface } from "sequelize";

/**
 * The deliveries table is the notice queue (transactional outbox): each row knows when it
 * is next due, and partial indexes keep the worker's claim query cheap at any table size.
 * Subscriptions remember when the confirmation link was last mailed, to throttle resends.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.addColumn(
      "notice_deliveries",
      "next_attempt_at",
      { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      { transaction },
    );
    await qi.sequelize.query(
      `CREATE INDEX notice_deliveries_due ON notice_deliveries (next_attempt_at) WHERE state IN ('queued', 'retrying')`,
      { transaction },
    );
    await qi.sequelize.query(`CREATE INDEX notice_deliveries_in_flight ON notice_deliveries (claimed_at) WHERE state = 'sending'`, { transaction });
    await qi.addColumn("subscriptions", "confirmation_sent_at", { type: DataTypes.DATE, allowNull: true }, { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.removeColumn("subscriptions", "confirmation_sent_at", { transaction });
    await qi.sequelize.query("DROP INDEX IF EXISTS notice_deliveries_in_flight", { transaction });
    await qi.sequelize.query("DROP INDEX IF EXISTS notice_deliveries_due", { transaction });
    await qi.removeColumn("notice_deliveries", "next_attempt_at", { transaction });
  });
}
