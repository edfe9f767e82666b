import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/**
 * One revision of one trail's inspection on one park-local date. Corrections add a
 * revision and move `isCurrent`; history is never overwritten.
 */
export class TrailReport extends Model<InferAttributes<TrailReport>, InferCreationAttributes<TrailReport>> {
  declare id: CreationOptional<string>;
  declare trailId: string;
  declare parkId: string;
  declare reportDate: string;
  declare revision: CreationOptional<number>;
  declare isCurrent: CreationOptional<boolean>;
  declare status: "open" | "caution" | "closed";
  declare reason: string | null;
  declare surfaces: string[];
  declare features: Record<string, string>;
  declare note: string | null;
  declare reporterId: string | null;
  declare reportedAt: CreationOptional<Date>;
  declare createdAt: CreationOptional<Date>;
}

TrailReport.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    trailId: { type: DataTypes.UUID, allowNull: false },
    parkId: { type: DataTypes.UUID, allowNull: false },
    reportDate: { type: DataTypes.DATEONLY, allowNull: false },
    revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    isCurrent: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    status: { type: DataTypes.STRING(8), allowNull: false },
    reason: { type: DataTypes.STRING(200), allowNull: true },
    surfaces: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    features: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    note: { type: DataTypes.STRING(1000), allowNull: true },
    reporterId: { type: DataTypes.UUID, allowNull: true },
    reportedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: "trail_reports", underscored: true, updatedAt: false },
);
