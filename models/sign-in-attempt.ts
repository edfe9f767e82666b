import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export class SignInAttempt extends Model<InferAttributes<SignInAttempt>, InferCreationAttributes<SignInAttempt>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare ip: string;
  declare succeeded: boolean;
  declare attemptedAt: CreationOptional<Date>;
}

SignInAttempt.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.STRING(254), allowNull: false },
    ip: { type: DataTypes.STRING(64), allowNull: false },
    succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
    attemptedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: "sign_in_attempts", underscored: true, timestamps: false },
);
