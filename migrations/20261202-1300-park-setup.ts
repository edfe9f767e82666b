import { DataTypes, type QueryInterface } from "sequelize";
import { ref, uuidId as id } from "@/models/migration-columns";

/**
 * A park runs itself: its settings carry a lockVersion and contact details, an invitation can be
 * withdrawn, and every replaced or cleared ground layer is kept as a version for the park's staff.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.addColumn("parks", "lock_version", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 }, { transaction });
    await qi.addColumn("parks", "contact_email", { type: DataTypes.STRING(254), allowNull: true }, { transaction });
    await qi.addColumn("parks", "website_url", { type: DataTypes.STRING(300), allowNull: true }, { transaction });
    await qi.addColumn("invitations", "revoked_at", { type: DataTypes.DATE, allowNull: true }, { transaction });
    await qi.createTable(
      "park_layer_versions",
      {
        id,
        park_id: ref("parks"),
        layer: { type: DataTypes.STRING(16), allowNull: false },
        /** The collection the layer held until `replaced_at` (null when the layer was empty). */
        geojson: { type: DataTypes.JSONB, allowNull: true },
        replaced_by: ref("users", "SET NULL", true),
        replaced_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("park_layer_versions", ["park_id", "layer", "replaced_at"], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable("park_layer_versions", { transaction });
    await qi.removeColumn("invitations", "revoked_at", { transaction });
    await qi.removeColumn("parks", "website_url", { transaction });
    await qi.removeColumn("parks", "contact_email", { transaction });
    await qi.removeColumn("parks", "lock_version", { transaction });
  });
}
