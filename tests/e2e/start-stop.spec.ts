import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { DEMO_PASSWORD } from "./helpers";

/**
 * `npm start` (scripts/start.sh) end to end, on a cluster and ports of its own: it serves, a staff
 * page answers 503 while its PostgreSQL is stopped and 200 once it is back, SIGTERM stops every
 * process it started and PostgreSQL cleanly, and a second start keeps the data. In the browser
 * stage because start.sh serves the build (it would build itself, slowly, before `next build` ran).
 * ASVS v5.0.0.
 */
const OFFSET = Number(process.env.LOAMCAST_PORT_OFFSET ?? 0) + 10; // clear of this run's own ports
const CLUSTER = "startstop"; // never the developer's "dev" cluster
const APP = `http://localhost:${3000 + OFFSET}`;
const STAFF_EMAIL = "ranger@demo.loamcast.test";
const STOP_WITHIN_MS = 30_000;

/** A clean environment: what `npm test` exported (DATABASE_URL, PORT, SMTP_URL…) must not leak in. */
const env = { PATH: process.env.PATH!, HOME: process.env.HOME ?? "/root", LOAMCAST_PORT_OFFSET: String(OFFSET), LOAMCAST_PG_CLUSTER: CLUSTER, PHOTO_STORAGE_DIR: `.local/photos-${CLUSTER}` } as unknown as NodeJS.ProcessEnv; // no NODE_ENV, as for `npm start`
const sh = (script: string) => execFileSync("bash", ["-c", `. scripts/bootstrap.sh; . scripts/pg.sh; ${script}`], { env, encoding: "utf8", timeout: 60_000 }).trim();
const clusterDir = () => sh(`pg_cluster_dir ${CLUSTER}`);

type Started = { child: ChildProcess; output: () => string; exited: Promise<number | null> };

