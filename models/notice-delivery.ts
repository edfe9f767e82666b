import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export type DeliveryState = "queued" | "sending" | "sent" | "retrying" | "failed";
export type DeliveryChannel = "email" | "push";

/**
 * One notice to one rider by one channel: an e-mail (unique per notice and rider) or a push to one
 * browser (unique per notice and push subscription). Claimed before each send so it goes out once.
 */
export class NoticeDelivery extends Model<InferAttributes<NoticeDelivery>, InferCreationAttributes<NoticeDelivery>> {
  declare id: CreationOptional<string>;
  declare noticeId: string;
  declare userId: string;
  declare email: string;
  declare channel: CreationOptional<DeliveryChannel>;
  /** The browser a push goes to; null for e-mail, and once the push service said it is gone. */
  declare pushSubscriptionId: CreationOptional<string | null>;
  declare state: CreationOptional<DeliveryState>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare messageId: string;
  declare claimedAt: CreationOptional<Date | null>;
  declare claimedBy: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare nextAttemptAt: CreationOptional<Date>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

NoticeDelivery.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    noticeId: { type: DataTypes.UUID, allowNull: false },
    userId: { type: DataTypes.UUID, allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false },
    channel: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "email" },
    pushSubscriptionId: { type: DataTypes.UUID, allowNull: true },
    state: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "queued" },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    lastError: { type: DataTypes.STRING(500), allowNull: true },
    messageId: { type: DataTypes.STRING(200), allowNull: false },
    claimedAt: { type: DataTypes.DATE, allowNull: true },
    claimedBy: { type: DataTypes.STRING(64), allowNull: true },
    sentAt: { type: DataTypes.DATE, allowNull: true },
    nextAttemptAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "notice_deliveries", underscored: true },
);
