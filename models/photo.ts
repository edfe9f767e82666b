import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** A hazard photo, re-encoded on upload; the bytes live behind the storage interface. */
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<string>;
  declare hazardId: string;
  declare storageKey: string;
  declare thumbKey: string;
  declare contentType: string;
  declare width: number;
  declare height: number;
  declare bytes: number;
  declare uploadedBy: string | null;
  declare createdAt: CreationOptional<Date>;
}

Photo.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    hazardId: { type: DataTypes.UUID, allowNull: false },
    storageKey: { type: DataTypes.STRING(200), allowNull: false },
    thumbKey: { type: DataTypes.STRING(200), allowNull: false },
    contentType: { type: DataTypes.STRING(32), allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    uploadedBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: "photos", underscored: true, updatedAt: false },
);
