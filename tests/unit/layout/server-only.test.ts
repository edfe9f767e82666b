import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

/**
 * The run-time half of the boundaries: a server module that a client component imports by mistake
 * fails the build, because it starts with `import "server-only"` (Next.js docs, "Keeping
 * server-only code out of the client environment"). Server actions start with "use server" instead.
 */
function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(full);
    return /\.tsx?$/.test(entry.name) && !entry.name.endsWith(".d.ts") ? [full] : [];
  });
}

const firstStatement = (file: string) => readFileSync(file, "utf8").split("\n").find((line) => line.trim() !== "")?.trim();

// lib/server/**, and every module of a domain outside pure/ (lib/client and lib/shared run anywhere).
const serverModules = sourceFiles("lib").filter((file) => {
  const [, area] = file.split(path.sep);
  return area === "server" || (area !== "client" && area !== "shared" && !file.split(path.sep).includes("pure"));
});

describe("server modules are marked", () => {
  it("finds the server modules", () => {
    expect(serverModules).toContain(path.join("lib", "server", "logger.ts"));
    expect(serverModules.length).toBeGreaterThan(40);
  });
  it.each(serverModules)("%s starts with import \"server-only\" or \"use server\"", (file) => {
    expect(firstStatement(file)).toMatch(/^(import "server-only";|["']use server["'];?)$/);
  });
  it("pure and shared modules stay free of it, so the browser can load them", () => {
    const pure = sourceFiles("lib").filter((file) => file.split(path.sep).includes("pure") || file.startsWith(path.join("lib", "shared")));
    expect(pure.length).toBeGreaterThan(20);
    for (const file of pure) expect(readFileSync(file, "utf8"), file).not.toMatch(/^import "server-only";/m);
  });
});
