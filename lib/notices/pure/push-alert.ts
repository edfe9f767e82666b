import { z } from "zod";

/**
 * The push alert's payload, our own small JSON: written by the worker (composeNoticePush), read by
 * the service worker. Read defensively there: a link is followed only to our own origin.
 */
export const pushAlert = z.object({
  title: z.string().min(1).max(200),
  body: z.string().max(1000),
  url: z.string().max(2000),
  tag: z.string().max(100),
});
export type PushAlert = z.infer<typeof pushAlert>;

const FALLBACK: PushAlert = { title: "Loamcast", body: "A park you follow sent a notice.", url: "/", tag: "notice" };

/** What to show for a push's text, and where a tap goes (our origin only; otherwise the home page). */
export function readPushAlert(text: string | null | undefined, origin: string): PushAlert {
  let parsed: PushAlert;
  try {
    parsed = pushAlert.parse(JSON.parse(text ?? ""));
  } catch {
    return { ...FALLBACK, url: `${origin}/` };
  }
  return { ...parsed, url: sameOriginUrl(parsed.url, origin) };
}

/** `url` when it is on `origin`, otherwise the home page: a tap never leaves for another site. */
export function sameOriginUrl(url: unknown, origin: string): string {
  try {
    const target = new URL(String(url), origin);
    if (target.origin === origin) return target.href;
  } catch {
    // not a URL: the home page
  }
  return `${origin}/`;
}

/** The browser's applicationServerKey: the VAPID public key, base64url, as bytes (RFC 8292 §3.2). */
export function applicationServerKey(base64url: string): Uint8Array<ArrayBuffer> {
  const base64 = base64url.replace(/-/g, "+").replace(/_/g, "/");
  const binary = atob(base64 + "=".repeat((4 - (base64.length % 4)) % 4));
  const bytes = new Uint8Array(new ArrayBuffer(binary.length));
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}
