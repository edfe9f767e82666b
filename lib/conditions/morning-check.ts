import "server-only";
/**
 * The morning check: every trail a ranger marked, saved in ONE transaction. Either all of it
 * is written or none: one invalid trail or one stale revision refuses the whole check, and
 * the refusal lists every trail that needs attention.
 */
import { UniqueConstraintError } from "sequelize";
import type { ZodError } from "zod";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { parkLocalDate } from "@/lib/shared/park-clock";
import { morningCheckSchema, type MorningCheckInput } from "@/lib/conditions/pure/schemas";
import { Trail, sequelize, type Park } from "@/models";
import { offeredNotices, type OfferedNoticeKind, type StatusChange } from "./pure/notice-link";
import { reportView, type ReportView } from "./report-view";
import { currentReportView, saveRevision } from "./write-report";

export type CheckProblem = { trailId: string | null; field: string; message: string };
export type CheckConflict = { trailId: string; trailName: string; current: ReportView | null };
/** `notices`: a prefilled notice link per kind, offered only for trails this save newly closed or reopened. */
export type CheckResult = { date: string; saved: ReportView[]; notices: Record<OfferedNoticeKind, string | null> };

/** Zod issues regrouped per trail: "entries.3.report.reason" → trail 3's reason. */
function problemsFrom(error: ZodError, body: unknown): CheckProblem[] {
  const entries = (body as { entries?: { trailId?: unknown }[] })?.entries;
  return error.issues.map((issue) => {
    const [head, index, ...rest] = issue.path;
    if (head === "entries" && typeof index === "number") {
      const trailId = entries?.[index]?.trailId;
      return { trailId: typeof trailId === "string" ? trailId : null, field: rest.filter((p) => p !== "report").join(".") || "entry", message: issue.message };
    }
    return { trailId: null, field: issue.path.join(".") || "entries", message: issue.message };
  });
}

function refuseProblems(problems: CheckProblem[]): never {
  const trails = new Set(problems.map((p) => p.trailId).filter(Boolean)).size;
  const message = trails > 0 ? `${trails} trail${trails === 1 ? "" : "s"} need${trails === 1 ? "s" : ""} attention. Nothing was saved.` : `${problems[0].message} Nothing was saved.`;
  const first = problems[0];
  throw new AppError(400, message, first.field, { problems });
}

function refuseConflicts(conflicts: CheckConflict[]): never {
  if (!conflicts.length) throw new AppError(409, "Another save reached these trails at the same moment. Nothing was saved; reload and save again.", "baseRevision", { conflicts });
  const names = conflicts.map((c) => c.trailName).join(", ");
  throw new AppError(409, `Someone else saved ${names} since you opened the morning check. Nothing was saved; check their values and save again.`, "baseRevision", { conflicts });
}

async function loadTrails(park: Park, input: MorningCheckInput): Promise<Map<string, Trail>> {
  const ids = input.entries.map((e) => e.trailId);
  const trails = await Trail.findAll({ where: { id: ids, parkId: park.id, archivedAt: null } });
  const byId = new Map(trails.map((t) => [t.id, t]));
  const unknown = input.entries.filter((e) => !byId.has(e.trailId));
  if (unknown.length) refuseProblems(unknown.map((e) => ({ trailId: e.trailId, field: "trailId", message: "Not a trail of this park." })));
  return byId;
}

/** POST /api/parks/{slug}/morning-check. */
export async function saveMorningCheck(actor: Actor | null, park: Park, body: unknown, options: { now?: Date } = {}): Promise<CheckResult> {
  authorize(actor, "report:write", { parkId: park.id });
  const parsed = morningCheckSchema.safeParse(body);
  if (!parsed.success) refuseProblems(problemsFrom(parsed.error, body));
  const input = parsed.data;
  const now = options.now ?? new Date();
  const date = parkLocalDate(now, park.timeZone);
  if (input.date && input.date !== date) {
    throw new AppError(409, `The morning check was for ${input.date}, but it is now ${date} at the park. Reload to start today's check; nothing was saved.`, "date");
  }
  const trails = await loadTrails(park, input);
  // A fixed locking order (by trail id) so two overlapping checks cannot deadlock.
  const entries = [...input.entries].sort((a, b) => a.trailId.localeCompare(b.trailId));

  let saved: { report: ReportView; from: StatusChange["from"] }[];
  try {
    saved = await sequelize.transaction(async (transaction) => {
      const reports: typeof saved = [];
      const conflicts: CheckConflict[] = [];
      const problems: CheckProblem[] = [];
      for (const entry of entries) {
        const trail = trails.get(entry.trailId)!;
        const values = entry.unchanged ? ("unchanged" as const) : entry.report!;
        try {
          const result = await saveRevision({ trail, park, actorId: actor.id, date, baseRevision: entry.baseRevision, values, now }, transaction);
          if (result.ok) reports.push({ report: reportView(result.report), from: result.previousStatus });
          else conflicts.push({ trailId: trail.id, trailName: trail.name, current: result.current });
        } catch (error) {
          if (!(error instanceof AppError)) throw error;
          problems.push({ trailId: trail.id, field: error.field ?? "entry", message: error.message });
        }
      }
      // Throwing inside the callback rolls every revision of this check back.
      if (conflicts.length) refuseConflicts(conflicts);
      if (problems.length) refuseProblems(problems);
      return reports;
    });
  } catch (error) {
    if (!(error instanceof UniqueConstraintError)) throw error;
    // Another writer inserted a first revision at the same moment: report who is now ahead.
    const conflicts: CheckConflict[] = [];
    for (const entry of entries) {
      const current = await currentReportView(entry.trailId, date);
      if ((current?.revision ?? 0) !== entry.baseRevision) conflicts.push({ trailId: entry.trailId, trailName: trails.get(entry.trailId)!.name, current });
    }
    refuseConflicts(conflicts);
  }

  const changes = saved.map(({ report, from }) => ({ id: report.trailId, name: trails.get(report.trailId)!.name, reason: report.reason, from, to: report.status }));
  return { date, saved: saved.map((s) => s.report), notices: offeredNotices(park.slug, park.name, changes) };
}
