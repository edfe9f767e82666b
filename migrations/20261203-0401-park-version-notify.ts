import type { QueryInterface } from "sequelize";
import { PARK_VERSIONS_CHANNEL as CHANNEL } from "@/models/park-version-listener";
import { BUMP_FUNCTION } from "./20261202-1601-park-versions";

/**
 * The park-version trigger also NOTIFYs: every app instance LISTENs (models/park-version-listener.ts)
 * and so knows, without a query, that a park's cached board and map are out of date. PostgreSQL
 * delivers a notification only when its transaction commits, once per distinct payload.
 */
const NOTIFYING = BUMP_FUNCTION.replace(
  "ON CONFLICT (park_id) DO UPDATE SET version = park_versions.version + 1, changed_at = now();",
  `ON CONFLICT (park_id) DO UPDATE SET version = park_versions.version + 1, changed_at = now();
      PERFORM pg_notify('${CHANNEL}', park::text);`,
);
if (NOTIFYING === BUMP_FUNCTION) throw new Error("20261203-0401: the version upsert to add the notification to was not found");

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(NOTIFYING);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(BUMP_FUNCTION);
}
