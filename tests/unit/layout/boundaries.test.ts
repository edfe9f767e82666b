import { createRequire } from "node:module";
import { beforeAll, describe, expect, it } from "vitest";
import type { ESLint } from "eslint";

// The lint process runs typescript-eslint on TypeScript 6 (scripts/lint/use-typescript6.cjs).
createRequire(import.meta.url)("../../../scripts/lint/use-typescript6.cjs");

/**
 * The import boundaries of DEVELOPERS.md (Layout), checked on the real eslint.config.mjs: each
 * case lints one line of source as if it lived at `file`. Files need not exist.
 */
let eslint: ESLint;
beforeAll(async () => {
  const { ESLint } = await import("eslint");
  eslint = new ESLint({ cwd: process.cwd() });
  await eslint.lintText("export {};\n", { filePath: "lib/example.ts" }); // loads the config and plugins once
}, 120_000);

async function boundaryProblems(file: string, source: string) {
  const [result] = await eslint.lintText(`${source}\nexport {};\n`, { filePath: file });
  return result.messages.filter((m) => m.ruleId === "@typescript-eslint/no-restricted-imports").map((m) => m.severity);
}

const REFUSED: [string, string, string][] = [
  ["app/ → models", "app/parks/[parkSlug]/example/page.tsx", 'import { Park } from "@/models";'],
  ["route handler → models", "app/api/example/route.ts", 'import { Trail } from "@/models/trail";'],
  ["components/ → models", "components/board/example.tsx", 'import { Trail } from "@/models";'],
  ["components/ → lib/server", "components/example.tsx", 'import { getActor } from "@/lib/server/auth/actor";'],
  ["components/ → a domain's server module", "components/board/example.tsx", 'import { boardFor } from "@/lib/conditions/board";'],
  ["models/ → lib/", "models/example.ts", 'import { env } from "@/lib/server/env";'],
  ["models/ → lib/ by a relative path", "models/example.ts", 'import { env } from "../lib/server/env";'],
  ["pure → models", "lib/trails/pure/example.ts", 'import { Trail } from "@/models";'],
  ["pure → next/*", "lib/map/pure/example.ts", 'import { notFound } from "next/navigation";'],
  ["pure → node:fs", "lib/pressure/pure/physics/example.ts", 'import { readFileSync } from "node:fs";'],
  ["pure → network", "lib/conditions/pure/example.ts", 'import net from "node:net";'],
  ["pure → lib/server", "lib/conditions/pure/example.ts", 'import { env } from "@/lib/server/env";'],
  ["pure → its domain's server module", "lib/conditions/pure/example.ts", 'import { boardFor } from "@/lib/conditions/board";'],
  ["pure → its domain by a relative path", "lib/conditions/pure/example.ts", 'import { boardFor } from "../board";'],
  ["lib/shared → models", "lib/shared/example.ts", 'import { User } from "@/models";'],
  ["lib/shared → fs", "lib/shared/example.ts", 'import { promises } from "fs";'],
  ["lib/shared → lib/server", "lib/shared/example.ts", 'import { logger } from "@/lib/server/logger";'],
  ["lib/ → app/", "lib/conditions/example.ts", 'import Page from "@/app/page";'],
  ["lib/server → app/", "lib/server/example.ts", 'import Page from "@/app/page";'],
  ["lib/client → models", "lib/client/example.ts", 'import { Park } from "@/models";'],
];

const ALLOWED: [string, string, string][] = [
  ["components/ → a type from a server module", "components/board/example.tsx", 'import type { Board } from "@/lib/conditions/board";'],
  ["components/ → server actions", "components/example.tsx", 'import { saveUnits } from "@/lib/accounts/units-actions";'],
  ["components/ → pure, shared and client code", "components/example.tsx", 'import { a } from "@/lib/trails/pure/difficulty";\nimport { b } from "@/lib/shared/units";\nimport { c } from "@/lib/client/fetcher";'],
  ["app/ → lib/server and a domain", "app/parks/[parkSlug]/example/page.tsx", 'import { getActor } from "@/lib/server/auth/actor";\nimport { boardFor } from "@/lib/conditions/board";'],
  ["a domain → models, lib/server and its pure rules", "lib/conditions/example.ts", 'import { Trail } from "@/models";\nimport { env } from "@/lib/server/env";\nimport { x } from "./pure/labels";'],
  ["pure → other pure folders and lib/shared", "lib/pressure/pure/example.ts", 'import { a } from "@/lib/trails/pure/difficulty";\nimport { b } from "@/lib/shared/units";\nimport { z } from "zod";'],
  ["models/ → models/", "models/example.ts", 'import { sequelize } from "./db";'],
  ["scripts/ → anything", "scripts/example.ts", 'import { Trail } from "@/models";\nimport { env } from "@/lib/server/env";'],
];

describe("import boundaries (eslint.config.mjs, DEVELOPERS.md Layout)", () => {
  it.each(REFUSED)("refuses %s", async (_name, file, source) => {
    expect(await boundaryProblems(file, source)).toContain(2);
  });
  it.each(ALLOWED)("allows %s", async (_name, file, source) => {
    expect(await boundaryProblems(file, source)).toEqual([]);
  });
  it("refuses models in every page, the staff desk that once read them too (no page is let off)", async () => {
    expect(await boundaryProblems("app/(staff)/staff/[parkSlug]/page.tsx", 'import { Park } from "@/models";')).toEqual([2]);
  });
});
