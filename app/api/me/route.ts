// DELETE /api/me: {"password"}; deletes the caller's account and what it holds. 204.
import { deleteMyAccount } from "@/lib/accounts/my-account";
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";

export const DELETE = handler(async ({ request, actor }) => {
  await deleteMyAccount(actor, await readJson(request, 10_000));
  return new Response(null, { status: 204 });
});
