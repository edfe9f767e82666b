import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** A rider's bike as ridden. Wheel, baseline and suspension parts are validated JSON (lib/pressure/pure/schemas.ts). */
export class Setup extends Model<InferAttributes<Setup>, InferCreationAttributes<Setup>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare name: string;
  declare riderMassKg: number;
  declare bikeMassKg: number;
  declare pace: string;
  declare front: Record<string, unknown>;
  declare rear: Record<string, unknown>;
  declare baseline: Record<string, unknown> | null;
  declare suspension: Record<string, unknown> | null;
  declare lockVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Setup.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    userId: { type: DataTypes.UUID, allowNull: false },
    name: { type: DataTypes.STRING(60), allowNull: false },
    riderMassKg: { type: DataTypes.DOUBLE, allowNull: false },
    bikeMassKg: { type: DataTypes.DOUBLE, allowNull: false },
    pace: { type: DataTypes.STRING(8), allowNull: false },
    front: { type: DataTypes.JSONB, allowNull: false },
    rear: { type: DataTypes.JSONB, allowNull: false },
    baseline: { type: DataTypes.JSONB, allowNull: true },
    suspension: { type: DataTypes.JSONB, allowNull: true },
    lockVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "setups", underscored: true, version: "lockVersion" },
);
