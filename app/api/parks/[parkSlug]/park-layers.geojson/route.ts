// GET /api/parks/{parkSlug}/park-layers.geojson: the park's base layers (boundary, contours, roads, lifts, landmarks).
import { geoJsonResponse } from "@/lib/server/api/geojson-response";
import { handler } from "@/lib/server/api/handler";
import { parkBaseLayersGeoJson } from "@/lib/map/map-queries";
import { getParkBySlug } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) =>
  geoJsonResponse(parkBaseLayersGeoJson(await getParkBySlug(params.parkSlug)), request),
);
