import { validateStyleMin } from "@maplibre/maplibre-gl-style-spec";
import type { LayerSpecification, StyleSpecification } from "maplibre-gl";
import { describe, expect, it } from "vitest";
import { LAYER_IDS, SOURCE_IDS, TOGGLE_GROUPS, TRAIL_LINE_LAYER_IDS, trailLineLayerId } from "@/lib/map/pure/layer-ids";
import { STATUS_LOOKS, TRAIL_STATUS_KEYS } from "@/lib/map/pure/status";
import { buildParkStyle, overlayOnHostedStyle } from "@/lib/map/pure/style";
import { DIFFICULTIES } from "@/lib/trails/pure/vocabulary";
import { difficultyValues } from "@/lib/trails/pure/schemas";

// Checked against the MapLibre style specification itself (@maplibre/maplibre-gl-style-spec,
// the validator MapLibre GL JS ships with), not against our own reading of it.
const input = { parkSlug: "harrow-ridge", parkName: "Harrow Ridge Bike Park", center: [-121.94, 47.3] as [number, number] };
const style = buildParkStyle(input);
const layer = (id: string) => style.layers.find((l) => l.id === id) as LayerSpecification & { paint?: Record<string, unknown>; layout?: Record<string, unknown>; filter?: unknown };

function strings(value: unknown, out: string[] = []): string[] {
  if (typeof value === "string") out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => strings(v, out));
  else if (value && typeof value === "object") Object.values(value).forEach((v) => strings(v, out));
  return out;
}

