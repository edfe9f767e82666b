import { expect, test } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";
import { openMap, PARK } from "./map-helpers";

type Feature = { properties: { id: string; label: string; trailId: string; trailName: string; distanceAlongM: number }; geometry: { coordinates: number[] } };
const features = async (request: import("@playwright/test").APIRequestContext): Promise<Feature[]> => (await (await request.get(`/api/parks/${PARK}/features.geojson`)).json()).features;
const metres = (a: number[], b: number[]) => Math.hypot((a[0] - b[0]) * 111_195 * Math.cos((a[1] * Math.PI) / 180), (a[1] - b[1]) * 111_195);

test("moving a feature needs a park role: anonymous 401, rider 403", async ({ page, request }) => {
  const [feature] = await features(request);
  const body = { data: { lon: feature.geometry.coordinates[0], lat: feature.geometry.coordinates[1] } };
  expect((await request.patch(`/api/trail-features/${feature.properties.id}/position`, body)).status()).toBe(401);
  await signInAs(page, demo("rider"));
  expect((await page.request.patch(`/api/trail-features/${feature.properties.id}/position`, body)).status()).toBe(403);
  // A browser request from another site is refused before anything else (ASVS v5.0.0 3.5.3).
  const crossSite = await page.request.patch(`/api/trail-features/${feature.properties.id}/position`, { ...body, headers: { origin: "https://elsewhere.example" } });
  expect(crossSite.status()).toBe(403);
});

test("a ranger drags a feature on the staff map, it snaps onto its trail, and Undo puts it back", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, `/staff/${PARK}/map`);
  await page.goto(`/staff/${PARK}/map`);
  await openMap(page, `/staff/${PARK}/map`, "pin-map");
  const before = await features(page.request);
  // A pin the finger can reach: where pins crowd at park zoom, another pin's 44 px target may lie on
  // top of this one's centre, and the drag would move that one instead.
  const key = await page.evaluate(() => {
    for (const el of document.querySelectorAll<HTMLElement>('[data-pin^="feature:"]')) {
      const r = el.getBoundingClientRect();
      if (document.elementFromPoint(r.x + r.width / 2, r.y + r.height / 2)?.closest("[data-pin]") === el) return el.dataset.pin!;
    }
    return null;
  });
  expect(key, "a feature pin that is not covered by another").not.toBeNull();
  const pin = page.locator(`[data-pin="${key}"]`);
  const id = key!.split(":")[1];
  const original = before.find((f) => f.properties.id === id)!;

  // Drag the pin along its trail (a drag straight across the line would snap back to where it was):
  // to a vertex of the trail's line about 40 m further on, projected to the screen.
  const trails = (await (await page.request.get(`/api/parks/${PARK}/trails.geojson`)).json()).features as { properties: { id: string }; geometry: { type: string; coordinates: number[][] | number[][][] } }[];
  const trail = trails.find((t) => t.properties.id === original.properties.trailId)!;
  const line = (trail.geometry.type === "LineString" ? trail.geometry.coordinates : (trail.geometry.coordinates as number[][][]).flat()) as number[][];
  const nearest = line.reduce((best, p, i) => (metres(p, original.geometry.coordinates) < metres(line[best], original.geometry.coordinates) ? i : best), 0);
  let far = nearest;
  while (far < line.length - 1 && metres(line[far], line[nearest]) < 40) far++;
  if (metres(line[far], line[nearest]) < 40) while (far > 0 && metres(line[far], line[nearest]) < 40) far--;
  const target = await page.evaluate(([lon, lat]) => (window as unknown as { __loamcastMap: { project: (p: [number, number]) => { x: number; y: number } } }).__loamcastMap.project([lon, lat]), line[far] as [number, number]);
  const canvas = (await page.getByTestId("pin-map").boundingBox())!;
  const box = (await pin.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(canvas.x + target.x, canvas.y + target.y, { steps: 8 });
  await page.mouse.up();
  await expect(page.getByTestId("pin-status")).toContainText("snapped onto its trail");
  const moved = (await features(page.request)).find((f) => f.properties.id === id)!;
  expect(metres(moved.geometry.coordinates, original.geometry.coordinates)).toBeGreaterThan(1);
  expect(moved.properties.distanceAlongM).not.toBe(original.properties.distanceAlongM);
  await shot(page, "staff-map-moved");

  await page.getByRole("button", { name: "Undo last move" }).click();
  await expect(page.getByTestId("pin-status")).toContainText("back");
  // Back at the same place along the trail, now exactly on the line (an uploaded waypoint may sit
  // up to 10 m beside it).
  // Its distance along the trail is measured again from that spot: where a trail doubles back within
  // a few metres, that can pick the other leg (known issue, see the closing note of the map work).
  const restored = (await features(page.request)).find((f) => f.properties.id === id)!;
  expect(metres(restored.geometry.coordinates, original.geometry.coordinates)).toBeLessThan(10);
  await expect(page.getByRole("button", { name: "Undo last move" })).toBeDisabled();
});

test("staff of the park see a link to move pins from the rider's map; riders do not", async ({ page }) => {
  await page.goto(`/parks/${PARK}/map`);
  await expect(page.getByRole("link", { name: "Move pins" })).toHaveCount(0);
  await signInAs(page, demo("manager"));
  await page.goto(`/parks/${PARK}/map`);
  await expect(page.getByRole("link", { name: "Move pins" })).toHaveAttribute("href", `/staff/${PARK}/map`);
});

test("staff pins are at least 44 px to touch, and each hazard is drawn once: by its pin, not also by the style", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, `/staff/${PARK}/map`);
  await openMap(page, `/staff/${PARK}/map`, "pin-map");
  const boxes = await page.locator("[data-pin]").evaluateAll((pins) => pins.map((p) => p.getBoundingClientRect()).map((r) => Math.min(r.width, r.height)));
  expect(boxes.length).toBeGreaterThan(0);
  // WCAG 2.2, 2.5.5 Target Size (Enhanced): 44 × 44 CSS pixels.
  expect(Math.min(...boxes)).toBeGreaterThanOrEqual(44);
  const hazards = (await (await page.request.get(`/api/parks/${PARK}/hazards.geojson`)).json()).features.length;
  await expect(page.locator('[data-pin^="hazard:"]')).toHaveCount(hazards);
  const drawnByStyle = await page.evaluate(() => {
    const map = (window as unknown as { __loamcastMap: { queryRenderedFeatures: (o: object) => unknown[]; getLayoutProperty: (id: string, p: string) => unknown } }).__loamcastMap;
    return { rendered: map.queryRenderedFeatures({ layers: ["lc-hazards", "lc-features"] }).length, visibility: map.getLayoutProperty("lc-hazards", "visibility") };
  });
  expect(drawnByStyle).toEqual({ rendered: 0, visibility: "none" });
});
