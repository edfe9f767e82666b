import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { demo, signInAs } from "./helpers";

// axe-core (Deque) WCAG 2.x rules: no serious or critical violations on any page.
type Visit = { path: string; as?: "admin" | "manager" | "ranger" | "rider" };
const PAGES: Visit[] = [
  { path: "/" },
  { path: "/sign-in" },
  { path: "/sign-up" },
  { path: "/parks/harrow-ridge" },
  { path: "/parks/harrow-ridge/map" },
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
    await page.goto(visit.path);
    await page.waitForLoadState("load");
    expect(await seriousViolations(page)).toEqual([]);
  });
}
