// GET /api/parks/{parkSlug}/reports.csv?from=&to=: current reports of every trail as CSV (staff of the park).
import { handler } from "@/lib/server/api/handler";
import { UTF8_BOM } from "@/lib/shared/csv";
import { authorize } from "@/lib/server/auth/permissions";
import { reportsCsv } from "@/lib/conditions/pure/report-csv";
import { getParkBySlug } from "@/lib/parks/queries";
import { parkReportsForExport, resolveRange } from "@/lib/conditions/history";

export const dynamic = "force-dynamic";

export const GET = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  authorize(actor, "reports:export", { parkId: park.id });
  const query = new URL(request.url).searchParams;
  const range = resolveRange({ from: query.get("from"), to: query.get("to") }, park);
  const csv = reportsCsv(await parkReportsForExport(park.id, range), park.timeZone);
  return new Response(UTF8_BOM + csv, {
    headers: {
      // RFC 4180 §3 registers text/csv with the optional "header" parameter.
      "Content-Type": "text/csv; charset=utf-8; header=present",
      "Content-Disposition": `attachment; filename="${park.slug}-reports-${range.from}-to-${range.to}.csv"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "private, no-store",
    },
  });
});
