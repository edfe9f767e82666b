import { DataTypes, type QueryInterface } from "sequelize";
import { ref, timestamps, uuidId as id } from "@/models/migration-columns";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      "trails",
      {
        id,
        park_id: ref("parks"),
        name: { type: DataTypes.STRING(80), allowNull: false },
        difficulty: { type: DataTypes.STRING(16), allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        direction: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "downhill" },
        geometry: { type: DataTypes.JSONB, allowNull: false },
        simplified: { type: DataTypes.JSONB, allowNull: false },
        profile: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        length_m: { type: DataTypes.DOUBLE, allowNull: false },
        ascent_m: { type: DataTypes.DOUBLE, allowNull: true },
        descent_m: { type: DataTypes.DOUBLE, allowNull: true },
        avg_grade_pct: { type: DataTypes.DOUBLE, allowNull: true },
        max_grade_pct: { type: DataTypes.DOUBLE, allowNull: true },
        min_elevation_m: { type: DataTypes.DOUBLE, allowNull: true },
        max_elevation_m: { type: DataTypes.DOUBLE, allowNull: true },
        suggested_difficulty: { type: DataTypes.STRING(16), allowNull: true },
        min_lon: { type: DataTypes.DOUBLE, allowNull: false },
        min_lat: { type: DataTypes.DOUBLE, allowNull: false },
        max_lon: { type: DataTypes.DOUBLE, allowNull: false },
        max_lat: { type: DataTypes.DOUBLE, allowNull: false },
        point_count: { type: DataTypes.INTEGER, allowNull: false },
        current_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        archived_at: { type: DataTypes.DATE, allowNull: true },
        created_by: ref("users", "SET NULL", true),
        lock_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("trails", ["park_id", "archived_at", "name"], { transaction });
    await qi.createTable(
      "trail_versions",
      {
        id,
        trail_id: ref("trails"),
        version_no: { type: DataTypes.INTEGER, allowNull: false },
        source_format: { type: DataTypes.STRING(8), allowNull: false },
        source_filename: { type: DataTypes.STRING(200), allowNull: false },
        source_bytes: { type: DataTypes.BLOB, allowNull: false },
        geometry: { type: DataTypes.JSONB, allowNull: false },
        stats: { type: DataTypes.JSONB, allowNull: false },
        uploaded_by: ref("users", "SET NULL", true),
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("trail_versions", ["trail_id", "version_no"], { unique: true, transaction });
    await qi.createTable(
      "trail_features",
      {
        id,
        trail_id: ref("trails"),
        kind: { type: DataTypes.STRING(20), allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: true },
        size: { type: DataTypes.STRING(8), allowNull: true },
        lon: { type: DataTypes.DOUBLE, allowNull: false },
        lat: { type: DataTypes.DOUBLE, allowNull: false },
        distance_along_m: { type: DataTypes.DOUBLE, allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("trail_features", ["trail_id", "distance_along_m"], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ["trail_features", "trail_versions", "trails"]) await qi.dropTable(table);
}
