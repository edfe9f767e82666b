// POST /api/account/email/confirm: {"token"} from the mail sent to a new address; the account moves there.
import { confirmEmailChange } from "@/lib/accounts/my-account";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";

export const POST = handler(async ({ request }) => Response.json(await confirmEmailChange(await readJson(request, 10_000))));
