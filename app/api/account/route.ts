// POST /api/account: rider self sign-up.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { signUpRider } from "@/lib/accounts/sign-up";

export const POST = handler(async ({ request }) => Response.json({ user: await signUpRider(await readJson(request)) }, { status: 201 }));
