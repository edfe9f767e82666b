// GET /parks/{parkSlug}/manifest.webmanifest: the manifest a rider installs from a park's pages; it starts on that park's board (public).
import { errorResponse } from "@/lib/server/api/errors";
import { getParkBySlug } from "@/lib/parks/queries";
import { webAppManifest } from "@/lib/reach/pure/manifest";

export const dynamic = "force-dynamic";

export async function GET(_request: Request, context: { params: Promise<{ parkSlug: string }> }) {
  try {
    const park = await getParkBySlug((await context.params).parkSlug);
    return Response.json(webAppManifest({ slug: park.slug, name: park.name }), {
      headers: { "Content-Type": "application/manifest+json", "Cache-Control": "public, max-age=3600" },
    });
  } catch (error) {
    return errorResponse(error);
  }
}
