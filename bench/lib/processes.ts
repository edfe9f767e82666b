import { spawn, type ChildProcess, type SpawnOptions } from "node:child_process";
import http from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";

/** Shared plumbing for the benchmarks: options, free loopback ports, servers started and stopped. */

export function option(args: string[], name: string, fallback: string): string {
  const i = args.indexOf(`--${name}`);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
}

export async function freePort(): Promise<number> {
  const server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  await new Promise((resolve) => server.close(resolve));
  return port;
}

export async function waitFor(url: string, timeoutMs = 60_000) {
  const start = Date.now();
  while (Date.now() - start < timeoutMs) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
}

// Children started here lead process groups of their own, so stopping one reaches whatever it
// started in turn (a bare server, `next start`). Whatever is still running when this process
// exits, by any path, is sent SIGTERM.
const started = new Set<ChildProcess>();
const signalGroup = (child: ChildProcess, signal: NodeJS.Signals) => {
  try {
    if (child.pid) process.kill(-child.pid, signal);
  } catch {
    // already gone
  }
};
process.on("exit", () => started.forEach((child) => signalGroup(child, "SIGTERM")));

/** `spawn` in a process group of its own, stopped with this process at the latest. */
export function spawnTracked(command: string, args: string[], options: SpawnOptions): ChildProcess {
  const child = spawn(command, args, { ...options, detached: true });
  started.add(child);
  child.once("exit", () => started.delete(child));
  return child;
}

/** Ctrl-C or SIGTERM ends this process; the exit hook above stops its children. */
export function exitOnSignal() {
  for (const signal of ["SIGINT", "SIGTERM"] as const) process.once(signal, () => process.exit(130));
}

/** SIGTERM to the child's group, then SIGKILL if the child has not gone within `graceMs`. */
export async function stopChild(child: ChildProcess | null | undefined, graceMs = 10_000) {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  signalGroup(child, "SIGTERM");
  const timer = setTimeout(() => signalGroup(child, "SIGKILL"), graceMs);
  await exited;
  clearTimeout(timer);
}

export type Server = { base: string; child: ChildProcess };

/**
 * `next start` for the built app in `dir` (default: this clone) on a free loopback port.
 * APP_URL and NEXTAUTH_URL follow the port, so the app's own links point at itself.
 */
export async function startNext(opts: { dir?: string; readyPath?: string } = {}): Promise<Server> {
  const dir = opts.dir ?? process.cwd();
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const child = spawnTracked(path.join(process.cwd(), "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: dir,
    stdio: "ignore",
    env: { ...process.env, PORT: String(port), APP_URL: base, NEXTAUTH_URL: base },
  });
  try {
    await waitFor(`${base}${opts.readyPath ?? "/api/health"}`);
  } catch (error) {
    await stopChild(child);
    throw error;
  }
  return { base, child };
}
