import { DataTypes, type QueryInterface } from "sequelize";

/** The websites a park lets frame its status card (CSP frame-ancestors); none until a manager lists one. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("parks", "embed_origins", { type: DataTypes.JSONB, allowNull: false, defaultValue: [] });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn("parks", "embed_origins");
}
