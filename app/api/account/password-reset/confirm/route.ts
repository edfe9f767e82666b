// POST /api/account/password-reset/confirm: {"token","password"}; sets the new password and ends every session.
import { confirmPasswordReset } from "@/lib/accounts/password-reset";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";

export const POST = handler(async ({ request }) => Response.json(await confirmPasswordReset(await readJson(request, 10_000))));
