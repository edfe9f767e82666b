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

const server = createServer((request, response) => {
  const peer = request.socket.remoteAddress ?? "unknown";
  const forwarded = request.headers["x-forwarded-for"];
  const chain = (Array.isArray(forwarded) ? forwarded.join(",") : forwarded ?? "").trim();
  request.headers["x-forwarded-for"] = chain ? `${chain}, ${peer}` : peer;
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
