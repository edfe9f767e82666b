import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare parkId: string | null;
  declare actorId: string | null;
  declare action: string;
  declare subjectType: string | null;
  declare subjectId: string | null;
  declare data: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;
}

AuditEvent.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    parkId: { type: DataTypes.UUID, allowNull: true },
    actorId: { type: DataTypes.UUID, allowNull: true },
    action: { type: DataTypes.STRING(64), allowNull: false },
    subjectType: { type: DataTypes.STRING(32), allowNull: true },
    subjectId: { type: DataTypes.STRING(64), allowNull: true },
    data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    createdAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: "audit_events", underscored: true, updatedAt: false },
);
