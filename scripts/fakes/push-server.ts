import http from "node:http";
import { createPublicKey, verify } from "node:crypto";

/**
 * A local stand-in for a browser's push service (RFC 8030), for development and tests. It takes
 * pushes at POST /push/{subscription}, checks what a push service checks (the VAPID token of
 * RFC 8292, the aes128gcm encoding of RFC 8291, a TTL) and keeps what it accepts in memory.
 * Control API on the same port:
 *   GET /control/received · DELETE /control/received
 *   POST /control/mode {"mode":"accept"|"unavailable","forMs"?: n}  (unavailable: 503 to every push)
 *   POST /control/gone {"subscription":"…"}  (410 Gone for that subscription from now on)
 */
export type ReceivedPush = { id: number; subscription: string; body: string; ttl: number; urgency: string | null; vapidKey: string; receivedAt: string };
export type FakePushMode = "accept" | "unavailable";

/** RFC 8030 §7.2: a push service must accept 4,096 bytes of payload; we accept no more. */
const MAX_BODY = 4096;
const DAY_SECONDS = 24 * 3600;

const fromBase64url = (text: string) => Buffer.from(text, "base64url");

/**
 * Checks `Authorization: vapid t=<JWT>, k=<key>` (RFC 8292 §3): an ES256 JWT signed by the P-256
 * key in k, its aud the push service's origin, its exp in the future and at most 24 hours ahead
 * (§2), and a sub to contact. Returns why it is refused, or null when it is good.
 */
export function vapidProblem(authorization: string | undefined, origin: string, nowSeconds = Date.now() / 1000): string | null {
  const match = /^vapid\s+(.+)$/i.exec(authorization ?? "");
  if (!match) return "no vapid Authorization header";
  const params = new Map(match[1].split(",").map((part) => {
    const [name, ...rest] = part.trim().split("=");
    return [name.trim(), rest.join("=").trim()] as const;
  }));
  const token = params.get("t");
  const key = params.get("k");
  if (!token || !key) return "the vapid header needs t= and k=";
  const raw = fromBase64url(key);
  if (raw.length !== 65 || raw[0] !== 4) return "k is not an uncompressed P-256 public key";
  const [header, claims, signature] = token.split(".");
  if (!header || !claims || !signature) return "t is not a JWT";
  let head: { alg?: string };
  let body: { aud?: unknown; exp?: unknown; sub?: unknown };
  try {
    head = JSON.parse(fromBase64url(header).toString("utf8"));
    body = JSON.parse(fromBase64url(claims).toString("utf8"));
  } catch {
    return "t is not a JWT";
  }
  if (head.alg !== "ES256") return "the JWT must be ES256";
  const publicKey = createPublicKey({ key: { kty: "EC", crv: "P-256", x: raw.subarray(1, 33).toString("base64url"), y: raw.subarray(33).toString("base64url") }, format: "jwk" });
  // JWS ES256 signatures are r || s, 64 bytes (RFC 7518 §3.4), not DER.
  const signed = verify("sha256", Buffer.from(`${header}.${claims}`), { key: publicKey, dsaEncoding: "ieee-p1363" }, fromBase64url(signature));
  if (!signed) return "the JWT signature does not match k";
  if (body.aud !== origin) return `aud must be ${origin}`;
  if (typeof body.exp !== "number" || body.exp <= nowSeconds) return "the JWT has expired";
  if (body.exp > nowSeconds + DAY_SECONDS) return "exp is more than 24 hours ahead";
  if (typeof body.sub !== "string" || !/^(mailto:|https:)/.test(body.sub)) return "sub must be a mailto: or https: contact";
  return null;
}

export async function startFakePush(opts: { port: number; host?: string }) {
  const host = opts.host ?? "127.0.0.1";
  const origin = `http://${host}:${opts.port}`;
  const received: ReceivedPush[] = [];
  const gone = new Set<string>();
  let mode: FakePushMode = "accept";
  let modeTimer: NodeJS.Timeout | undefined;
  let nextId = 1;

  const setMode = (next: FakePushMode, forMs?: number) => {
    clearTimeout(modeTimer);
    mode = next;
    if (forMs) modeTimer = setTimeout(() => (mode = "accept"), forMs);
  };

  const readBody = async (req: http.IncomingMessage) => {
    const chunks: Buffer[] = [];
    let size = 0;
    for await (const chunk of req as AsyncIterable<Buffer>) {
      size += chunk.length;
      if (size > MAX_BODY + 1) break;
      chunks.push(chunk);
    }
    return Buffer.concat(chunks);
  };

  const server = http.createServer(async (req, res) => {
    const send = (status: number, body: unknown, headers: Record<string, string> = {}) => {
      res.writeHead(status, { "content-type": "application/json", ...headers });
      res.end(JSON.stringify(body));
    };
    const url = new URL(req.url ?? "/", origin);
    const push = /^\/push\/([A-Za-z0-9_-]{1,200})$/.exec(url.pathname);
    if (push && req.method === "POST") {
      const body = await readBody(req);
      const subscription = push[1];
      if (gone.has(subscription)) return send(410, { error: "this subscription has expired" });
      if (mode === "unavailable") return send(503, { error: "unavailable for now" }, { "retry-after": "1" });
      const problem = vapidProblem(req.headers.authorization, origin);
      if (problem) return send(403, { error: problem });
      const ttl = Number(req.headers.ttl);
      if (req.headers.ttl === undefined || !Number.isInteger(ttl) || ttl < 0) return send(400, { error: "a TTL header is required (RFC 8030 §5.2)" });
      if (body.length > MAX_BODY) return send(413, { error: "payload too large" });
      if (body.length > 0 && req.headers["content-encoding"] !== "aes128gcm") return send(415, { error: "the payload must be aes128gcm (RFC 8291)" });
      const key = /k=([A-Za-z0-9_-]+)/.exec(req.headers.authorization ?? "")![1];
      const id = nextId++;
      received.push({ id, subscription, body: body.toString("base64"), ttl, urgency: (req.headers.urgency as string) ?? null, vapidKey: key, receivedAt: new Date().toISOString() });
      return send(201, {}, { location: `${origin}/message/${id}` });
    }
    if (url.pathname === "/control/received" && req.method === "GET") return send(200, { mode, received });
    if (url.pathname === "/control/received" && req.method === "DELETE") {
      received.length = 0;
      return send(200, { cleared: true });
    }
    if ((url.pathname === "/control/mode" || url.pathname === "/control/gone") && req.method === "POST") {
      try {
        const wanted = JSON.parse((await readBody(req)).toString("utf8"));
        if (url.pathname === "/control/gone" && typeof wanted.subscription === "string") {
          gone.add(wanted.subscription);
          return send(200, { gone: [...gone] });
        }
        if (!["accept", "unavailable"].includes(wanted.mode)) return send(400, { error: "unknown mode" });
        setMode(wanted.mode, typeof wanted.forMs === "number" ? wanted.forMs : undefined);
        return send(200, { mode });
      } catch {
        return send(400, { error: "bad JSON" });
      }
    }
    send(404, { error: "not found" });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, host, () => resolve());
  });

  return {
    origin,
    received,
    setMode,
    /** From now on, pushes to this subscription get 410 Gone. */
    markGone: (subscription: string) => void gone.add(subscription),
    endpointFor: (subscription: string) => `${origin}/push/${subscription}`,
    async close() {
      clearTimeout(modeTimer);
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
