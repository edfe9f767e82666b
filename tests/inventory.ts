import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";

/**
 * What the app exposes, read from its source so that a new route handler or server action
 * without a row in the authorization matrix fails the matrix tests.
 */
const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;
export type Method = (typeof METHODS)[number];
export type RouteMethod = { route: string; method: Method; file: string };
export type ServerAction = { name: string; file: string };

function filesUnder(dir: string, keep: (file: string) => boolean): string[] {
  const found: string[] = [];
  for (const entry of readdirSync(dir)) {
    const full = path.join(dir, entry);
    if (statSync(full).isDirectory()) found.push(...filesUnder(full, keep));
    else if (keep(full)) found.push(full);
  }
  return found.sort();
}

/** "app/api/trails/[id]/reports/route.ts" → "/api/trails/[id]/reports" (route groups dropped). */
export function routeOf(file: string, appDir = "app"): string {
  const parts = path.relative(appDir, path.dirname(file)).split(path.sep).filter((p) => !/^\(.*\)$/.test(p));
  return `/${parts.join("/")}`;
}

/** Exported HTTP method names: `export const GET`, `export async function POST`, `export { x as GET }`. */
export function exportedMethods(source: string): Method[] {
  const names = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:const|let|(?:async\s+)?function)\s+([A-Z]+)\b/g)) names.add(m[1]);
  for (const m of source.matchAll(/export\s*\{([^}]*)\}/g)) {
    for (const part of m[1].split(",")) {
      const name = part.trim().split(/\s+as\s+/).pop()?.trim();
      if (name) names.add(name);
    }
  }
  return METHODS.filter((method) => names.has(method));
}

export function routeHandlers(root = process.cwd()): RouteMethod[] {
  const appDir = path.join(root, "app");
  // Every route file under app/, not only app/api: the embeddable card is one too.
  return filesUnder(appDir, (f) => /[\\/]route\.(ts|tsx|js)$/.test(f)).flatMap((file) =>
    exportedMethods(readFileSync(file, "utf8")).map((method) => ({ route: routeOf(file, appDir), method, file: path.relative(root, file) })),
  );
}

/** Exported async functions of every module-level 'use server' file under lib/ and app/. */
export function serverActions(root = process.cwd()): ServerAction[] {
  const isSource = (f: string) => /\.(ts|tsx)$/.test(f);
  const files = [...filesUnder(path.join(root, "lib"), isSource), ...filesUnder(path.join(root, "app"), isSource)];
  return files.flatMap((file) => {
    const source = readFileSync(file, "utf8");
    if (!/^\s*(?:\/\/[^\n]*\n|\/\*[\s\S]*?\*\/\s*)*["']use server["']/.test(source)) {
      // An action declared inside a function body: named so the matrix fails until it has a row.
      return /["']use server["']/.test(source) ? [{ name: `inline 'use server' in ${path.relative(root, file)}`, file: path.relative(root, file) }] : [];
    }
    const names = [
      ...[...source.matchAll(/export\s+async\s+function\s+(\w+)/g)].map((m) => m[1]),
      ...[...source.matchAll(/export\s+const\s+(\w+)\s*=\s*async\b/g)].map((m) => m[1]),
    ];
    return names.map((name) => ({ name, file: path.relative(root, file) }));
  });
}
