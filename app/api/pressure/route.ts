// POST /api/pressure: today's pressure band per wheel, with reasons and cautions (public; a saved setupId needs sign-in).
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { pressureForRequest } from "@/lib/pressure/pressure-today";

export const POST = handler(async ({ request, actor }) => Response.json(await pressureForRequest(actor, await readJson(request, 50_000))));
