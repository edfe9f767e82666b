import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

export class Notice extends Model<InferAttributes<Notice>, InferCreationAttributes<Notice>> {
  declare id: CreationOptional<string>;
  declare parkId: string;
  declare kind: "closure" | "reopening" | "advisory";
  declare trailIds: string[] | null;
  declare subject: string;
  declare message: string;
  declare closedUntil: Date | null;
  declare recipientCount: CreationOptional<number>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Notice.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    parkId: { type: DataTypes.UUID, allowNull: false },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    trailIds: { type: DataTypes.JSONB, allowNull: true },
    subject: { type: DataTypes.STRING(150), allowNull: false },
    message: { type: DataTypes.STRING(4000), allowNull: false },
    closedUntil: { type: DataTypes.DATE, allowNull: true },
    recipientCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: "notices", underscored: true },
);
