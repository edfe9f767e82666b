// GET /api/parks/{parkSlug}/park-layers.geojson: the park's base layers (boundary, contours, roads, lifts, landmarks).
import { geoJsonResponse } from "@/lib/api/geojson-response";
import { handler } from "@/lib/api/handler";
import { parkBaseLayersGeoJson } from "@/lib/data/map";
import { getParkBySlug } from "@/lib/data/parks";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) =>
  geoJsonResponse(parkBaseLayersGeoJson(await getParkBySlug(params.parkSlug)), request),
);
