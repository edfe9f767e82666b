import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { expect, test } from "@playwright/test";
import { PARK } from "./map-helpers";

// The board page must stay light on a phone: MapLibre (about 1 MB of JavaScript) loads only on
// pages that show a map. Reads what `next build` wrote (this stage runs after the build).
const NEXT = path.resolve(".next");
const SIGNATURE = /maplibre/i;
const read = (file: string) => readFileSync(path.join(NEXT, file), "utf8");

/** Every JavaScript file a route names: the shared root files plus its client reference manifest. */
function routeChunks(route: string): string[] {
  const root: string[] = JSON.parse(read("build-manifest.json")).rootMainFiles;
  const manifest = read(path.join("server/app", route, "page_client-reference-manifest.js"));
  const named = [...manifest.matchAll(/"(?:\/_next\/)?(static\/chunks\/[^"]+\.js)"/g)].map((m) => m[1]);
  return [...new Set([...root, ...named])];
}

test("the board page's build output holds no MapLibre code", () => {
  const chunks = routeChunks("parks/[parkSlug]");
  expect(chunks.length).toBeGreaterThan(3);
  const carrying = chunks.filter((chunk) => SIGNATURE.test(read(chunk)));
  expect(carrying).toEqual([]);
  // The check can fail: MapLibre is in the build, in a chunk of its own.
  const all = readdirSync(path.join(NEXT, "static/chunks")).filter((f) => f.endsWith(".js"));
  expect(all.some((f) => SIGNATURE.test(read(`static/chunks/${f}`)))).toBe(true);
});

test("in the browser, the board page loads no MapLibre code and the map page does", async ({ page }) => {
  const scripts = new Map<string, string>();
  page.on("response", async (response) => {
    if (response.request().resourceType() === "script") scripts.set(response.url(), await response.text().catch(() => ""));
  });
  await page.goto(`/parks/${PARK}`);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await page.waitForTimeout(1500);
  expect([...scripts].filter(([, body]) => SIGNATURE.test(body)).map(([url]) => url)).toEqual([]);

  scripts.clear();
  await page.goto(`/parks/${PARK}/map`);
  await expect(page.locator("[data-testid=park-map][data-map-state=idle]")).toBeVisible({ timeout: 30_000 });
  expect([...scripts].some(([, body]) => SIGNATURE.test(body))).toBe(true);
});
