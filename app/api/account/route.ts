// POST /api/account: rider self sign-up; the account signs in once the e-mailed link is opened.
import { signUpRider } from "@/lib/accounts/sign-up";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { clientAddress } from "@/lib/server/auth/client-address";

export const POST = handler(async ({ request }) => Response.json(await signUpRider(await readJson(request, 10_000), clientAddress(request.headers)), { status: 202 }));
