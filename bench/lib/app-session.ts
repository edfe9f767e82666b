import fs from "node:fs";
import { request, type APIRequestContext } from "playwright-core";

/** The demo staff accounts the benchmarks sign in as (seeded by `scripts/db.ts fresh`; fictional). */
export const DEMO_PASSWORD = "ridgeline-demo-7";
export const demoEmail = (who: "manager" | "ranger") => `${who}@demo.loamcast.test`;

/** An HTTP client signed in through next-auth's credentials callback, as a browser would. */
export async function signedIn(base: string, email: string): Promise<APIRequestContext> {
  const context = await request.newContext({ baseURL: base });
  const { csrfToken } = (await (await context.get("/api/auth/csrf")).json()) as { csrfToken: string };
  await context.post("/api/auth/callback/credentials", { form: { csrfToken, email, password: DEMO_PASSWORD, json: "true" }, maxRedirects: 0 });
  const session = (await (await context.get("/api/auth/session")).json()) as { user?: { email?: string } };
  if (session.user?.email !== email) throw new Error(`could not sign in as ${email}`);
  return context;
}

/** The process listening on a loopback port (the app server), for its memory figures. */
export function listeningPid(port: number): number | null {
  const hex = `:${port.toString(16).toUpperCase().padStart(4, "0")}`;
  const inode = fs.readFileSync("/proc/net/tcp", "utf8").split("\n").map((l) => l.trim().split(/\s+/)).find((f) => f[1]?.endsWith(hex) && f[3] === "0A")?.[9];
  if (!inode) return null;
  for (const pid of fs.readdirSync("/proc").filter((d) => /^\d+$/.test(d))) {
    try {
      if (fs.readdirSync(`/proc/${pid}/fd`).some((fd) => fs.readlinkSync(`/proc/${pid}/fd/${fd}`) === `socket:[${inode}]`)) return Number(pid);
    } catch {
      // gone, or not ours to read
    }
  }
  return null;
}

const statusKb = (pid: number, field: string) => Number(new RegExp(`^${field}:\\s+(\\d+) kB`, "m").exec(fs.readFileSync(`/proc/${pid}/status`, "utf8"))?.[1] ?? NaN);

/**
 * Peak resident-memory growth of a process while `work` runs: its peak is reset first (Linux
 * /proc/PID/clear_refs, "5"), then VmHWM after − VmRSS before. NaN when the kernel refuses.
 */
export async function peakGrowthBytes(pid: number, work: () => Promise<unknown>): Promise<number> {
  try {
    fs.writeFileSync(`/proc/${pid}/clear_refs`, "5");
  } catch {
    return NaN;
  }
  const before = statusKb(pid, "VmRSS");
  await work();
  return (statusKb(pid, "VmHWM") - before) * 1024;
}
