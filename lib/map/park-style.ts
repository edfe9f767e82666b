import "server-only";
import type { StyleSpecification } from "maplibre-gl";
import { z } from "zod";
import { env } from "@/lib/server/env";
import { buildParkStyle, overlayOnHostedStyle, type ParkStyleInput } from "./pure/style";
import { requestLogger } from "@/lib/server/logger";

/**
 * The style a park's map loads. With MAP_STYLE_URL set (production), the hosted vector style is
 * the ground and the park's layers go on top; if it cannot be fetched, our own ground is used,
 * so the map still shows every trail.
 */
const hostedShape = z.object({ version: z.literal(8), sources: z.record(z.string(), z.unknown()), layers: z.array(z.object({ id: z.string() }).passthrough()) }).passthrough();

const CACHE_MS = 10 * 60 * 1000;
let cached: { url: string; at: number; style: StyleSpecification } | undefined;

async function hostedStyle(url: string): Promise<StyleSpecification | null> {
  if (cached && cached.url === url && Date.now() - cached.at < CACHE_MS) return cached.style;
  try {
    const response = await fetch(url, { signal: AbortSignal.timeout(5000), headers: { accept: "application/json" } });
    if (!response.ok) throw new Error(`status ${response.status}`);
    const style = hostedShape.parse(await response.json()) as unknown as StyleSpecification;
    cached = { url, at: Date.now(), style };
    return style;
  } catch (error) {
    (await requestLogger()).warn({ err: error, host: new URL(url).host }, "hosted map style unavailable; using the park's own ground");
    return null;
  }
}

export async function parkMapStyle(park: { slug: string; name: string; centerLon: number; centerLat: number }): Promise<StyleSpecification> {
  const input: ParkStyleInput = { parkSlug: park.slug, parkName: park.name, center: [park.centerLon, park.centerLat] };
  const url = env().MAP_STYLE_URL;
  const hosted = url ? await hostedStyle(url) : null;
  return hosted ? overlayOnHostedStyle(hosted, input) : buildParkStyle(input);
}
