import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** One transactional mail sent to one address: the per-recipient limits count these rows. */
export class MailSend extends Model<InferAttributes<MailSend>, InferCreationAttributes<MailSend>> {
  declare id: CreationOptional<number>;
  declare recipient: string;
  declare purpose: string;
  declare sentAt: CreationOptional<Date>;
}

MailSend.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    recipient: { type: DataTypes.STRING(254), allowNull: false },
    purpose: { type: DataTypes.STRING(32), allowNull: false },
    sentAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: "mail_sends", underscored: true, timestamps: false },
);
