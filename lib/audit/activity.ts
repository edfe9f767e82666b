import "server-only";
import { Op } from "sequelize";
import { AuditEvent, User } from "@/models";
import { describeSetupEvent, SETUP_ACTIONS } from "./pure/describe-setup";

export type StatusChangeEntry = {
  id: number;
  at: string;
  actorName: string | null;
  trailId: string | null;
  trailName: string;
  date: string;
  from: string | null;
  to: string;
  reason: string | null;
};

export const ACTIVITY_PAGE_SIZE = 100;

/** The audit log of trail status changes for one park, newest first, in pages (before = an event id). */
export async function statusChanges(parkId: string, options: { before?: number } = {}): Promise<{ changes: StatusChangeEntry[]; olderBefore: number | null }> {
  const rows = await AuditEvent.findAll({
    where: { parkId, action: "report.status-change", ...(options.before ? { id: { [Op.lt]: options.before } } : {}) },
    order: [["id", "DESC"]],
    limit: ACTIVITY_PAGE_SIZE + 1,
  });
  const page = rows.slice(0, ACTIVITY_PAGE_SIZE);
  const actorIds = [...new Set(page.map((r) => r.actorId).filter((id): id is string => Boolean(id)))];
  const actors = new Map((await User.findAll({ where: { id: actorIds }, attributes: ["id", "name"] })).map((u) => [u.id, u.name]));
  const changes = page.map((r) => {
    const data = r.data as { trailName?: string; date?: string; from?: string | null; to?: string; reason?: string | null };
    return {
      id: Number(r.id),
      at: new Date(r.createdAt).toISOString(),
      actorName: r.actorId ? (actors.get(r.actorId) ?? null) : null,
      trailId: r.subjectId,
      trailName: data.trailName ?? "(trail)",
      date: data.date ?? "",
      from: data.from ?? null,
      to: data.to ?? "",
      reason: data.reason ?? null,
    };
  });
  return { changes, olderBefore: rows.length > ACTIVITY_PAGE_SIZE ? changes[changes.length - 1].id : null };
}

/** Team, settings and ground changes for one park, newest first: who did what, in words. */
export async function setupEvents(parkId: string, limit = 50) {
  const rows = await AuditEvent.findAll({ where: { parkId, action: [...SETUP_ACTIONS] }, order: [["id", "DESC"]], limit });
  const userIds = [...new Set(rows.flatMap((r) => [r.actorId, r.subjectType === "user" ? r.subjectId : null]).filter((id): id is string => Boolean(id)))];
  const names = new Map((await User.findAll({ where: { id: userIds }, attributes: ["id", "name"] })).map((u) => [u.id, u.name]));
  return rows.map((r) => ({
    id: Number(r.id),
    at: new Date(r.createdAt).toISOString(),
    actorName: r.actorId ? (names.get(r.actorId) ?? null) : null,
    text: describeSetupEvent(r.action, r.data as Record<string, unknown>, r.subjectType === "user" && r.subjectId ? (names.get(r.subjectId) ?? null) : null),
  }));
}
