import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** A built feature on a trail (berm, jump, drop…), snapped to the line with its distance along it. */
export class TrailFeature extends Model<InferAttributes<TrailFeature>, InferCreationAttributes<TrailFeature>> {
  declare id: CreationOptional<string>;
  declare trailId: string;
  declare kind: string;
  declare name: string | null;
  declare size: "small" | "medium" | "large" | null;
  declare lon: number;
  declare lat: number;
  declare distanceAlongM: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

TrailFeature.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    trailId: { type: DataTypes.UUID, allowNull: false },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: true },
    size: { type: DataTypes.STRING(8), allowNull: true },
    lon: { type: DataTypes.DOUBLE, allowNull: false },
    lat: { type: DataTypes.DOUBLE, allowNull: false },
    distanceAlongM: { type: DataTypes.DOUBLE, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "trail_features", underscored: true },
);
