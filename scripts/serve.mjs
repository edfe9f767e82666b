// Serves the built app (what `next start` does) with one addition: the socket's peer address is
// appended to X-Forwarded-For, as a reverse proxy would, before Next sees the request. Next only
// fills that header when it is absent, so without this a client could write its own "address"
// and step round the sign-in and sign-up throttles (lib/shared/client-address.ts reads it).
// Plain Node (no tsx, no react-server condition): Next loads its own React for each layer.
import { createServer } from "node:http";
import next from "next";

const port = Number(process.argv[2] ?? process.env.PORT ?? 3000);
const hostname = process.env.HOSTNAME ?? "localhost";
const app = next({ dev: false, hostname, port });
await app.prepare();
const handle = app.getRequestHandler();

// Staff and admin pages read the database before anything else (the caller's roles), so with
// PostgreSQL away Next could only answer 500 through an error boundary: a page cannot set its own
// status. Before such a page we ask the app's own health route (its one pool, `SELECT 1`) and,
// if the database is down, answer 503 with Retry-After here. The answer is kept a second, so a
// burst of requests costs one probe. Public pages, the API (it maps the error to 503 itself) and
// the sign-in form (it says "briefly unavailable") are left to the app. docs/operations.md.
const DATABASE_PAGES = ["/staff", "/admin"];
const PROBE_TTL_MS = 1_000;
const RETRY_AFTER_SECONDS = "30";
const UNAVAILABLE_PAGE = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Loamcast is briefly unavailable</title></head><body><h1>Loamcast is briefly unavailable, try again in a minute</h1><p>Your saved data is safe.</p></body></html>`;
let probe = { at: 0, up: Promise.resolve(true) };

function needsDatabase(request) {
  if (request.method !== "GET" && request.method !== "HEAD") return false;
  const path = new URL(request.url ?? "/", "http://x").pathname;
  return DATABASE_PAGES.some((p) => path === p || path.startsWith(`${p}/`));
}

function databaseUp() {
  if (Date.now() - probe.at > PROBE_TTL_MS) {
    const up = fetch(`http://127.0.0.1:${port}/api/health`, { signal: AbortSignal.timeout(10_000) }).then((r) => r.status !== 503, () => false);
    probe = { at: Date.now(), up };
  }
  return probe.up;
}

function answerUnavailable(request, response) {
  response.writeHead(503, { "content-type": "text/html; charset=utf-8", "retry-after": RETRY_AFTER_SECONDS, "cache-control": "no-store", "x-content-type-options": "nosniff", "content-security-policy": "default-src 'none'; frame-ancestors 'none'" });
  response.end(request.method === "HEAD" ? undefined : UNAVAILABLE_PAGE);
}

const server = createServer(async (request, response) => {
  const peer = request.socket.remoteAddress ?? "unknown";
  const forwarded = request.headers["x-forwarded-for"];
  const chain = (Array.isArray(forwarded) ? forwarded.join(",") : forwarded ?? "").trim();
  request.headers["x-forwarded-for"] = chain ? `${chain}, ${peer}` : peer;
  if (needsDatabase(request) && !(await databaseUp())) return answerUnavailable(request, response);
  handle(request, response);
});
server.listen(port, hostname === "localhost" ? "127.0.0.1" : hostname, () => console.log(`› serving on http://${hostname}:${port}`));

// SIGTERM and SIGINT: stop taking connections, let the ones in flight finish, then leave.
for (const signal of ["SIGTERM", "SIGINT"]) {
  process.on(signal, () => {
    server.close(() => process.exit(0));
    server.closeIdleConnections?.();
    setTimeout(() => process.exit(0), 5_000).unref();
  });
}
