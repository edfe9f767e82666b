// GET /api/parks/{parkSlug}/status.json: today's trail statuses for a park's own website (public, CORS open to any origin).
// OPTIONS answers the CORS preflight a browser sends when a script revalidates with If-None-Match.
import { errorResponse } from "@/lib/server/api/errors";
import { jsonWithEtag } from "@/lib/server/api/etag";
import { statusFeedFor, STATUS_FEED_CORS } from "@/lib/reach/status";

export const dynamic = "force-dynamic";

// Public and read-only: no caller is loaded, like the board.
export async function GET(request: Request, context: { params: Promise<{ parkSlug: string }> }) {
  try {
    const { parkSlug } = await context.params;
    // A CDN may hold it for a minute; browsers check back each time and get a 304 when nothing changed.
    const cache = "public, max-age=0, s-maxage=60, stale-while-revalidate=60";
    return jsonWithEtag(await statusFeedFor(parkSlug), request, "application/json", { ...STATUS_FEED_CORS, "cache-control": cache });
  } catch (error) {
    return errorResponse(error);
  }
}

export const OPTIONS = () => new Response(null, { status: 204, headers: { ...STATUS_FEED_CORS, "access-control-max-age": "86400" } });
