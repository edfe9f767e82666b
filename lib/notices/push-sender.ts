import "server-only";
import webpush from "web-push";
import { env } from "@/lib/server/env";

/**
 * Sends one Web Push message (RFC 8030): `web-push` encrypts the payload (RFC 8291, aes128gcm)
 * and signs the VAPID token (RFC 8292); we send the request with fetch, which speaks both the
 * https of real push services and the plain http of the loopback fake. A refusal throws an
 * error carrying the push service's status, for classifyPushError.
 */
export type PushTarget = { endpoint: string; p256dh: string; auth: string };
export type PushSender = (target: PushTarget, payload: string) => Promise<void>;
export type VapidKeys = { subject: string; publicKey: string; privateKey: string };

/** A push may wait a day in the push service for a phone that is off; after that it is old news. */
const TTL_SECONDS = 24 * 3600;

export class PushRefused extends Error {
  constructor(readonly statusCode: number, detail: string) {
    super(`the push service refused: ${detail || "no reason given"}`.slice(0, 300));
  }
}

/** Nothing was sent: the push could not be built (a browser key no encryption accepts). Retrying will not help. */
export class PushUnsendable extends Error {
  readonly permanent = true;
}

function requestFor(target: PushTarget, payload: string, vapid: VapidKeys) {
  try {
    return webpush.generateRequestDetails({ endpoint: target.endpoint, keys: { p256dh: target.p256dh, auth: target.auth } }, payload, {
      vapidDetails: vapid,
      TTL: TTL_SECONDS,
      urgency: "high",
      contentEncoding: "aes128gcm",
    });
  } catch (error) {
    throw new PushUnsendable(`could not encrypt to this browser: ${(error as Error).message}`.slice(0, 300));
  }
}

export function createPushSender(vapid: VapidKeys, timeoutMs = 10_000): PushSender {
  return async (target, payload) => {
    const details = requestFor(target, payload, vapid);
    // fetch sets Content-Length itself from the body.
    const headers = Object.fromEntries(Object.entries(details.headers).filter(([name]) => name.toLowerCase() !== "content-length").map(([k, v]) => [k, String(v)]));
    const response = await fetch(details.endpoint, { method: "POST", headers, body: details.body ? new Uint8Array(details.body) : undefined, signal: AbortSignal.timeout(timeoutMs), redirect: "error" });
    if (!response.ok) throw new PushRefused(response.status, (await response.text().catch(() => "")).replace(/\s+/g, " ").trim());
  };
}

/** The keys from the environment (generated once into .local/secrets.env by npm start), or null. */
export function vapidFromEnv(): VapidKeys | null {
  const { VAPID_PUBLIC_KEY, VAPID_PRIVATE_KEY, VAPID_SUBJECT } = env();
  return VAPID_PUBLIC_KEY && VAPID_PRIVATE_KEY ? { subject: VAPID_SUBJECT, publicKey: VAPID_PUBLIC_KEY, privateKey: VAPID_PRIVATE_KEY } : null;
}

/** The public key browsers subscribe with (the applicationServerKey), or null when push is off. */
export const vapidPublicKey = () => env().VAPID_PUBLIC_KEY ?? null;
