// GET /api/parks/{parkSlug}/board: today's conditions board (public), from the per-park cache.
import { errorResponse } from "@/lib/server/api/errors";
import { preparedResponse } from "@/lib/server/api/etag";
import { boardAnswer } from "@/lib/conditions/board";
import { notFound } from "@/lib/shared/errors";

export const dynamic = "force-dynamic";

// Public and read-only: no caller is loaded; a cached board costs one indexed version read.
export async function GET(request: Request, context: { params: Promise<{ parkSlug: string }> }) {
  try {
    const { parkSlug } = await context.params;
    const answer = await boardAnswer(parkSlug);
    if (!answer) throw notFound("Park not found.");
    return preparedResponse(answer, request);
  } catch (error) {
    return errorResponse(error);
  }
}
