// GET /embed/parks/{parkSlug}: the status card a park frames on its own website (public; no cookies, no script).
import { errorResponse } from "@/lib/server/api/errors";
import { embedCardResponse } from "@/lib/reach/embed";

export const dynamic = "force-dynamic";

export async function GET(_request: Request, context: { params: Promise<{ parkSlug: string }> }) {
  try {
    return await embedCardResponse((await context.params).parkSlug);
  } catch (error) {
    return errorResponse(error);
  }
}
