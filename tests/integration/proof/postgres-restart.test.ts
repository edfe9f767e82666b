import { execFile } from "node:child_process";
import { afterAll, describe, expect, it } from "vitest";
import { errorResponse } from "@/lib/server/api/errors";
import { postTrailReport } from "@/lib/conditions/write-report";
import { boardForPark } from "@/lib/conditions/board";
import { isDatabaseUnavailable } from "@/lib/shared/db-errors";
import { AppError } from "@/lib/shared/errors";
import { TrailReport, sequelize } from "@/models";
import { parkWithTrails } from "../conditions/fixtures";

/**
 * Faults: PostgreSQL is restarted (fast shutdown: open sessions are terminated) while board reads
 * and report writes run. No acknowledged report may be lost, errors may come only while the
 * server is away, and the same process and pool must carry on afterwards.
 *
 * Driven through the lib functions behind the route handlers (boardForPark, postTrailReport) with
 * the app's one Sequelize pool: this stage runs before `next build`, so there is no HTTP server to
 * aim at. The route handlers add only errorResponse(), which is checked on every failure below.
 */
const WRITERS = 3;
const READERS = 3;
const WARM_UP_MS = 1_500;
const SUCCESSES_TO_RECOVER = 5;
const GIVE_UP_MS = 45_000;
/** How long the server stays stopped: longer than the driver's retries of a refused connection. */
const SECONDS_DOWN = 1;

type Outcome = { worker: string; kind: "read" | "write"; startedAt: number; endedAt: number; ok: boolean; error?: unknown; note?: string };

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** scripts/pg.sh's pg_restart on this clone's test cluster (the one `npm test` started). */
function restartPostgres(): Promise<void> {
  const script = `. scripts/bootstrap.sh; . scripts/pg.sh; load_env test; pg_restart test ${SECONDS_DOWN}`;
  return new Promise((resolve, reject) =>
    execFile("bash", ["-c", script], { timeout: 60_000 }, (error, _stdout, stderr) => (error ? reject(new Error(`pg_restart failed: ${stderr || error.message}`)) : resolve())),
  );
}

afterAll(async () => {
  await sequelize.close();
});

