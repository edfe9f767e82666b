import "server-only";
import type { Transaction } from "sequelize";
import { recordAudit } from "@/lib/audit/record";

/**
 * Account events for the audit log (ASVS v5.0.0 16.3.1–16.3.3): who, what and from where, never a
 * password or a token (16.2.5). Park-less: they belong to the person, not a park.
 */
export async function recordAccountEvent(action: string, userId: string | null, data: Record<string, unknown> = {}, transaction?: Transaction) {
  await recordAudit({ parkId: null, actorId: userId, action, subjectType: "user", subjectId: userId, data }, transaction);
}
