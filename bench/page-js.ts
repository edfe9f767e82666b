/**
 * Benchmark: JavaScript a browser downloads on the first load of the board page
 * (/parks/harrow-ridge) against a bare Next.js page (bench/lib/bare-next.ts: same Next.js and
 * React, one server-rendered page of static text), and against the app's own simplest page
 * (/pressure/how-it-works: server components only, so it carries just the root layout's share).
 * Chromium (/usr/bin/chromium) loads each page in a fresh context (empty cache, phone-sized
 * viewport) from `next start`, waits for the network to go quiet, and sums every response served
 * as JavaScript: bytes on the wire (gzip, as `next start` sends them) and decoded bytes.
 * Prints figures; asserts nothing.
 *
 * Run with the database up and the app built (`npm start` does both), e.g.
 *   npx tsx bench/page-js.ts --url http://localhost:3000   # against the running app
 *   npx tsx bench/page-js.ts                               # starts `next start` itself on a free port
 * Options: --slug harrow-ridge --loads 2 --list (print each script).
 */
import { chromium, type Browser } from "playwright-core";
import { ensureBareNextBuilt } from "./lib/bare-next";
import { exitOnSignal, option as optionIn, startNext, stopChild, type Server } from "./lib/processes";
import { emitResult } from "./lib/result";

const args = process.argv.slice(2);
const option = (name: string, fallback: string) => optionIn(args, name, fallback);
const SLUG = option("slug", "harrow-ridge");
const LOADS = Number(option("loads", "2"));
const LIST = args.includes("--list");

type Load = { scripts: number; wireBytes: number; decodedBytes: number; encodings: Set<string> };

/** One first load in a fresh context: every JavaScript response until the network is quiet. */
async function firstLoad(browser: Browser, url: string): Promise<Load> {
  const context = await browser.newContext({ viewport: { width: 412, height: 915 }, deviceScaleFactor: 1 });
  const page = await context.newPage();
  const pending: Promise<{ url: string; wire: number; decoded: number; encoding: string }>[] = [];
  page.on("requestfinished", (request) => {
    pending.push(
      (async () => {
        const response = await request.response();
        const type = response?.headers()["content-type"] ?? "";
        if (!response || !/javascript/.test(type)) return { url: request.url(), wire: -1, decoded: 0, encoding: "" };
        const [sizes, body] = await Promise.all([request.sizes(), response.body()]);
        return { url: request.url(), wire: sizes.responseBodySize, decoded: body.length, encoding: response.headers()["content-encoding"] ?? "identity" };
      })(),
    );
  });
  try {
    const response = await page.goto(url, { waitUntil: "load" });
    if (!response?.ok()) throw new Error(`${url} answered ${response?.status()}`);
    await page.waitForLoadState("networkidle", { timeout: 30_000 });
    const scripts = (await Promise.all(pending)).filter((s) => s.wire >= 0);
    if (LIST) for (const s of scripts) console.log(`  ${String(s.wire).padStart(7)} B wire ${String(s.decoded).padStart(7)} B decoded  ${s.encoding.padEnd(8)} ${new URL(s.url).pathname}`);
    return {
      scripts: scripts.length,
      wireBytes: scripts.reduce((sum, s) => sum + s.wire, 0),
      decodedBytes: scripts.reduce((sum, s) => sum + s.decoded, 0),
      encodings: new Set(scripts.map((s) => s.encoding)),
    };
  } finally {
    await context.close();
  }
}

/** `LOADS` first loads; the byte counts must agree (the same build serves the same files). */
async function measure(browser: Browser, label: string, url: string): Promise<Load> {
  const loads: Load[] = [];
  for (let i = 0; i < LOADS; i++) loads.push(await firstLoad(browser, url));
  const [first] = loads;
  const steady = loads.every((l) => l.scripts === first.scripts && l.wireBytes === first.wireBytes && l.decodedBytes === first.decodedBytes);
  const kb = (bytes: number) => `${(bytes / 1000).toFixed(1)} kB`;
  console.log(
    `${label.padEnd(44)} ${String(first.scripts).padStart(3)} scripts  ${kb(first.wireBytes).padStart(9)} on the wire (${[...first.encodings].join(", ")})  ${kb(first.decodedBytes).padStart(9)} decoded${steady ? "" : `  (loads differed: ${loads.map((l) => l.wireBytes).join(", ")} bytes)`}`,
  );
  return first;
}

async function main() {
  exitOnSignal();
  const given = option("url", "");
  const app: Server | { base: string; child: null } = given ? { base: given.replace(/\/$/, ""), child: null } : await startNext();
  let bare: Server | null = null;
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"] });
  try {
    bare = await startNext({ dir: ensureBareNextBuilt(), readyPath: "/" });
    console.log(`First-load JavaScript, Chromium, fresh context per load, ${LOADS} loads each, on ${new Date().toISOString().slice(0, 10)}`);
    const bareLoad = await measure(browser, "bare Next.js page (static text)", `${bare.base}/`);
    const shellLoad = await measure(browser, "app's simplest page (/pressure/how-it-works)", `${app.base}/pressure/how-it-works`);
    const board = await measure(browser, `board page (/parks/${SLUG})`, `${app.base}/parks/${SLUG}`);
    console.log(`board / bare: ${(board.wireBytes / bareLoad.wireBytes).toFixed(2)}× on the wire, ${(board.decodedBytes / bareLoad.decodedBytes).toFixed(2)}× decoded; board − app's simplest page: ${((board.wireBytes - shellLoad.wireBytes) / 1000).toFixed(1)} kB on the wire`);
    const kB = (bytes: number) => bytes / 1000;
    emitResult([
      { benchmark: "board page first-load JS vs bare Next.js page: gzip on the wire", ours: kB(board.wireBytes), bare: kB(bareLoad.wireBytes), unit: "kB" },
      { benchmark: "board page first-load JS vs bare Next.js page: decoded", ours: kB(board.decodedBytes), bare: kB(bareLoad.decodedBytes), unit: "kB" },
      { benchmark: "board page first-load JS vs the app's simplest page: gzip", ours: kB(board.wireBytes), bare: kB(shellLoad.wireBytes), unit: "kB" },
    ]);
  } finally {
    await browser.close();
    await stopChild(bare?.child);
    await stopChild(app.child);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
