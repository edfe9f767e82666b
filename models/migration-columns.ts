import { DataTypes } from "sequelize";

/**
 * Column shapes shared by migrations. Migrations are history: change nothing here that an
 * existing migration relies on; add new helpers instead.
 */
export const uuidId = { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 };

export const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

/** A UUID foreign key to `model.id`. */
export const ref = (model: string, onDelete = "CASCADE", allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model, key: "id" },
  onDelete,
});
