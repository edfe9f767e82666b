// GET /api/trails/{id}/download?format=gpx|geojson&version=N: the trail's file as an attachment (public).
import { handler } from "@/lib/server/api/handler";
import { trailDownload } from "@/lib/trails/download";
import { trailDownloadQuerySchema } from "@/lib/trails/pure/schemas";

export const GET = handler<{ id: string }>(async ({ request, params, actor }) => {
  const query = trailDownloadQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const file = await trailDownload(params.id, actor, query);
  return new Response(new Uint8Array(Buffer.from(file.body)), {
    headers: {
      "Content-Type": file.contentType,
      "Content-Disposition": `attachment; filename="${file.filename}"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "no-store",
    },
  });
});
