import { expect, test } from "@playwright/test";
import sharp from "sharp";
import { shot } from "./helpers";
import { hex, near, openMap, PARK, screenPoint, trailsFromApi, TRAIL_LINE_LAYERS, type TrailFeature } from "./map-helpers";

const STATUS_LABELS = ["Open", "Caution", "Closed", "Not inspected today"];
const DIFFICULTY_LABELS = ["Easiest", "Easy", "More difficult", "Very difficult", "Extremely difficult"];
// The trade's colours as the style draws them (lib/trails/pure/difficulty.ts).
const BLUE = hex("#1d4ed8");
const GREEN = hex("#15803d");

test.describe("park map", () => {
  test("draws every trail on our own style and reaches idle", async ({ page }) => {
    const external: string[] = [];
    page.on("request", (r) => {
      if (!r.url().startsWith("http://localhost")) external.push(r.url());
    });
    await openMap(page, `/parks/${PARK}/map`);
    const drawn = await page.evaluate((layers) => {
      const map = (window as unknown as { __loamcastMap: { queryRenderedFeatures: (o: object) => { properties: { id: string } }[] } }).__loamcastMap;
      return map.queryRenderedFeatures({ layers }).map((f) => f.properties.id);
    }, TRAIL_LINE_LAYERS);
    const trails = await trailsFromApi(page.request);
    expect(drawn.length).toBeGreaterThan(0);
    expect(new Set(drawn)).toEqual(new Set(trails.map((t) => t.properties.id)));
    expect(external).toEqual([]);
  });

  test("a tap on a trail opens its card with status, inspection, length and a link", async ({ page }) => {
    const trails = await trailsFromApi(page.request);
    // Hazard pins sit on top of trails (other tests pin some): keep the tap away from them too.
    const pins: number[][] = (await (await page.request.get(`/api/parks/${PARK}/hazards.geojson`)).json()).features.map((f: { geometry: { coordinates: number[] } }) => f.geometry.coordinates);
    // The trail whose middle lies furthest from every other trail and pin, so the tap cannot land on another.
    const lines = (t: TrailFeature) => (t.geometry.type === "LineString" ? [t.geometry.coordinates as number[][]] : (t.geometry.coordinates as number[][][]));
    const middle = (t: TrailFeature) => lines(t)[0][Math.floor(lines(t)[0].length / 2)];
    const gap = (t: TrailFeature) => {
      const m = middle(t);
      const others = [...trails.filter((o) => o !== t).flatMap((o) => lines(o).flat()), ...pins];
      return Math.min(...others.map((p) => Math.hypot((p[0] - m[0]) * 0.68, p[1] - m[1])));
    };
    const target = trails.reduce((best, t) => (gap(t) > gap(best) ? t : best));

    await openMap(page, `/parks/${PARK}/map`);
    // Hazard pins and feature dots sit on top of the lines and take a tap first: hide them.
    await page.getByRole("checkbox", { name: "Hazard pins" }).uncheck();
    await page.getByRole("checkbox", { name: "Trail features (berms, jumps, drops)" }).uncheck();
    await page.getByTestId("park-map").scrollIntoViewIfNeeded();
    const point = await screenPoint(page, middle(target));
    await page.mouse.click(point.x, point.y);
    const card = page.getByTestId("map-card");
    await expect(card.getByRole("heading", { name: target.properties.name })).toBeVisible();
    await expect(card).toContainText(target.properties.statusLabel);
    await expect(card).toContainText("Last inspected");
    await expect(card).toContainText(/\d m descent|\d(\.\d)? km/);
    await expect(card.getByRole("link", { name: `Trail page: ${target.properties.name}` })).toHaveAttribute("href", `/trails/${target.properties.id}`);
    await shot(page, "map-card");
    await card.getByRole("button", { name: "Close" }).click();
    await expect(card).toBeHidden();
  });

  test("a tap exactly on a trail opens that trail, not a neighbour a few pixels away", async ({ page }) => {
    const trails = await trailsFromApi(page.request);
    await openMap(page, `/parks/${PARK}/map`);
    await page.getByRole("checkbox", { name: "Hazard pins" }).uncheck();
    await page.getByRole("checkbox", { name: "Trail features (berms, jumps, drops)" }).uncheck();
    await page.getByTestId("park-map").scrollIntoViewIfNeeded();
    const lines = (t: TrailFeature) => (t.geometry.type === "LineString" ? [t.geometry.coordinates as number[][]] : (t.geometry.coordinates as number[][][]));
    // On screen: a vertex of one trail with another trail's vertex 4–20 px away, both inside the
    // map and clear of every third trail, so both lie in one 22 px hit box.
    const pair = await page.evaluate((all) => {
      const map = (window as unknown as { __loamcastMap: { project: (ll: [number, number]) => { x: number; y: number }; getCanvas: () => HTMLCanvasElement } }).__loamcastMap;
      const { width, height } = map.getCanvas().getBoundingClientRect();
      const points = all.flatMap((t) => t.coords.map((c) => ({ id: t.id, lonLat: c, ...map.project(c as [number, number]) })));
      const inside = points.filter((p) => p.x > 40 && p.y > 40 && p.x < width - 60 && p.y < height - 40);
      for (const a of inside) {
        for (const b of inside) {
          if (a.id === b.id) continue;
          const d = Math.hypot(a.x - b.x, a.y - b.y);
          if (d < 4 || d > 20) continue;
          const crowded = inside.some((c) => c.id !== a.id && c.id !== b.id && Math.hypot(c.x - a.x, c.y - a.y) < 30);
          if (!crowded) return { a: { id: a.id, lonLat: a.lonLat }, b: { id: b.id, lonLat: b.lonLat }, px: d };
        }
      }
      return null;
    }, trails.map((t) => ({ id: t.properties.id, coords: lines(t).flat() })));
    expect(pair, "two trails within 20 px of each other on the park map").not.toBeNull();
    const name = (id: string) => trails.find((t) => t.properties.id === id)!.properties.name;
    const card = page.getByTestId("map-card");
    for (const side of [pair!.a, pair!.b]) {
      const point = await screenPoint(page, side.lonLat);
      await page.mouse.click(point.x, point.y);
      await expect(card.getByRole("heading", { name: name(side.id) })).toBeVisible();
      await card.getByRole("button", { name: "Close" }).click();
    }
    await shot(page, "map-tap-nearest");
  });

  test("the legend names every status with its pattern and every difficulty with its sign", async ({ page }) => {
    await page.goto(`/parks/${PARK}/map`);
    const legend = page.getByTestId("map-legend");
    for (const label of [...STATUS_LABELS, ...DIFFICULTY_LABELS]) await expect(legend.getByText(label, { exact: true })).toBeVisible();
    await expect(legend.locator("[data-status-swatch]")).toHaveCount(4);
    await expect(legend.locator("[data-legend-difficulty] svg")).toHaveCount(5);
  });

  test("the screenshot shows the trail lines in their difficulty colours", async ({ page }) => {
    await openMap(page, `/parks/${PARK}/map`);
    await page.getByTestId("park-map").scrollIntoViewIfNeeded();
    const png = await page.getByTestId("park-map").screenshot({ path: ".local/test-results/screens/map-canvas.png" });
    const { data, info } = await sharp(png).removeAlpha().raw().toBuffer({ resolveWithObject: true });
    let [blue, green, total] = [0, 0, 0];
    for (let i = 0; i < data.length; i += info.channels) {
      const [r, g, b] = [data[i], data[i + 1], data[i + 2]];
      total++;
      if (near(r, g, b, BLUE)) blue++;
      if (near(r, g, b, GREEN)) green++;
    }
    console.log(`map pixels: ${total}, near blue ${blue}, near green ${green}`);
    // Three blue and two green trails in the demo park; the base map uses neither colour. With no
    // report yet (thin dashed lines) a phone screenshot held about 11,000 blue and 7,700 green pixels.
    expect(blue).toBeGreaterThan(2000);
    expect(green).toBeGreaterThan(1000);
    await shot(page, "map");
  });

  test("toggles hide and show features, hazards and contours", async ({ page }) => {
    await openMap(page, `/parks/${PARK}/map`);
    const visibility = (id: string) =>
      page.evaluate((layer) => (window as unknown as { __loamcastMap: { getLayoutProperty: (l: string, p: string) => string | undefined } }).__loamcastMap.getLayoutProperty(layer, "visibility") ?? "visible", id);
    for (const [label, layer] of [["Contour lines", "lc-contours"], ["Hazard pins", "lc-hazards"], ["Trail features (berms, jumps, drops)", "lc-features"]]) {
      const box = page.getByRole("checkbox", { name: label });
      await box.uncheck();
      expect(await visibility(layer)).toBe("none");
      await box.check();
      expect(await visibility(layer)).toBe("visible");
    }
  });

  test("keyboard and screen-reader users get the controls and a text list of every trail with its status", async ({ page }) => {
    await openMap(page, `/parks/${PARK}/map`);
    const zoomIn = page.getByRole("button", { name: "Zoom in" });
    await zoomIn.focus();
    await expect(zoomIn).toBeFocused();
    const zoom = () => page.evaluate(() => (window as unknown as { __loamcastMap: { getZoom: () => number } }).__loamcastMap.getZoom());
    const before = await zoom();
    await page.keyboard.press("Enter");
    await expect.poll(zoom).toBeGreaterThan(before);
    await expect(page.getByRole("button", { name: "Find my location" })).toBeVisible();

    const list = page.getByTestId("trail-text-list");
    for (const trail of await trailsFromApi(page.request)) {
      const row = list.locator(`[data-trail-row="${trail.properties.id}"]`);
      await expect(row.getByRole("link", { name: trail.properties.name })).toHaveAttribute("href", `/trails/${trail.properties.id}`);
      await expect(row).toContainText(trail.properties.statusLabel);
    }
  });
});

