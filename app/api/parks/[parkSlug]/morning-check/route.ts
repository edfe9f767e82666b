// POST /api/parks/{parkSlug}/morning-check: the morning check, every marked trail in one transaction (staff of the park).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { saveMorningCheck } from "@/lib/conditions/morning-check";
import { getParkBySlug } from "@/lib/parks/queries";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const result = await saveMorningCheck(actor, park, await readJson(request, 500_000));
  return Response.json(result, { status: 201 });
});
