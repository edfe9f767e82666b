// GET /api/photos/{id}?size=full|thumb: a hazard photo (public, like the board that shows it).
import { errorResponse } from "@/lib/server/api/errors";
import { photoResponse } from "@/lib/photos/serve-photo";

export async function GET(request: Request, context: { params: Promise<{ id: string }> }) {
  try {
    const { id } = await context.params;
    return await photoResponse(id, new URL(request.url).searchParams.get("size"));
  } catch (error) {
    return errorResponse(error, request);
  }
}
