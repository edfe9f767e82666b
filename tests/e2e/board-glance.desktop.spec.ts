import { expect, test } from "@playwright/test";
import { shot } from "./helpers";

/**
 * The rider's first glance at the board: on a phone the first screen says what can be ridden
 * today (a one-line count and the trails that changed or are not open, before the rest, the
 * filters folded); on a desktop the trails use the width.
 */
const BOARD = "/parks/harrow-ridge";

test("the board answers first: the count, then changed or not-open trails, the filters folded", async ({ page }) => {
  await page.goto(BOARD);
  const summary = page.getByTestId("board-summary");
  await expect(summary).toBeInViewport();
  const total = await page.getByTestId("board-trail").count();
  const counted = await summary.locator(".tabular-nums").allTextContents();
  expect(counted.map(Number).reduce((a, b) => a + b, 0)).toBe(total);
  await expect(page.locator("details", { hasText: "Filter trails" })).not.toHaveAttribute("open", "");

  const attention = page.getByRole("list", { name: "Trails changed or not open" }).getByTestId("board-trail");
  const rest = page.getByRole("list", { name: "Trails open as yesterday" }).getByTestId("board-trail");
  expect((await attention.count()) + (await rest.count())).toBe(total);
  // Every trail of the first group is not open or changed since yesterday; none of the rest is.
  for (const card of await attention.all()) {
    const status = await card.locator("[data-status]").first().getAttribute("data-status");
    const changed = await card.getByTestId("changed").count();
    expect(status !== "open" || changed > 0).toBe(true);
  }
  for (const card of await rest.all()) {
    await expect(card.locator("[data-status]").first()).toHaveAttribute("data-status", "open");
    await expect(card.getByTestId("changed")).toHaveCount(0);
  }
  if ((await attention.count()) > 0) {
    const firstCard = attention.first();
    const box = await firstCard.boundingBox();
    // The first trail that needs attention starts on the first screen.
    expect(box!.y).toBeLessThan(page.viewportSize()!.height);
  }
  await page.screenshot({ path: `.local/test-results/screens/board-first-screen-${page.viewportSize()?.width}.png` });
  await shot(page, "board-glance");

  if (test.info().project.name === "desktop") {
    // The width is used: cards sit side by side.
    const tops = await page.getByTestId("board-trail").evaluateAll((cards) => cards.map((c) => Math.round(c.getBoundingClientRect().top)));
    expect(new Set(tops).size).toBeLessThan(tops.length);
  }
});

test("a trail card's hazards open from a visible control", async ({ page }) => {
  await page.goto(BOARD);
  const control = page.getByTestId("hazard-count").filter({ hasText: /hazards?\s*show/ }).first();
  await expect(control).toBeVisible();
  await control.click();
  await expect(control.locator("xpath=..")).toHaveAttribute("open", "");
});
