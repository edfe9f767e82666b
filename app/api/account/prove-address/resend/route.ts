// POST /api/account/prove-address/resend: {"email"}; a new proof link if that account still waits for one. 202 always.
import { resendProof } from "@/lib/accounts/sign-up";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { clientAddress } from "@/lib/server/auth/client-address";

export const POST = handler(async ({ request }) => Response.json(await resendProof(await readJson(request, 10_000), clientAddress(request.headers)), { status: 202 }));
