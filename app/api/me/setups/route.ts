// GET /api/me/setups: the caller's setups. POST /api/me/setups: save a new one.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { listSetups } from "@/lib/setups/setup-queries";
import { createSetup } from "@/lib/setups/setup-writes";

export const GET = handler(async ({ actor }) => Response.json({ setups: await listSetups(actor) }));

export const POST = handler(async ({ request, actor }) =>
  Response.json({ setup: await createSetup(actor, await readJson(request, 20_000)) }, { status: 201 }),
);