async function start(): Promise<Started> {
  // Its own process group, so the test can tell every process it started by its group id.
  const child = spawn("bash", ["scripts/start.sh"], { env, detached: true, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout.on("data", (d: Buffer) => (output += d));
  child.stderr.on("data", (d: Buffer) => (output += d));
  const exited = new Promise<number | null>((resolve) => child.on("exit", (code, signal) => resolve(code ?? (signal ? -1 : null))));
  for (let tries = 0; ; tries++) {
    const up = await fetch(`${APP}/api/health`).then((r) => r.ok, () => false);
    if (up) break;
    if (child.exitCode !== null || tries > 600) throw new Error(`npm start did not come up:\n${output}`);
    await new Promise((r) => setTimeout(r, 500));
  }
  return { child, output: () => output, exited };
}

/**
 * Every live process on the machine by pid. Zombies are left out: they have exited, and one
 * handed to an init that does not reap (a container's) stays listed until the container ends.
 */
function processes(): Map<number, { ppid: number; pgid: number; started: string }> {
  const rows = execFileSync("ps", ["-eo", "pid=,ppid=,pgid=,stat=,lstart="], { encoding: "utf8" }).trim().split("\n");
  return new Map(rows.flatMap((row) => {
    const [pid, ppid, pgid, stat, ...started] = row.trim().split(/\s+/);
    return stat.startsWith("Z") ? [] : [[Number(pid), { ppid: Number(ppid), pgid: Number(pgid), started: started.join(" ") }] as const];
  }));
}

/** Every process in the script's group or descended from it, plus the postmaster (pg_ctl gives it a session of its own). */
function startedBy(root: number): Map<number, string> {
  const all = processes();
  const postmaster = Number(readFileSync(`${clusterDir()}/data/postmaster.pid`, "utf8").split("\n")[0]);
  const found = new Map<number, string>();
  for (const [pid, p] of all) {
    let ancestor = pid;
    for (let hops = 0; ancestor > 1 && hops < 50 && ancestor !== root; hops++) ancestor = all.get(ancestor)?.ppid ?? 0;
    if (p.pgid === root || ancestor === root || pid === postmaster || p.ppid === postmaster) found.set(pid, p.started);
  }
  return found;
}

async function stop(run: Started) {
  const before = startedBy(run.child.pid!);
  expect(before.size).toBeGreaterThan(4); // bash, the server, the worker, the fakes, PostgreSQL
  const sentAt = Date.now();
  process.kill(run.child.pid!, "SIGTERM");
  const code = await Promise.race([run.exited, new Promise<"late">((r) => setTimeout(() => r("late"), STOP_WITHIN_MS))]);
  expect(code, `start.sh still running ${STOP_WITHIN_MS} ms after SIGTERM:\n${run.output()}`).not.toBe("late");
  console.log(`start.sh exited ${Date.now() - sentAt} ms after SIGTERM (code ${code}); ${before.size} processes were running`);
  // Gone: none of those processes is alive (a pid reused since would have another start time).
  const after = processes();
  const left = [...before].filter(([pid, started]) => after.get(pid)?.started === started).map(([pid]) => pid);
  expect(left, execFileSync("ps", ["-o", "pid,ppid,pgid,args", "-p", left.join(",") || "1"], { encoding: "utf8" })).toEqual([]);
  expect(run.output()).toContain("Stopped. Your data is kept");
  // PostgreSQL shut down cleanly, not killed.
  expect(sh(`pg_ensure_installed; pg_as_owner "$PG_BIN/pg_ctl" -D "${clusterDir()}/data" status >/dev/null 2>&1 && echo running || echo stopped`)).toBe("stopped");
  expect(readFileSync(`${clusterDir()}/server.log`, "utf8").trim().split("\n").at(-1)).toContain("database system is shut down");
}

test.describe.configure({ timeout: 600_000 });

test("npm start serves; staff pages answer 503 while PostgreSQL is down; SIGTERM stops everything; data is kept (ASVS 16.5.2, 16.5.3)", async ({ browser }) => {
  sh(`pg_stop ${CLUSTER}; rm -rf "$(pg_cluster_dir ${CLUSTER})" "$PHOTO_STORAGE_DIR"`); // a fresh cluster: the first start seeds

  const first = await start();
  expect(first.output()).toContain("demo park seeded");
  try {
    const context = await browser.newContext({ baseURL: APP });
    const page = await context.newPage();
    await page.goto("/sign-in?callbackUrl=/staff");
    await page.getByLabel("E-mail").fill(STAFF_EMAIL);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByTestId("signed-in-as")).toBeVisible();
    const staffPage = () => context.request.get("/staff", { maxRedirects: 0 });
    expect((await staffPage()).status()).toBe(200);

    sh(`pg_stop ${CLUSTER}`);
    // serve.mjs keeps its probe's answer for a second, so a request in that second may still
    // reach the app and get its 500; after that, 503. Nothing else is acceptable on the way.
    const seen = new Set<number>();
    await expect.poll(async () => { const s = (await staffPage()).status(); seen.add(s); return s; }, { timeout: 15_000 }).toBe(503);
    expect([...seen].filter((s) => s !== 500 && s !== 503)).toEqual([]);
    const down = await staffPage();
    expect(down.status()).toBe(503);
    expect(down.headers()["retry-after"]).toMatch(/^\d+$/);
    expect(await down.text()).toContain("Loamcast is briefly unavailable, try again in a minute");
    await page.goto("/staff");
    await expect(page.getByRole("heading", { name: "Loamcast is briefly unavailable, try again in a minute" })).toBeVisible();

    sh(`load_env dev; pg_start ${CLUSTER} "$PG_PORT" "$PG_PASSWORD"`);
    await expect.poll(async () => (await staffPage()).status(), { timeout: 30_000 }).toBe(200);
    await context.close();
  } finally {
    await stop(first);
  }

  const second = await start();
  try {
    expect(second.output()).toContain("Database has data: not seeding");
  } finally {
    await stop(second);
  }
});
