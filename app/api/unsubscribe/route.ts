// GET  /api/unsubscribe?token=: what the link would stop (browsers are sent to the confirm page).
// POST /api/unsubscribe?token=: unsubscribe; RFC 8058 one-click, so it needs no session and no
// Origin: mail providers post from their servers. The signed token is the authority; CSRF cannot
// forge it, and unsubscribing twice changes nothing.
import { handler } from "@/lib/server/api/handler";
import { errorResponse } from "@/lib/server/api/errors";
import { env } from "@/lib/server/env";
import { describeUnsubscribe, unsubscribeByToken } from "@/lib/notices/subscriptions";

export const dynamic = "force-dynamic";

const wantsHtml = (request: Request) => (request.headers.get("accept") ?? "").includes("text/html");
const tokenOf = (request: Request) => new URL(request.url).searchParams.get("token");
const pageFor = (token: string | null) => {
  const page = new URL("/unsubscribe", env().APP_URL);
  page.searchParams.set("token", token ?? "");
  return page;
};

export const GET = handler(async ({ request }) => {
  if (wantsHtml(request)) return Response.redirect(pageFor(tokenOf(request)), 303);
  return Response.json(await describeUnsubscribe(tokenOf(request)));
});

export async function POST(request: Request): Promise<Response> {
  try {
    const result = await unsubscribeByToken(tokenOf(request));
    // Our own page's button posts here too: send the browser back to it, now showing the result.
    if (wantsHtml(request)) return Response.redirect(pageFor(tokenOf(request)), 303);
    return Response.json(result);
  } catch (error) {
    if (wantsHtml(request)) return Response.redirect(pageFor(tokenOf(request)), 303);
    return errorResponse(error);
  }
}
