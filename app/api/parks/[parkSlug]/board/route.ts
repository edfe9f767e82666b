// GET /api/parks/{parkSlug}/board: today's conditions board (public), from one indexed query.
import { errorResponse } from "@/lib/server/api/errors";
import { jsonWithEtag } from "@/lib/server/api/etag";
import { boardForPark } from "@/lib/conditions/board";
import { notFound } from "@/lib/shared/errors";

export const dynamic = "force-dynamic";

// Public and read-only: no caller is loaded, so the board costs exactly one query.
export async function GET(request: Request, context: { params: Promise<{ parkSlug: string }> }) {
  try {
    const { parkSlug } = await context.params;
    const board = await boardForPark(parkSlug);
    if (!board) throw notFound("Park not found.");
    // The ETag ignores generatedAt, so an unchanged board answers 304 to a phone on poor signal.
    return jsonWithEtag(board, request, { tagOf: { ...board, generatedAt: null } });
  } catch (error) {
    return errorResponse(error, request);
  }
}
