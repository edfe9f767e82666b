// POST /api/me/password: {"currentPassword","newPassword"}; every session of the account ends.
import { changePassword } from "@/lib/accounts/my-account";
import { handler, readJson } from "@/lib/server/api/handler";

export const POST = handler(async ({ request, actor }) => Response.json(await changePassword(actor, await readJson(request, 10_000))));
