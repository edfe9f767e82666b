import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";
import type * as GeoJSON from "geojson";

/** Every uploaded line of a trail, with the original file, so a replacement never loses the earlier one. */
export class TrailVersion extends Model<InferAttributes<TrailVersion>, InferCreationAttributes<TrailVersion>> {
  declare id: CreationOptional<string>;
  declare trailId: string;
  declare versionNo: number;
  declare sourceFormat: "gpx" | "geojson";
  declare sourceFilename: string;
  declare sourceBytes: Buffer;
  declare geometry: GeoJSON.LineString | GeoJSON.MultiLineString;
  declare stats: Record<string, unknown>;
  declare uploadedBy: string | null;
  declare createdAt: CreationOptional<Date>;
}

TrailVersion.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    trailId: { type: DataTypes.UUID, allowNull: false },
    versionNo: { type: DataTypes.INTEGER, allowNull: false },
    sourceFormat: { type: DataTypes.STRING(8), allowNull: false },
    sourceFilename: { type: DataTypes.STRING(200), allowNull: false },
    sourceBytes: { type: DataTypes.BLOB, allowNull: false },
    geometry: { type: DataTypes.JSONB, allowNull: false },
    stats: { type: DataTypes.JSONB, allowNull: false },
    uploadedBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: "trail_versions", underscored: true, updatedAt: false },
);
