// PATCH /api/hazards/{id}: resolve, reopen or edit a hazard ({lockVersion, resolved?, kind?, note?}) — staff of its park.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { updateHazard } from "@/lib/hazards/hazard-writes";

export const PATCH = handler<{ id: string }>(async ({ request, params, actor }) => {
  const hazard = await updateHazard(actor, params.id, await readJson(request, 10_000));
  return Response.json({ hazard });
});
