import { DataTypes, type QueryInterface } from "sequelize";
import { ref, timestamps, uuidId as id } from "@/models/migration-columns";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      "setups",
      {
        id,
        user_id: ref("users"),
        name: { type: DataTypes.STRING(60), allowNull: false },
        rider_mass_kg: { type: DataTypes.DOUBLE, allowNull: false },
        bike_mass_kg: { type: DataTypes.DOUBLE, allowNull: false },
        pace: { type: DataTypes.STRING(8), allowNull: false },
        front: { type: DataTypes.JSONB, allowNull: false },
        rear: { type: DataTypes.JSONB, allowNull: false },
        baseline: { type: DataTypes.JSONB, allowNull: true },
        suspension: { type: DataTypes.JSONB, allowNull: true },
        lock_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("setups", ["user_id"], { transaction });
    await qi.createTable(
      "ride_logs",
      {
        id,
        user_id: ref("users"),
        setup_id: ref("setups", "SET NULL", true),
        park_id: ref("parks", "SET NULL", true),
        ridden_on: { type: DataTypes.DATEONLY, allowNull: false },
        trail_ids: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        front_kpa: { type: DataTypes.DOUBLE, allowNull: false },
        rear_kpa: { type: DataTypes.DOUBLE, allowNull: false },
        symptoms: { type: DataTypes.JSONB, allowNull: false },
        note: { type: DataTypes.STRING(1000), allowNull: true },
        suggestion: { type: DataTypes.JSONB, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("ride_logs", ["user_id", "ridden_on"], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ["ride_logs", "setups"]) await qi.dropTable(table);
}
