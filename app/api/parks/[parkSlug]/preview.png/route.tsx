// GET /api/parks/{parkSlug}/preview.png[?trail=id]: the link-preview image with today's counts (public).
import { errorResponse } from "@/lib/server/api/errors";
import { previewImage } from "@/lib/reach/preview-image";

export const dynamic = "force-dynamic";

export async function GET(request: Request, context: { params: Promise<{ parkSlug: string }> }) {
  try {
    return await previewImage((await context.params).parkSlug, new URL(request.url).searchParams);
  } catch (error) {
    return errorResponse(error);
  }
}
