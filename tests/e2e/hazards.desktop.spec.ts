import { expect, test } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";
import { screenPoint, trailsFromApi } from "./map-helpers";

/**
 * Hazards as a ranger pins and clears them: the pin placed by tapping the form's map, the list
 * saying which trail and how far along it (not raw coordinates), and Mark resolved with Undo.
 */
const PAGE = "/staff/harrow-ridge/hazards";

test("a hazard pinned by tapping the map, listed by trail and distance, resolved and undone", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, PAGE);
  await page.goto(PAGE);
  await expect(page.locator("[data-testid=pin-map][data-map-state=idle]")).toBeVisible({ timeout: 30_000 });
  const trail = (await trailsFromApi(page.request)).find((t) => t.properties.name === "Long Haul Climb")!;
  const line = (trail.geometry.type === "LineString" ? trail.geometry.coordinates : (trail.geometry.coordinates as number[][][])[0]) as number[][];
  const spot = line[Math.floor(line.length / 3)];
  const value = await page.locator("#hazard-trail option", { hasText: trail.properties.name }).getAttribute("value");
  await page.getByLabel("Trail (optional)").selectOption(value!);
  await page.getByTestId("pin-map").scrollIntoViewIfNeeded();
  const point = await screenPoint(page, spot, "pin-map");
  await page.mouse.click(point.x, point.y);
  // The tap fills the coordinates (to within a pixel of the map at this zoom).
  await expect.poll(async () => Math.abs(Number(await page.getByLabel("Latitude").inputValue()) - spot[1])).toBeLessThan(0.0002);
  await expect.poll(async () => Math.abs(Number(await page.getByLabel("Longitude").inputValue()) - spot[0])).toBeLessThan(0.0003);
  await page.getByLabel("Note").fill("Loose rock on the climb, map-pinned");
  await shot(page, "hazard-form-map");
  await page.getByRole("button", { name: "Pin the hazard" }).click();
  await expect(page.getByTestId("hazard-result")).toHaveText("Hazard pinned. It is on the public board now.");

  const item = page.getByRole("listitem").filter({ hasText: "Loose rock on the climb, map-pinned" }).first();
  await expect(item).toContainText(/On Long Haul Climb, \d+(\.\d)? k?m from its start · pinned \w{3} \d{1,2} \w{3}, \d{2}:\d{2}/);
  await expect(item).not.toContainText(String(spot[1]).slice(0, 6));
  await shot(page, "hazard-list");

  await item.getByRole("button", { name: "Mark resolved" }).click();
  await expect(item.getByRole("status")).toContainText("Resolved");
  await item.getByRole("button", { name: "Undo" }).click();
  await expect(item.getByRole("button", { name: "Mark resolved" })).toBeVisible();
  await page.reload();
  await expect(page.getByRole("listitem").filter({ hasText: "Loose rock on the climb, map-pinned" })).not.toHaveCount(0);
});
