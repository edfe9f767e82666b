import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export class Hazard extends Model<InferAttributes<Hazard>, InferCreationAttributes<Hazard>> {
  declare id: CreationOptional<string>;
  declare parkId: string;
  declare trailId: string | null;
  declare kind: string;
  declare note: string | null;
  declare lon: number;
  declare lat: number;
  declare reportedBy: string | null;
  declare reportedAt: CreationOptional<Date>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare resolvedBy: CreationOptional<string | null>;
  declare lockVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Hazard.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    parkId: { type: DataTypes.UUID, allowNull: false },
    trailId: { type: DataTypes.UUID, allowNull: true },
    kind: { type: DataTypes.STRING(24), allowNull: false },
    note: { type: DataTypes.STRING(1000), allowNull: true },
    lon: { type: DataTypes.DOUBLE, allowNull: false },
    lat: { type: DataTypes.DOUBLE, allowNull: false },
    reportedBy: { type: DataTypes.UUID, allowNull: true },
    reportedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    resolvedAt: { type: DataTypes.DATE, allowNull: true },
    resolvedBy: { type: DataTypes.UUID, allowNull: true },
    lockVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "hazards", underscored: true, version: "lockVersion" },
);
