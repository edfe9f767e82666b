// PATCH /api/trail-features/{id}/position: the staff map's drag and undo — a thin alias of PATCH /api/trail-features/{id}
// that takes only a point (same snap, limit, lock and audit).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { moveTrailFeature } from "@/lib/map/move-pins";

export const dynamic = "force-dynamic";

export const PATCH = handler<{ id: string }>(async ({ request, params, actor }) =>
  Response.json(await moveTrailFeature(actor, params.id, await readJson(request, 10_000))),
);
