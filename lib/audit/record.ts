import "server-only";
import type { Transaction } from "sequelize";
import { AuditEvent } from "@/models";

/** What an audit entry says: who did what to which thing, in which park; never a password or a token. */
export type AuditEntry = {
  parkId: string | null;
  actorId: string | null;
  action: string;
  subjectType: string | null;
  subjectId: string | null;
  data?: Record<string, unknown>;
  createdAt?: Date;
};

/**
 * Records one audit entry (ASVS v5.0.0 16.3), inside the write's transaction when it has one, so
 * an entry exists exactly when the change it describes does.
 */
export async function recordAudit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
  await AuditEvent.create(entry, transaction ? { transaction } : undefined);
}
