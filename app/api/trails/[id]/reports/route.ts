// GET /api/trails/{id}/reports?from=&to=[&revisions=all]: a trail's report history (public; reporters and every revision for staff).
// POST /api/trails/{id}/reports: staff of the trail's park post a report (a new revision).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { authorize, can } from "@/lib/server/auth/permissions";
import { postTrailReport, loadTrailWithPark } from "@/lib/conditions/write-report";
import { resolveRange, trailReportHistory } from "@/lib/conditions/history";

export const dynamic = "force-dynamic";

export const GET = handler<{ id: string }>(async ({ request, params, actor }) => {
  const { trail, park } = await loadTrailWithPark(params.id);
  const query = new URL(request.url).searchParams;
  const allRevisions = query.get("revisions") === "all";
  if (allRevisions) authorize(actor, "audit:read", { parkId: park.id });
  const staffView = can(actor, "audit:read", { parkId: park.id });
  const range = resolveRange({ from: query.get("from"), to: query.get("to") }, park);
  const reports = await trailReportHistory(trail.id, range, allRevisions, staffView);
  return Response.json({ trail: { id: trail.id, name: trail.name, park: park.slug }, ...range, reports });
});

export const POST = handler<{ id: string }>(async ({ request, params, actor }) => {
  const report = await postTrailReport(actor, params.id, await readJson(request, 20_000));
  return Response.json({ report }, { status: 201 });
});
