import { expect, test } from "@playwright/test";
import { shot } from "./helpers";

/** A trail's page leads with today, then the line, then the figures; features sit on the profile. */
test("the trail page: today's status first, the line drawn, features numbered along the profile, kind and direction in words", async ({ page, request }) => {
  const board = await (await request.get("/api/parks/harrow-ridge/board")).json();
  const withFeatures = [];
  for (const t of board.trails as { id: string; name: string }[]) {
    const detail = await (await request.get(`/api/trails/${t.id}`)).json();
    if (detail.trail.features.length > 0 && detail.trail.profile.length > 1) withFeatures.push(detail.trail);
  }
  expect(withFeatures.length).toBeGreaterThan(0);
  const trail = withFeatures[0];
  await page.goto(`/trails/${trail.id}`);
  await expect(page.getByRole("heading", { level: 1, name: trail.name })).toBeVisible();
  const headings = await page.getByRole("heading", { level: 2 }).allTextContents();
  expect(headings.indexOf("Today")).toBe(0);
  expect(headings.indexOf("The line")).toBeLessThan(headings.indexOf("Measured from the GPS line"));
  const today = page.getByRole("region", { name: "Today" });
  await expect(today.locator("[data-status]").first()).toBeVisible();
  await expect(today.getByTestId("inspected")).toBeVisible();
  await expect(today).toBeInViewport();
  await expect(page.getByTestId("trail-sketch")).toBeVisible();
  await expect(page.locator("[data-profile-mark]")).toHaveCount(trail.features.length);
  await expect(page.getByText(/^Ridden (downhill|uphill|both ways)$/)).toBeVisible();
  await page.screenshot({ path: `.local/test-results/screens/trail-page-first-screen-${page.viewportSize()?.width}.png` });
  await shot(page, "trail-page");
});
