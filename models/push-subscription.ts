import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** One browser's Web Push subscription to a park's notices (all trails when trailIds is null). */
export class PushSubscription extends Model<InferAttributes<PushSubscription>, InferCreationAttributes<PushSubscription>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare parkId: string;
  /** The push service's URL for this browser (RFC 8030 §5). */
  declare endpoint: string;
  /** The browser's P-256 public key and auth secret, base64url (RFC 8291 §3). */
  declare p256dh: string;
  declare auth: string;
  declare trailIds: string[] | null;
  declare kinds: string[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

PushSubscription.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    userId: { type: DataTypes.UUID, allowNull: false },
    parkId: { type: DataTypes.UUID, allowNull: false },
    endpoint: { type: DataTypes.STRING(1000), allowNull: false },
    p256dh: { type: DataTypes.STRING(200), allowNull: false },
    auth: { type: DataTypes.STRING(100), allowNull: false },
    trailIds: { type: DataTypes.JSONB, allowNull: true },
    kinds: { type: DataTypes.JSONB, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "push_subscriptions", underscored: true },
);
