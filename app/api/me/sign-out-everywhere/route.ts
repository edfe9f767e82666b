// POST /api/me/sign-out-everywhere: {"password"}; ends every session of the account, this one too. 204.
import { signOutEverywhere } from "@/lib/accounts/my-account";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";

export const POST = handler(async ({ request, actor }) => {
  await signOutEverywhere(actor, await readJson(request, 10_000));
  return new Response(null, { status: 204 });
});
