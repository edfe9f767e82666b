// GET /api/parks/{parkSlug}/map-style.json: the park's MapLibre style (our own, or ours over MAP_STYLE_URL).
import { jsonWithEtag } from "@/lib/server/api/etag";
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { parkMapStyle } from "@/lib/map/park-style";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params }) =>
  jsonWithEtag(await parkMapStyle(await getParkBySlug(params.parkSlug)), request),
);
