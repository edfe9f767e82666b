import type { QueryInterface } from "sequelize";

/** The hourly upload quota counts one person's recent audit events of one action: index that question. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addIndex("audit_events", ["actor_id", "action", "created_at"], { name: "audit_events_actor_action_time" });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex("audit_events", "audit_events_actor_action_time");
}
