// POST /api/me/email: {"newEmail","password"}; mails a proof link to the new address and a notice to the old. 202.
import { requestEmailChange } from "@/lib/accounts/my-account";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";

export const POST = handler(async ({ request, actor }) => Response.json(await requestEmailChange(actor, await readJson(request, 10_000)), { status: 202 }));
