import "server-only";
/**
 * Writing trail reports. Every save is a new revision; the one before it stays, marked not
 * current. Optimistic locking: the client names the revision it started from, and the
 * current row is read with SELECT … FOR UPDATE inside the transaction, so of two writers
 * starting from the same revision exactly one wins. When no row exists yet there is nothing
 * to lock, so writers of one trail and date first take a transaction-scoped advisory lock;
 * the unique indexes on (trail, date, revision) and "one current per (trail, date)" stay as
 * the last line of defence.
 */
import { Op, UniqueConstraintError, type Transaction } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError, notFound } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { parkLocalDate } from "@/lib/shared/park-clock";
import { reportPostSchema, type ReportInput } from "@/lib/conditions/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import type { ReportStatus } from "@/lib/conditions/pure/vocabulary";
import { Park, Trail, TrailReport, sequelize } from "@/models";
import { reportValues, reportView, type ReportView } from "./report-view";

export type RevisionRequest = {
  trail: Trail;
  park: Park;
  actorId: string;
  date: string;
  baseRevision: number;
  values: ReportInput | "unchanged";
  now: Date;
};
/** `previousStatus`: the status before this save (today's earlier revision, or the last day's), so callers can tell a new closure from a kept one. */
export type RevisionResult = { ok: true; report: TrailReport; previousStatus: ReportStatus | null } | { ok: false; current: ReportView | null };

const currentWhere = (trailId: string, date: string) => ({ trailId, reportDate: date, isCurrent: true });

/** The latest current report before `date` (yesterday's, or the last day the trail was inspected). */
export function latestBefore(trailId: string, date: string, transaction?: Transaction) {
  return TrailReport.findOne({
    where: { trailId, isCurrent: true, reportDate: { [Op.lt]: date } },
    order: [["reportDate", "DESC"]],
    transaction,
  });
}

/** Read after losing a race to another writer: from the primary, which has that writer's commit. */
export async function currentReportView(trailId: string, date: string): Promise<ReportView | null> {
  const row = await TrailReport.findOne({ where: currentWhere(trailId, date), useMaster: true });
  return row ? reportView(row) : null;
}

/** One revision inside the caller's transaction. A stale base revision is returned, not thrown, so a check can list them all. */
export async function saveRevision(request: RevisionRequest, transaction: Transaction): Promise<RevisionResult> {
  const { trail, park, date, now } = request;
  // Writers of one trail and date take turns, so even the first save of the day (no row to
  // lock yet) cannot race: the second writer sees the first one's revision and gets a 409.
  await sequelize.query("SELECT pg_advisory_xact_lock(hashtextextended($1, 0))", { bind: [`trail-report:${trail.id}:${date}`], transaction });
  const current = await TrailReport.findOne({ where: currentWhere(trail.id, date), lock: transaction.LOCK.UPDATE, transaction });
  if ((current?.revision ?? 0) !== request.baseRevision) {
    // The locked read can come back empty when another writer moved isCurrent meanwhile: read again.
    const fresh = current ?? (await TrailReport.findOne({ where: currentWhere(trail.id, date), transaction }));
    return { ok: false, current: fresh ? reportView(fresh) : null };
  }
  const earlier = current ? null : await latestBefore(trail.id, date, transaction);
  const previous = current ?? earlier;
  let values: ReportInput;
  if (request.values === "unchanged") {
    if (!previous) throw new AppError(422, `${trail.name} has no earlier report to keep; fill in its status instead.`, "unchanged");
    values = reportValues(previous);
  } else {
    values = request.values;
  }
  if (current) await current.update({ isCurrent: false }, { transaction });
  const report = await TrailReport.create(
    { trailId: trail.id, parkId: park.id, reportDate: date, revision: request.baseRevision + 1, isCurrent: true, ...values, reporterId: request.actorId, reportedAt: now },
    { transaction },
  );
  const from = (previous?.status ?? null) as ReportStatus | null;
  if (from !== values.status) {
    await recordAudit({
        parkId: park.id,
        actorId: request.actorId,
        action: "report.status-change",
        subjectType: "trail",
        subjectId: trail.id,
        data: { trailName: trail.name, date, from, to: values.status, reason: values.reason, revision: report.revision },
        createdAt: now,
      }, transaction);
  }
  return { ok: true, report, previousStatus: from };
}

export async function loadTrailWithPark(trailId: string): Promise<{ trail: Trail; park: Park }> {
  if (!isUuid(trailId)) throw notFound("Trail not found.");
  const trail = await Trail.findOne({ where: { id: trailId, archivedAt: null }, include: [{ model: Park, as: "park" }] });
  if (!trail) throw notFound("Trail not found.");
  return { trail, park: (trail as Trail & { park: Park }).park };
}

export const staleRevision = (trailName: string, current: ReportView | null) =>
  new AppError(409, `Someone else saved ${trailName} first. Their values are shown; check them and save again.`, "baseRevision", { current });

/** POST /api/trails/{id}/reports. `now` is injectable so tests can stand on either side of midnight. */
export async function postTrailReport(actor: Actor | null, trailId: string, body: unknown, options: { now?: Date } = {}): Promise<ReportView> {
  const now = options.now ?? new Date();
  const { trail, park } = await loadTrailWithPark(trailId);
  authorize(actor, "report:write", { parkId: park.id });
  const { baseRevision, ...input } = reportPostSchema.parse(body);
  const date = parkLocalDate(now, park.timeZone);
  let result: RevisionResult;
  try {
    result = await sequelize.transaction((transaction) =>
      saveRevision({ trail, park, actorId: actor.id, date, baseRevision, values: input, now }, transaction),
    );
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw staleRevision(trail.name, await currentReportView(trail.id, date));
    throw error;
  }
  if (!result.ok) throw staleRevision(trail.name, result.current);
  return reportView(result.report);
}