describe("the park's own map style", () => {
  it("is valid against the MapLibre style specification (version 8)", () => {
    expect(style.version).toBe(8);
    expect(validateStyleMin(style)).toEqual([]);
  });

  it("writes every label at 12 px or more, at every zoom (WCAG 2.x legibility: common practice, no published minimum)", () => {
    const sizes = style.layers.flatMap((l) => {
      const size = (l as { layout?: Record<string, unknown> }).layout?.["text-size"];
      if (size === undefined) return [];
      // A number, or ["interpolate", curve, ["zoom"], zoom1, size1, zoom2, size2…]: the sizes are every other stop.
      return typeof size === "number" ? [size] : (size as unknown[]).slice(3).filter((_, i) => i % 2 === 1).map(Number);
    });
    expect(sizes.length).toBeGreaterThan(5);
    expect(Math.min(...sizes)).toBeGreaterThanOrEqual(12);
  });

  it("needs no other host: no http(s) or protocol-relative URL, no tiles, sprite or glyph server", () => {
    const everything = strings(style);
    expect(everything.filter((s) => /^[a-z][a-z0-9+.-]*:\/\//i.test(s) || s.startsWith("//"))).toEqual([]);
    expect(style.sprite).toBeUndefined();
    expect(style.glyphs).toBeUndefined();
    for (const source of Object.values(style.sources)) {
      expect(source.type).toBe("geojson");
      expect((source as { data: unknown }).data).toMatch(/^\/api\/parks\/harrow-ridge\/[a-z-]+\.geojson$/);
    }
    expect(Object.values(style["font-faces"] ?? {})).toEqual(["/map/fonts/inter-latin-var.woff2"]);
  });

  it("draws the park's base layers, trails, features and hazards", () => {
    for (const id of [LAYER_IDS.land, LAYER_IDS.boundary, LAYER_IDS.contours, LAYER_IDS.contoursIndex, LAYER_IDS.roads, LAYER_IDS.lifts, LAYER_IDS.landmarks, LAYER_IDS.landmarkLabels, LAYER_IDS.trailCasing, LAYER_IDS.trailNames, LAYER_IDS.features, LAYER_IDS.hazards, ...TRAIL_LINE_LAYER_IDS]) {
      expect(layer(id), id).toBeDefined();
    }
    // Trails over the ground, hazards over the trails.
    const order = style.layers.map((l) => l.id);
    expect(order.indexOf(LAYER_IDS.contours)).toBeLessThan(order.indexOf(LAYER_IDS.trailCasing));
    expect(order.indexOf(trailLineLayerId("open"))).toBeLessThan(order.indexOf(LAYER_IDS.hazards));
  });

  it("gives every status its own line layer and pattern, and every pattern differs without colour", () => {
    const signatures = TRAIL_STATUS_KEYS.map((key) => {
      const line = layer(trailLineLayerId(key));
      expect(JSON.stringify(line.filter)).toContain(`"${key}"`);
      expect(line.paint?.["line-dasharray"] ?? null).toEqual(STATUS_LOOKS[key].dasharray);
      return JSON.stringify([STATUS_LOOKS[key].dasharray, STATUS_LOOKS[key].widthScale, STATUS_LOOKS[key].lineCap]);
    });
    expect(new Set(signatures).size).toBe(TRAIL_STATUS_KEYS.length);
    expect(STATUS_LOOKS.open.dasharray).toBeNull();
  });

  it("writes every status as a word on the map too", () => {
    const names = JSON.stringify(layer(LAYER_IDS.trailNames).layout?.["text-field"]);
    expect(names).toContain('"tag"');
    const tags = JSON.stringify(layer(LAYER_IDS.trailStatusTags).layout?.["text-field"]);
    for (const key of TRAIL_STATUS_KEYS.filter((k) => STATUS_LOOKS[k].repeatTag)) expect(tags).toContain(STATUS_LOOKS[key].tag);
    expect(TRAIL_STATUS_KEYS.filter((k) => STATUS_LOOKS[k].repeatTag)).toEqual(["caution", "closed"]);
    expect(new Set(TRAIL_STATUS_KEYS.map((k) => STATUS_LOOKS[k].tag)).size).toBe(4);
  });

  it("colours trails by the trade's difficulty scale, with a dark casing under white lines", () => {
    const colour = JSON.stringify(layer(trailLineLayerId("open")).paint?.["line-color"]);
    for (const d of difficultyValues) expect(colour).toContain(`"${d}","${DIFFICULTIES[d].colour}"`);
    const casing = JSON.stringify(layer(LAYER_IDS.trailCasing).paint?.["line-color"]);
    expect(casing).toContain(`"easiest","${DIFFICULTIES.easiest.outline}"`);
    expect(DIFFICULTIES.easiest.colour).toBe("#ffffff");
  });

  it("lets riders toggle only layers that exist", () => {
    for (const group of Object.values(TOGGLE_GROUPS)) for (const id of group.layers) expect(layer(id), id).toBeDefined();
  });
});

describe("the park's layers over a hosted vector style (MAP_STYLE_URL)", () => {
  const hosted = {
    version: 8,
    name: "hosted example",
    glyphs: "https://tiles.example.test/fonts/{fontstack}/{range}.pbf",
    sources: { base: { type: "vector", tiles: ["https://tiles.example.test/{z}/{x}/{y}.pbf"], maxzoom: 14 } },
    layers: [
      { id: "background", type: "background", paint: { "background-color": "#eeeeee" } },
      { id: "water", type: "fill", source: "base", "source-layer": "water", paint: { "fill-color": "#aaccee" } },
    ],
  } as StyleSpecification;
  const merged = overlayOnHostedStyle(hosted, input);

  it("stays valid, keeps the hosted ground first and puts the park's layers on top", () => {
    expect(validateStyleMin(merged)).toEqual([]);
    expect(merged.layers.slice(0, 2).map((l) => l.id)).toEqual(["background", "water"]);
    expect(merged.layers.at(-1)?.id).toBe(LAYER_IDS.hazardLabels);
    expect(merged.glyphs).toBe(hosted.glyphs);
    expect(merged.sources.base).toEqual(hosted.sources.base);
    expect(Object.keys(merged.sources)).toEqual(expect.arrayContaining(Object.values(SOURCE_IDS)));
  });

  it("drops our own ground (the hosted style draws it) and keeps our label font", () => {
    const ids = merged.layers.map((l) => l.id);
    expect(ids).not.toContain(LAYER_IDS.land);
    expect(ids).not.toContain(LAYER_IDS.parkFill);
    expect(ids).toContain(LAYER_IDS.contours);
    expect(merged["font-faces"]?.["Loamcast Sans"]).toBe("/map/fonts/inter-latin-var.woff2");
  });
});
