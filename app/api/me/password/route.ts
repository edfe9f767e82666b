// POST /api/me/password: {"currentPassword","newPassword"}; every session of the account ends.
import { changePassword } from "@/lib/accounts/my-account";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";

export const POST = handler(async ({ request, actor }) => Response.json(await changePassword(actor, await readJson(request, 10_000))));
