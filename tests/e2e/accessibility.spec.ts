import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { demo, signInAs } from "./helpers";

// axe-core (Deque) WCAG 2.x rules: no serious or critical violations on any page.
type Visit = { path: string; as?: "admin" | "manager" | "ranger" | "rider" };
// "{trail}" stands for the id of a demo trail, looked up through the public API.
const TRAIL = "{trail}";
const PAGES: Visit[] = [
  { path: "/" },
  { path: "/sign-in" },
  { path: "/sign-up" },
  { path: "/parks/harrow-ridge" },
  { path: "/parks/harrow-ridge/map" },
  { path: "/parks/harrow-ridge/trails" },
  { path: `/trails/${TRAIL}/history` },
  { path: "/staff/harrow-ridge/morning-check", as: "ranger" },
  { path: "/staff/harrow-ridge/activity", as: "ranger" },
  { path: "/staff/harrow-ridge/hazards", as: "ranger" },
  { path: `/trails/${TRAIL}` },
  { path: "/staff/harrow-ridge/trails/new", as: "manager" },
  { path: `/staff/harrow-ridge/trails/${TRAIL}/edit`, as: "manager" },
  { path: "/staff/harrow-ridge/map", as: "ranger" },
  { path: "/me", as: "rider" },
  { path: "/pressure" },
  { path: "/pressure", as: "rider" },
  { path: "/pressure/how-it-works" },
  { path: "/me/setups", as: "rider" },
  { path: "/me/setups/new", as: "rider" },
  { path: "/me/rides", as: "rider" },
  { path: "/me/rides/new", as: "rider" },
  { path: "/me/subscriptions", as: "rider" },
  { path: "/staff/harrow-ridge/notices", as: "ranger" },
  { path: "/staff/harrow-ridge/notices/new", as: "ranger" },
  { path: "/staff", as: "manager" },
  { path: "/staff/harrow-ridge", as: "manager" },
  { path: "/staff/harrow-ridge/settings", as: "manager" },
  { path: "/staff/harrow-ridge/team", as: "manager" },
  { path: "/parks/cinder-hollow" },
  { path: "/admin/parks", as: "admin" },
  { path: "/admin/mail", as: "admin" },
];

async function seriousViolations(page: Page) {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"]).analyze();
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(" ")).slice(0, 3).join(", ")})`);
}

for (const visit of PAGES) {
  test(`accessible: ${visit.path}${visit.as ? ` as ${visit.as}` : ""}`, async ({ page }) => {
    if (visit.as) await signInAs(page, demo(visit.as));
    let path = visit.path;
    if (path.includes(TRAIL)) {
      const { trails } = await (await page.request.get("/api/parks/harrow-ridge/trails")).json();
      path = path.replace(TRAIL, trails[0].id);
    }
    await page.goto(path);
    await page.waitForLoadState("load");
    // A map is checked once drawn: MapLibre labels its locate button only after an asynchronous
    // check that the browser can share a location, and axe must not catch the moment before.
    const map = page.locator("[data-map-state]");
    if (await map.count()) await expect(map.first()).not.toHaveAttribute("data-map-state", "loading", { timeout: 30_000 });
    expect(await seriousViolations(page)).toEqual([]);
  });
}
