import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** A park-wide state ("whole park closed: lightning", "opens at 10:00") that overrides trail status while it lasts. */
export class ParkState extends Model<InferAttributes<ParkState>, InferCreationAttributes<ParkState>> {
  declare id: CreationOptional<string>;
  declare parkId: string;
  declare state: "closed" | "delayed" | "advisory";
  declare message: string;
  declare startsAt: CreationOptional<Date>;
  declare endsAt: Date | null;
  declare clearedAt: CreationOptional<Date | null>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

ParkState.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    parkId: { type: DataTypes.UUID, allowNull: false },
    state: { type: DataTypes.STRING(16), allowNull: false },
    message: { type: DataTypes.STRING(300), allowNull: false },
    startsAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    endsAt: { type: DataTypes.DATE, allowNull: true },
    clearedAt: { type: DataTypes.DATE, allowNull: true },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "park_states", underscored: true },
);