describe("PostgreSQL restarts under load", () => {
  it("loses no acknowledged report, fails only while the server is away, and recovers on the same pool", async () => {
    const { park, ranger, trails } = await parkWithTrails(WRITERS);
    const outcomes: Outcome[] = [];
    let stop = false;
    let restartEndedAt = Infinity;
    const successesAfterRestart = new Map<string, number>();

    async function run(worker: string, kind: Outcome["kind"], op: (attempt: { note?: string }) => Promise<void>) {
      while (!stop) {
        const startedAt = Date.now();
        const attempt: { note?: string } = {};
        try {
          await op(attempt);
          outcomes.push({ worker, kind, startedAt, endedAt: Date.now(), ok: true, note: attempt.note });
          if (startedAt > restartEndedAt) successesAfterRestart.set(worker, (successesAfterRestart.get(worker) ?? 0) + 1);
        } catch (error) {
          outcomes.push({ worker, kind, startedAt, endedAt: Date.now(), ok: false, error, note: attempt.note });
          await pause(50);
        }
        await pause(10);
      }
    }

    let committedUnacknowledged = 0;
    const writer = (index: number) => {
      const trail = trails[index];
      let baseRevision = 0;
      let seq = 0;
      const post = (note: string) => postTrailReport(ranger, trail.id, { status: "open", surfaces: ["dry"], note, baseRevision });
      return async (attempt: { note?: string }) => {
        const note = (attempt.note = `restart-load w${index} #${++seq}`);
        let report;
        try {
          report = await post(note);
        } catch (error) {
          // 409: an earlier write whose answer was lost had committed. Start from it and write again.
          const current = error instanceof AppError && error.status === 409 ? (error.details as { current?: { revision: number } }).current : undefined;
          if (!current) throw error;
          committedUnacknowledged++;
          baseRevision = current.revision;
          report = await post(note);
        }
        baseRevision = report.revision;
      };
    };
    const reader = async () => {
      const board = await boardForPark(park.slug);
      if (board?.trails.length !== WRITERS) throw new Error("the board came back incomplete");
    };

    const names = [...trails.map((_, i) => `writer ${i}`), ...Array.from({ length: READERS }, (_, i) => `reader ${i}`)];
    const workers = names.map((name, i) => (i < WRITERS ? run(name, "write", writer(i)) : run(name, "read", reader)));

    await pause(WARM_UP_MS);
    const restartStartedAt = Date.now();
    await restartPostgres();
    restartEndedAt = Date.now();
    while (Date.now() - restartEndedAt < GIVE_UP_MS && names.some((n) => (successesAfterRestart.get(n) ?? 0) < SUCCESSES_TO_RECOVER)) await pause(100);
    stop = true;
    await Promise.all(workers);

    const failures = outcomes.filter((o) => !o.ok);
    const writes = outcomes.filter((o) => o.kind === "write");
    const acknowledged = writes.filter((o) => o.ok).map((o) => o.note!);
    const failedWrites = writes.filter((o) => !o.ok);
    const stored = new Set((await TrailReport.findAll({ where: { trailId: trails.map((t) => t.id) }, attributes: ["note"] })).map((r) => r.note));
    const kinds = new Map<string, number>();
    for (const f of failures) {
      const e = f.error as { name?: string; parent?: { code?: string }; message?: string };
      const key = `${e.name}${e.parent?.code ? ` ${e.parent.code}` : ""}: ${e.message?.slice(0, 80)}`;
      kinds.set(key, (kinds.get(key) ?? 0) + 1);
    }
    const at = (t: number) => `${t - restartStartedAt} ms`;
    console.log(
      [
        `PostgreSQL stopped (fast), ${SECONDS_DOWN} s down, started again: ${restartEndedAt - restartStartedAt} ms in all`,
        `writes: ${writes.length} tried, ${acknowledged.length} acknowledged, ${failedWrites.length} failed (${failedWrites.filter((w) => stored.has(w.note!)).length} of those committed anyway; ${committedUnacknowledged} found by a 409 afterwards)`,
        `reads: ${outcomes.length - writes.length} tried, ${failures.length - failedWrites.length} failed`,
        failures.length ? `failures between ${at(Math.min(...failures.map((f) => f.startedAt)))} (start) and ${at(Math.max(...failures.map((f) => f.endedAt)))} (end) after the restart began` : "no failures",
        ...[...kinds].map(([k, n]) => `  ${n} × ${k}`),
      ].join("\n"),
    );

    // The restart was felt, and only as "the database is away": a 503 in the API's one error shape.
    expect(failures.length).toBeGreaterThan(0);
    for (const failure of failures) {
      expect(isDatabaseUnavailable(failure.error), String(failure.error)).toBe(true);
      const response = errorResponse(failure.error);
      expect(response.status).toBe(503);
      expect(await response.json()).toEqual({ error: { message: expect.stringContaining("briefly unavailable") } });
      // Only during the outage: nothing failed before the restart began or started after it ended.
      expect(failure.endedAt).toBeGreaterThanOrEqual(restartStartedAt);
      expect(failure.startedAt).toBeLessThan(restartEndedAt);
    }
    // Every worker recovered on the same process and pool.
    for (const name of names) expect(successesAfterRestart.get(name) ?? 0, name).toBeGreaterThanOrEqual(SUCCESSES_TO_RECOVER);
    // No acknowledged report was lost.
    expect(acknowledged.length).toBeGreaterThan(0);
    expect(acknowledged.filter((note) => !stored.has(note))).toEqual([]);

    // And afterwards, with the very same pool: a write, then a board read that shows it.
    const last = await postTrailReport(ranger, trails[0].id, { status: "caution", reason: "Checked after the restart", baseRevision: (await boardForPark(park.slug))!.trails.find((t) => t.id === trails[0].id)!.revision });
    const board = await boardForPark(park.slug);
    expect(board!.trails.find((t) => t.id === trails[0].id)).toMatchObject({ status: "caution", reason: "Checked after the restart", revision: last.revision });
    await park.destroy(); // with its trails and reports
  }, 120_000);
});
