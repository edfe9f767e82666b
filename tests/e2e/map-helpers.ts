import { expect, type APIRequestContext, type Page } from "@playwright/test";

export const PARK = "harrow-ridge";
export const TRAIL_LINE_LAYERS = ["lc-trail-open", "lc-trail-caution", "lc-trail-closed", "lc-trail-uninspected"];

export type TrailFeature = { properties: Record<string, unknown> & { id: string; name: string; statusLabel: string }; geometry: { type: string; coordinates: number[][] | number[][][] } };

export async function trailsFromApi(request: APIRequestContext): Promise<TrailFeature[]> {
  const response = await request.get(`/api/parks/${PARK}/trails.geojson`);
  expect(response.status()).toBe(200);
  return (await response.json()).features;
}

/** Opens a map page and waits until MapLibre has drawn everything ("idle"). */
export async function openMap(page: Page, path: string, testId = "park-map") {
  await page.goto(path);
  await expect(page.locator(`[data-testid=${testId}][data-map-state=idle]`)).toBeVisible({ timeout: 30_000 });
}

/** Screen position (CSS pixels in the page) of a longitude/latitude on the map the page exposes. */
export async function screenPoint(page: Page, lonLat: number[], testId = "park-map") {
  const box = (await page.getByTestId(testId).boundingBox())!;
  const p = await page.evaluate(([lon, lat]) => {
    const map = (window as unknown as { __loamcastMap: { project: (ll: [number, number]) => { x: number; y: number } } }).__loamcastMap;
    return map.project([lon, lat]);
  }, lonLat);
  return { x: box.x + p.x, y: box.y + p.y };
}

/** Colour distance in RGB: a pixel "is" a colour when within this of it (anti-aliasing blurs edges). */
export const near = (r: number, g: number, b: number, [R, G, B]: number[], within = 60) => Math.hypot(r - R, g - G, b - B) <= within;
export const hex = (h: string) => [1, 3, 5].map((i) => parseInt(h.slice(i, i + 2), 16));
