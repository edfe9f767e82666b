import { DataTypes, type QueryInterface } from "sequelize";
import { ref } from "@/models/migration-columns";

/**
 * Weather per park, written only by the worker (lib/weather): the hours it has seen (past and
 * forecast, overwritten by later fetches, kept for the history page) and the last fetch of each
 * park (its "now" values, when, and the last error). The park's rain caution level joins the parks.
 * The CHECKs repeat the driver's bounds, so no bad value is stored even by a later bug.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.addColumn("parks", "rain_threshold_mm", { type: DataTypes.REAL, allowNull: false, defaultValue: 10 }, { transaction });
    await qi.createTable(
      "weather_hours",
      {
        park_id: { ...ref("parks"), primaryKey: true },
        at: { type: DataTypes.DATE, allowNull: false, primaryKey: true },
        temperature_c: { type: DataTypes.REAL, allowNull: true },
        precipitation_mm: { type: DataTypes.REAL, allowNull: true },
      },
      { transaction },
    );
    await qi.createTable(
      "park_weather",
      {
        park_id: { ...ref("parks"), primaryKey: true },
        measured_at: { type: DataTypes.DATE, allowNull: true },
        temperature_now_c: { type: DataTypes.REAL, allowNull: true },
        sunrise: { type: DataTypes.DATE, allowNull: true },
        fetched_at: { type: DataTypes.DATE, allowNull: true },
        last_attempt_at: { type: DataTypes.DATE, allowNull: false },
        last_error: { type: DataTypes.STRING(300), allowNull: true },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE weather_hours ADD CONSTRAINT weather_hours_bounds CHECK (temperature_c BETWEEN -60 AND 60 AND precipitation_mm BETWEEN 0 AND 500);
       ALTER TABLE park_weather ADD CONSTRAINT park_weather_bounds CHECK (temperature_now_c BETWEEN -60 AND 60);
       ALTER TABLE parks ADD CONSTRAINT parks_rain_threshold_bounds CHECK (rain_threshold_mm > 0 AND rain_threshold_mm <= 500);`,
      { transaction },
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable("park_weather", { transaction });
    await qi.dropTable("weather_hours", { transaction });
    await qi.sequelize.query("ALTER TABLE parks DROP CONSTRAINT IF EXISTS parks_rain_threshold_bounds", { transaction });
    await qi.removeColumn("parks", "rain_threshold_mm", { transaction });
  });
}
