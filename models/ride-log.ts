import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** What a rider ran and how it felt, with the one suggested baseline change it produced. */
export class RideLog extends Model<InferAttributes<RideLog>, InferCreationAttributes<RideLog>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare setupId: string | null;
  declare parkId: string | null;
  declare riddenOn: string;
  declare trailIds: CreationOptional<string[]>;
  declare frontKpa: number;
  declare rearKpa: number;
  declare symptoms: { front: string[]; rear: string[] };
  declare note: string | null;
  declare suggestion: Record<string, unknown> | null;
  declare surfaces: CreationOptional<string[]>;
  declare appliedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
}

RideLog.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    userId: { type: DataTypes.UUID, allowNull: false },
    setupId: { type: DataTypes.UUID, allowNull: true },
    parkId: { type: DataTypes.UUID, allowNull: true },
    riddenOn: { type: DataTypes.DATEONLY, allowNull: false },
    trailIds: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    frontKpa: { type: DataTypes.DOUBLE, allowNull: false },
    rearKpa: { type: DataTypes.DOUBLE, allowNull: false },
    symptoms: { type: DataTypes.JSONB, allowNull: false },
    note: { type: DataTypes.STRING(1000), allowNull: true },
    suggestion: { type: DataTypes.JSONB, allowNull: true },
    surfaces: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    appliedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: "ride_logs", underscored: true, updatedAt: false },
);
