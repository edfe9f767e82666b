import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

/**
 * The baseline for first-load JavaScript: a bare Next.js app, built with this clone's own `next`,
 * `react` and `react-dom`, whose one page renders static text from a server component (no client
 * components, no CSS, no fonts). What a browser downloads for it is the framework's floor: the
 * React runtime and the App Router client. It is generated under .local/ (never part of the
 * product) and rebuilt only when its files or the Next.js version change.
 */
export const BARE_NEXT_DIR = path.join(process.cwd(), ".local/bench/bare-next");

function sourceFiles(turbopackRoot: string): Record<string, string> {
  return {
    "package.json": JSON.stringify({ name: "loamcast-bench-bare-next", private: true }, null, 2),
    "next.config.mjs": `export default { poweredByHeader: false, reactStrictMode: true, turbopack: { root: ${JSON.stringify(turbopackRoot)} } };\n`,
    "app/layout.jsx": `export default function RootLayout({ children }) {\n  return (\n    <html lang="en">\n      <body>{children}</body>\n    </html>\n  );\n}\n`,
    "app/page.jsx": `export default function Page() {\n  return (\n    <main>\n      <h1>Bare page</h1>\n      <p>Static text from a server component; no client components.</p>\n    </main>\n  );\n}\n`,
  };
}

/** The nearest folder holding both `dir` and the real node_modules (Turbopack reads nothing outside its root). */
function commonRoot(dir: string, modules: string): string {
  let root = dir;
  while (!(modules + path.sep).startsWith(root + path.sep) && path.dirname(root) !== root) root = path.dirname(root);
  return root;
}

/** Writes and builds the bare app when needed; returns its folder, ready for `next start`. */
export function ensureBareNextBuilt(): string {
  const modules = fs.realpathSync(path.join(process.cwd(), "node_modules"));
  const files = sourceFiles(commonRoot(BARE_NEXT_DIR, path.dirname(modules)));
  const nextVersion = JSON.parse(fs.readFileSync(path.join(modules, "next/package.json"), "utf8")).version as string;
  const stamp = createHash("sha1").update(nextVersion).update(JSON.stringify(files)).digest("hex");
  const stampFile = path.join(BARE_NEXT_DIR, ".next/bench-stamp");
  if (fs.existsSync(path.join(BARE_NEXT_DIR, ".next/BUILD_ID")) && fs.existsSync(stampFile) && fs.readFileSync(stampFile, "utf8") === stamp) {
    return BARE_NEXT_DIR;
  }
  fs.rmSync(BARE_NEXT_DIR, { recursive: true, force: true });
  for (const [name, text] of Object.entries(files)) {
    fs.mkdirSync(path.dirname(path.join(BARE_NEXT_DIR, name)), { recursive: true });
    fs.writeFileSync(path.join(BARE_NEXT_DIR, name), text);
  }
  fs.symlinkSync(modules, path.join(BARE_NEXT_DIR, "node_modules"));
  console.log(`building the bare Next.js ${nextVersion} app in ${path.relative(process.cwd(), BARE_NEXT_DIR)}…`);
  const build = spawnSync(path.join(modules, ".bin/next"), ["build"], { cwd: BARE_NEXT_DIR, stdio: ["ignore", "ignore", "inherit"], env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" }, timeout: 300_000 });
  if (build.status !== 0) throw new Error(`next build of the bare app failed (status ${build.status})`);
  fs.writeFileSync(stampFile, stamp);
  return BARE_NEXT_DIR;
}
