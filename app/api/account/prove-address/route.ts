// POST /api/account/prove-address: {"token"} from the sign-up mail; the account may sign in from now on.
import { proveAddress } from "@/lib/accounts/sign-up";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";

export const POST = handler(async ({ request }) => Response.json(await proveAddress(await readJson(request, 10_000))));
