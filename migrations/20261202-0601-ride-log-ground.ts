import { DataTypes, type QueryInterface } from "sequelize";

/**
 * Ride logs keep the ground they were ridden on (the baseline's reference when a setup gets its
 * first baseline from a ride) and when their suggestion was applied (so it is applied once).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.addColumn("ride_logs", "surfaces", { type: DataTypes.JSONB, allowNull: false, defaultValue: [] }, { transaction });
    await qi.addColumn("ride_logs", "applied_at", { type: DataTypes.DATE, allowNull: true }, { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.removeColumn("ride_logs", "applied_at", { transaction });
    await qi.removeColumn("ride_logs", "surfaces", { transaction });
  });
}
