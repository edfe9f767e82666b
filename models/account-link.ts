import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export type AccountLinkPurpose = "prove-address" | "password-reset" | "change-email";

/** A single-use link e-mailed to an account holder; only the token's SHA-256 is stored. */
export class AccountLink extends Model<InferAttributes<AccountLink>, InferCreationAttributes<AccountLink>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare purpose: AccountLinkPurpose;
  declare tokenHash: string;
  declare newEmail: string | null;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
}

AccountLink.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    userId: { type: DataTypes.UUID, allowNull: false },
    purpose: { type: DataTypes.STRING(24), allowNull: false },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    newEmail: { type: DataTypes.STRING(254), allowNull: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: "account_links", underscored: true, updatedAt: false },
);
