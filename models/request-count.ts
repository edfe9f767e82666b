import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "@/models/db";

/** One counted request in a throttle bucket (sign-up per address, reset per e-mail…). */
export class RequestCount extends Model<InferAttributes<RequestCount>, InferCreationAttributes<RequestCount>> {
  declare id: CreationOptional<number>;
  declare bucket: string;
  declare key: string;
  declare countedAt: CreationOptional<Date>;
}

RequestCount.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    bucket: { type: DataTypes.STRING(32), allowNull: false },
    key: { type: DataTypes.STRING(254), allowNull: false },
    countedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: "request_counts", underscored: true, timestamps: false },
);
