// GET /api/subscriptions/confirm?token=: the e-mailed double opt-in link.
// A GET because it is clicked in a mail client; the signed token, not a cookie, is the authority,
// and confirming twice changes nothing. Browsers are sent on to a page; scripts get JSON.
import { handler } from "@/lib/server/api/handler";
import { env } from "@/lib/server/env";
import { confirmSubscription } from "@/lib/notices/subscriptions";

export const dynamic = "force-dynamic";

const wantsHtml = (request: Request) => (request.headers.get("accept") ?? "").includes("text/html");

export const GET = handler(async ({ request }) => {
  const token = new URL(request.url).searchParams.get("token");
  if (!wantsHtml(request)) return Response.json({ subscription: await confirmSubscription(token) });
  const page = new URL("/subscriptions/confirmed", env().APP_URL);
  try {
    page.searchParams.set("park", (await confirmSubscription(token)).park.slug);
  } catch {
    page.searchParams.set("error", "invalid");
  }
  return Response.redirect(page, 303);
});
