// POST /api/account/password-reset: {"email"}; mails a one-hour reset link. 202 and the same body for any address.
import { requestPasswordReset } from "@/lib/accounts/password-reset";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { clientAddress } from "@/lib/server/auth/client-address";

export const POST = handler(async ({ request }) => Response.json(await requestPasswordReset(await readJson(request, 10_000), clientAddress(request.headers)), { status: 202 }));
