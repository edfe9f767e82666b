import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";
import type * as GeoJSON from "geojson";

/** What one of a park's ground layers held before an upload replaced it or a manager cleared it. */
export class ParkLayerVersion extends Model<InferAttributes<ParkLayerVersion>, InferCreationAttributes<ParkLayerVersion>> {
  declare id: CreationOptional<string>;
  declare parkId: string;
  declare layer: string;
  declare geojson: GeoJSON.FeatureCollection | null;
  declare replacedBy: string | null;
  declare replacedAt: CreationOptional<Date>;
}

ParkLayerVersion.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    parkId: { type: DataTypes.UUID, allowNull: false },
    layer: { type: DataTypes.STRING(16), allowNull: false },
    geojson: { type: DataTypes.JSONB, allowNull: true },
    replacedBy: { type: DataTypes.UUID, allowNull: true },
    replacedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: "park_layer_versions", underscored: true, timestamps: false },
);
