import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export type ParkRole = "manager" | "ranger";

export class ParkMembership extends Model<InferAttributes<ParkMembership>, InferCreationAttributes<ParkMembership>> {
  declare id: CreationOptional<string>;
  declare parkId: string;
  declare userId: string;
  declare role: ParkRole;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ParkMembership.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    parkId: { type: DataTypes.UUID, allowNull: false },
    userId: { type: DataTypes.UUID, allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "park_memberships", underscored: true },
);
