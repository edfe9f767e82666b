import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** A rider's subscription to a park's notices (all trails when trailIds is null). Double opt-in. */
export class Subscription extends Model<InferAttributes<Subscription>, InferCreationAttributes<Subscription>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare parkId: string;
  declare email: string;
  declare trailIds: string[] | null;
  declare kinds: CreationOptional<string[]>;
  declare confirmedAt: CreationOptional<Date | null>;
  declare unsubscribedAt: CreationOptional<Date | null>;
  declare confirmationSentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Subscription.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    userId: { type: DataTypes.UUID, allowNull: false },
    parkId: { type: DataTypes.UUID, allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false },
    trailIds: { type: DataTypes.JSONB, allowNull: true },
    kinds: { type: DataTypes.JSONB, allowNull: false, defaultValue: ["closure", "reopening", "advisory"] },
    confirmedAt: { type: DataTypes.DATE, allowNull: true },
    unsubscribedAt: { type: DataTypes.DATE, allowNull: true },
    confirmationSentAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "subscriptions", underscored: true },
);
