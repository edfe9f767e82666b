import type { LayerSpecification, StyleSpecification } from "maplibre-gl";
import { groundLayers, landmarkLayers, parkBaseLayers } from "./base-layers";
import { MAP_FONT, parkSources } from "./sources";
import { featureLayers, hazardLayers, trailLayers } from "./trail-layers";

export type ParkStyleInput = { parkSlug: string; parkName: string; center: [lon: number, lat: number] };

/**
 * Map styles are data: this builds a MapLibre style (specification version 8) for one park from
 * the app's own GeoJSON endpoints. No tiles, sprites, glyph servers or keys: labels are drawn
 * from the app's own font file through the style's `font-faces`.
 */
export function buildParkStyle(input: ParkStyleInput): StyleSpecification {
  return {
    version: 8,
    name: `Loamcast: ${input.parkName}`,
    metadata: { "loamcast:park": input.parkSlug },
    center: input.center,
    zoom: 13.5,
    "font-faces": { [MAP_FONT.name]: MAP_FONT.url },
    sources: parkSources(input.parkSlug),
    layers: [...groundLayers(), ...parkOverlayLayers()],
  };
}

/** What the park draws over any ground: its base layers, then trails, features and hazards on top. */
export function parkOverlayLayers(): LayerSpecification[] {
  return [...parkBaseLayers(), ...trailLayers(), ...landmarkLayers(), ...featureLayers(), ...hazardLayers()];
}

/**
 * The park's own layers drawn over a hosted vector style (MAP_STYLE_URL in production): the
 * hosted style keeps its ground, sources and glyphs; ours are added after its layers.
 */
export function overlayOnHostedStyle(hosted: StyleSpecification, input: ParkStyleInput): StyleSpecification {
  const sources = parkSources(input.parkSlug);
  const overlay = parkOverlayLayers();
  const ours = new Set([...Object.keys(sources), ...overlay.map((l) => l.id)]);
  const hostedLayers = hosted.layers.filter((layer) => !ours.has(layer.id));
  return {
    ...hosted,
    metadata: { ...(isObject(hosted.metadata) ? hosted.metadata : {}), "loamcast:park": input.parkSlug },
    "font-faces": { ...(hosted["font-faces"] ?? {}), [MAP_FONT.name]: MAP_FONT.url },
    sources: { ...hosted.sources, ...sources },
    layers: [...hostedLayers, ...overlay],
  };
}

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === "object" && value !== null && !Array.isArray(value);
