import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";
import type * as GeoJSON from "geojson";

/** Base layers a park owns for its map: boundary, lifts, roads, summit/base points, contours. */
export type ParkMapLayers = { [layer: string]: GeoJSON.FeatureCollection | undefined };

export class Park extends Model<InferAttributes<Park>, InferCreationAttributes<Park>> {
  declare id: CreationOptional<string>;
  declare slug: string;
  declare name: string;
  declare timeZone: string;
  declare centerLon: number;
  declare centerLat: number;
  declare baseElevationM: number;
  declare summitElevationM: number;
  declare fictional: CreationOptional<boolean>;
  declare mapLayers: CreationOptional<ParkMapLayers>;
  declare contactEmail: CreationOptional<string | null>;
  declare websiteUrl: CreationOptional<string | null>;
  /** Optimistic lock for the settings form: bumped on every settings change. */
  declare lockVersion: CreationOptional<number>;
  /** Origins allowed to frame the park's status card (`https://example.org`). */
  declare embedOrigins: CreationOptional<string[]>;
  /** Rain (mm in 24 h) at which the morning check shows a caution; the ranger decides. */
  declare rainThresholdMm: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Park.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(100), allowNull: false },
    timeZone: { type: DataTypes.STRING(64), allowNull: false },
    centerLon: { type: DataTypes.DOUBLE, allowNull: false },
    centerLat: { type: DataTypes.DOUBLE, allowNull: false },
    baseElevationM: { type: DataTypes.INTEGER, allowNull: false },
    summitElevationM: { type: DataTypes.INTEGER, allowNull: false },
    fictional: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    mapLayers: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    contactEmail: { type: DataTypes.STRING(254), allowNull: true },
    websiteUrl: { type: DataTypes.STRING(300), allowNull: true },
    lockVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    embedOrigins: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    rainThresholdMm: { type: DataTypes.REAL, allowNull: false, defaultValue: 10 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "parks", underscored: true },
);