test.describe("map data", () => {
  test("trails.geojson is GeoJSON with the documented properties; unknown parks get the JSON error", async ({ request }) => {
    const response = await request.get(`/api/parks/${PARK}/trails.geojson`);
    expect(response.headers()["content-type"]).toBe("application/geo+json; charset=utf-8");
    const body = await response.json();
    expect(body.features).toHaveLength(10);
    for (const f of body.features) {
      expect(Object.keys(f.properties).sort()).toEqual(["descentM", "difficulty", "direction", "id", "kind", "lastReportAt", "lengthM", "maxGradePct", "name", "status", "statusLabel", "surfaces"]);
      expect(["LineString", "MultiLineString"]).toContain(f.geometry.type);
    }
    const etag = response.headers()["etag"];
    expect((await request.get(`/api/parks/${PARK}/trails.geojson`, { headers: { "if-none-match": etag } })).status()).toBe(304);
    const missing = await request.get("/api/parks/no-such-park/trails.geojson");
    expect(missing.status()).toBe(404);
    expect(await missing.json()).toEqual({ error: { message: "Park not found." } });
  });

  test("the style and every source it names come from the app itself", async ({ request }) => {
    const style = await (await request.get(`/api/parks/${PARK}/map-style.json`)).json();
    expect(JSON.stringify(style)).not.toMatch(/https?:\/\//);
    for (const source of Object.values(style.sources) as { data: string }[]) {
      const answer = await request.get(source.data);
      expect(answer.status(), source.data).toBe(200);
      expect(answer.headers()["content-type"]).toContain("application/geo+json");
    }
    const layers = await (await request.get(`/api/parks/${PARK}/park-layers.geojson`)).json();
    const kinds = new Set(layers.features.map((f: { properties: { layer: string } }) => f.properties.layer));
    expect([...kinds].sort()).toEqual(["boundary", "contour", "landmark", "lift", "road"]);
  });
});
