// GET /api/trails/{id}: a trail with its figures, profile, features and versions (public).
// PATCH /api/trails/{id}: staff change name, difficulty, kind or direction (send the lockVersion read).
// DELETE /api/trails/{id}: staff archive the trail; its versions and files are kept.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { getTrailDetail } from "@/lib/trails/queries";
import { archiveTrail, updateTrailMetadata } from "@/lib/trails/edit-trail";

export const GET = handler<{ id: string }>(async ({ params, actor }) => {
  return Response.json({ trail: await getTrailDetail(params.id, actor) });
});

export const PATCH = handler<{ id: string }>(async ({ request, params, actor }) => {
  const trail = await updateTrailMetadata(actor, params.id, await readJson(request, 10_000));
  return Response.json({ trail: await getTrailDetail(trail.id, actor) });
});

export const DELETE = handler<{ id: string }>(async ({ params, actor }) => {
  const trail = await archiveTrail(actor, params.id);
  return Response.json({ archived: { id: trail.id, archivedAt: trail.archivedAt } });
});
