import { mkdirSync, writeFileSync } from "node:fs";
import { expect, test, type APIRequestContext, type APIResponse } from "@playwright/test";
import { routeHandlers } from "../inventory";
import { allCallers, CALLERS, type Caller } from "./api-callers";
import { MATRIX, type Call, type Expect, type MatrixRow } from "./authorization-matrix";
import { MatrixFixtures, PARK } from "./authorization-matrix-fixtures";

/**
 * The authorization matrix (OWASP ASVS v5.0.0 8.2.1 function-level and 8.2.2 object-level access,
 * 3.5.1–3.5.3 cross-site requests): every route handler method × every caller, walked against the
 * running app with one signed-in request context per caller.
 */
const label = (row: MatrixRow) => `${row.method} ${row.route}${row.variant ? ` (${row.variant})` : ""}`;
const CROSS_SITE: Record<string, string>[] = [{ origin: "https://evil.example" }, { "sec-fetch-site": "cross-site" }];
const succeeds = (expected: Expect) => expected === "2xx" || (expected >= 200 && expected < 300);
const matches = (expected: Expect, status: number) => (expected === "2xx" ? status >= 200 && status < 300 : status === expected);

function send(context: APIRequestContext, method: string, call: Call, headers: Record<string, string> = {}): Promise<APIResponse> {
  return context.fetch(call.path, { method, data: call.data, multipart: call.multipart, form: call.form, headers, maxRedirects: 0 });
}

async function bodyOf(response: APIResponse): Promise<unknown> {
  const type = response.headers()["content-type"] ?? "";
  if (!type.includes("json")) return null;
  return response.json().catch(() => null);
}

/** Every refusal is JSON in the one error shape: {"error":{"message",...}}. */
const inErrorShape = (body: unknown) => typeof (body as { error?: { message?: unknown } } | null)?.error?.message === "string";

test("the matrix has a row for every route handler method in app/, and none for a route that is gone", () => {
  const inApp = routeHandlers().map((r) => `${r.method} ${r.route}`);
  const inMatrix = new Set(MATRIX.map((r) => `${r.method} ${r.route}`));
  expect(inApp.length).toBeGreaterThan(50);
  expect(inApp.filter((key) => !inMatrix.has(key)), "route methods without a row in tests/e2e/authorization-matrix.ts").toEqual([]);
  expect([...inMatrix].filter((key) => !inApp.includes(key)), "rows for routes that are not in app/api").toEqual([]);
  for (const row of MATRIX) expect(Object.keys(row.expect).sort(), label(row)).toEqual([...CALLERS].sort());
});

test.describe("against the running app", () => {
  test.describe.configure({ mode: "serial" });
  let as: Record<Caller, APIRequestContext>;
  let fx: MatrixFixtures;

  test.beforeAll(async ({ baseURL }, testInfo) => {
    testInfo.setTimeout(180_000);
    as = await allCallers(baseURL!);
    fx = new MatrixFixtures(as);
    await fx.setUp();
  });

  test.afterAll(async ({}, testInfo) => {
    testInfo.setTimeout(180_000);
    const failures = fx ? await fx.cleanUp() : [];
    for (const context of Object.values(as ?? {})) await context.dispose();
    expect(failures, "objects the matrix could not remove").toEqual([]);
  });

  /** What a state change would show: the park's board and map layers, trails, and people's own lists. */
  async function snapshot() {
    const read = async (caller: Caller, path: string) => {
      const response = await as[caller].get(path);
      return { status: response.status(), body: await bodyOf(response) };
    };
    const board = await read("anonymous", `/api/parks/${PARK}/board`);
    delete (board.body as { generatedAt?: string }).generatedAt;
    return {
      board,
      hazards: await read("anonymous", `/api/parks/${PARK}/hazards.geojson`),
      features: await read("anonymous", `/api/parks/${PARK}/features.geojson`),
      trails: await read("anonymous", `/api/parks/${PARK}/trails`),
      matrixTrail: await read("manager", `/api/trails/${fx.trailId}`),
      notices: await read("manager", `/api/parks/${PARK}/notices`),
      ...Object.fromEntries(
        await Promise.all(
          (["rider", "otherRider", "manager"] as const).flatMap((c) => ["setups", "ride-logs", "subscriptions"].map(async (what) => [`${c} ${what}`, await read(c, `/api/me/${what}`)] as const)),
        ),
      ),
    };
  }

  test("every route × caller answers as the matrix says", async () => {
    test.setTimeout(600_000);
    const mismatches: string[] = [];
    const lines = [`| route | ${CALLERS.join(" | ")} |`, `| --- |${CALLERS.map(() => " --- |").join("")}`];
    for (const row of MATRIX) {
      const cells: string[] = [];
      for (const caller of CALLERS) {
        const response = await send(as[caller], row.method, await row.call(fx, caller));
        const status = response.status();
        const body = await bodyOf(response);
        const expected = row.expect[caller];
        if (status >= 200 && status < 300) row.made?.(fx, caller, body);
        if (!matches(expected, status)) mismatches.push(`${label(row)} as ${caller}: expected ${expected}, got ${status} ${JSON.stringify(body)?.slice(0, 160)}`);
        else if (status >= 400 && !inErrorShape(body)) mismatches.push(`${label(row)} as ${caller}: ${status} is not in the JSON error shape`);
        cells.push(matches(expected, status) ? String(status) : `**${status}** (want ${expected})`);
      }
      lines.push(`| ${label(row)} | ${cells.join(" | ")} |`);
    }
    mkdirSync(".local/test-results", { recursive: true });
    writeFileSync(".local/test-results/authorization-matrix.md", `${lines.join("\n")}\n`);
    expect(mismatches).toEqual([]);
  });

  test("state-changing routes refuse a cross-site request and change nothing", async ({ baseURL }) => {
    test.setTimeout(300_000);
    const rows = MATRIX.filter((row) => row.method !== "GET" && !row.crossSiteExempt);
    expect(rows.length).toBeGreaterThan(25);
    // Each request is built as a caller who may make it, with a valid body: only the origin is wrong.
    const prepared = [];
    for (const row of rows) {
      // A row nobody passes (a forged token) is sent as anonymous: the origin check comes first all the same.
      const caller = CALLERS.find((c) => succeeds(row.expect[c])) ?? "anonymous";
      prepared.push({ row, caller, call: await row.call(fx, caller) });
    }
    const before = await snapshot();
    const problems: string[] = [];
    for (const { row, caller, call } of prepared) {
      for (const headers of CROSS_SITE) {
        const response = await send(as[caller], row.method, call, headers);
        if (response.status() !== 403 || !inErrorShape(await bodyOf(response))) problems.push(`${label(row)} as ${caller} with ${JSON.stringify(headers)}: ${response.status()}`);
      }
    }
    expect(problems).toEqual([]);
    expect(await snapshot()).toEqual(before);

    // The check refuses only other sites: the same request from our own origin goes through.
    const origin = new URL(baseURL!).origin;
    const own = MATRIX.find((row) => row.route === "/api/pressure" && !row.variant)!;
    expect((await send(as.rider, "POST", await own.call(fx, "rider"), { origin, "sec-fetch-site": "same-origin" })).status()).toBe(200);
  });

  test("no GET changes anything, whoever asks", async () => {
    test.setTimeout(300_000);
    const before = await snapshot();
    for (const row of MATRIX.filter((r) => r.method === "GET")) {
      for (const caller of CALLERS) await send(as[caller], "GET", await row.call(fx, caller));
    }
    expect(await snapshot()).toEqual(before);
  });
});
