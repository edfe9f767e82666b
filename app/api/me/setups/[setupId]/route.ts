// GET, PATCH (with lockVersion; 409 when stale), DELETE /api/me/setups/{setupId}: the caller's own setup only (else 404).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { findOwnSetup, setupView } from "@/lib/setups/setup-queries";
import { deleteSetup, updateSetup } from "@/lib/setups/setup-writes";

type Params = { setupId: string };

export const GET = handler<Params>(async ({ params, actor }) => Response.json({ setup: setupView(await findOwnSetup(actor, params.setupId)) }));

export const PATCH = handler<Params>(async ({ request, params, actor }) =>
  Response.json({ setup: await updateSetup(actor, params.setupId, await readJson(request, 20_000)) }),
);

export const DELETE = handler<Params>(async ({ params, actor }) => {
  await deleteSetup(actor, params.setupId);
  return new Response(null, { status: 204 });
});
