// GET /api/parks/{parkSlug}/board: today's conditions board (public), from one indexed query.
import { createHash } from "node:crypto";
import { errorResponse } from "@/lib/server/api/errors";
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
    const etag = `"${createHash("sha1").update(JSON.stringify({ ...board, generatedAt: null })).digest("base64url")}"`;
    const headers = { ETag: etag, "Cache-Control": "no-cache" };
    if (request.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
    return Response.json(board, { headers });
  } catch (error) {
    return errorResponse(error, request);
  }
}
