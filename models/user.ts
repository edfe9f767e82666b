import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export type SiteRole = "admin" | "rider";
export type UnitPrefs = { pressure?: "psi" | "bar" | "kPa"; mass?: "kg" | "lb"; distance?: "metric" | "imperial" };

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare siteRole: CreationOptional<SiteRole>;
  declare units: CreationOptional<UnitPrefs>;
  declare disabledAt: Date | null;
  /** When the owner opened the link mailed to this address; null until then (no sign-in). */
  declare emailVerifiedAt: CreationOptional<Date | null>;
  /** Sessions carry the version they were issued under; bumping it ends every earlier session. */
  declare sessionVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

User.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    siteRole: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "rider" },
    units: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    disabledAt: { type: DataTypes.DATE, allowNull: true },
    emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
    sessionVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "users", underscored: true },
);
