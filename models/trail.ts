import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";
import type * as GeoJSON from "geojson";

export type ProfilePoint = { dM: number; eleM: number };

/** A trail's current line and its computed stats; earlier lines live in TrailVersion. */
export class Trail extends Model<InferAttributes<Trail>, InferCreationAttributes<Trail>> {
  declare id: CreationOptional<string>;
  declare parkId: string;
  declare name: string;
  declare difficulty: string;
  declare kind: string;
  declare direction: CreationOptional<string>;
  declare geometry: GeoJSON.LineString | GeoJSON.MultiLineString;
  declare simplified: GeoJSON.LineString | GeoJSON.MultiLineString;
  declare profile: CreationOptional<ProfilePoint[]>;
  declare lengthM: number;
  declare ascentM: number | null;
  declare descentM: number | null;
  declare avgGradePct: number | null;
  declare maxGradePct: number | null;
  declare minElevationM: number | null;
  declare maxElevationM: number | null;
  declare suggestedDifficulty: string | null;
  declare minLon: number;
  declare minLat: number;
  declare maxLon: number;
  declare maxLat: number;
  declare pointCount: number;
  declare currentVersion: CreationOptional<number>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdBy: string | null;
  declare lockVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const double = (allowNull = true) => ({ type: DataTypes.DOUBLE, allowNull });

Trail.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    parkId: { type: DataTypes.UUID, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    difficulty: { type: DataTypes.STRING(16), allowNull: false },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    direction: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "downhill" },
    geometry: { type: DataTypes.JSONB, allowNull: false },
    simplified: { type: DataTypes.JSONB, allowNull: false },
    profile: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    lengthM: double(false),
    ascentM: double(),
    descentM: double(),
    avgGradePct: double(),
    maxGradePct: double(),
    minElevationM: double(),
    maxElevationM: double(),
    suggestedDifficulty: { type: DataTypes.STRING(16), allowNull: true },
    minLon: double(false),
    minLat: double(false),
    maxLon: double(false),
    maxLat: double(false),
    pointCount: { type: DataTypes.INTEGER, allowNull: false },
    currentVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    archivedAt: { type: DataTypes.DATE, allowNull: true },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    lockVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "trails", underscored: true, version: "lockVersion" },
);
