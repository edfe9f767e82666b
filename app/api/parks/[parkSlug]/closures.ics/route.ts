// GET /api/parks/{parkSlug}/closures.ics: planned park-wide closures, late openings and trail closures (public, RFC 5545).
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { closuresCalendarFor } from "@/lib/reach/closures";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ params }) => {
  const park = await getParkBySlug(params.parkSlug);
  return new Response(await closuresCalendarFor(park), {
    headers: {
      "Content-Type": "text/calendar; charset=utf-8",
      "Content-Disposition": `inline; filename="${park.slug}-closures.ics"`,
      "Cache-Control": "public, max-age=300",
    },
  });
});
