// PATCH /api/hazards/{id}/position: staff move an open hazard pin ({"lon","lat","lockVersion"}).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { moveHazard } from "@/lib/map/move-pins";

export const dynamic = "force-dynamic";

export const PATCH = handler<{ id: string }>(async ({ request, params, actor }) =>
  Response.json(await moveHazard(actor, params.id, await readJson(request, 10_000))),
);
