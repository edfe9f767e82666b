import { afterAll, beforeAll } from "vitest";
import { createDecipheriv, createECDH, createHmac, randomBytes, randomUUID } from "node:crypto";
import webpush from "web-push";
import { createPushSender, type VapidKeys } from "@/lib/notices/push-sender";
import { startFakePush, type ReceivedPush } from "@/scripts/fakes/push-server";
import { PushSubscription, User } from "@/models";
import { freePort } from "./fixtures";

/** Push test helpers: a fake push service of the file's own, browsers with real keys, and decryption. */
type FakePush = Awaited<ReturnType<typeof startFakePush>>;

export function privatePushForFile() {
  let fake: FakePush | undefined;
  beforeAll(async () => {
    fake = await startFakePush({ port: await freePort() });
  });
  afterAll(async () => {
    await fake?.close();
  });
  return {
    get server() {
      if (!fake) throw new Error("The fake push service starts in beforeAll: read it inside a test.");
      return fake;
    },
  };
}

/** VAPID keys made by web-push itself, as an operator would (`web-push generate-vapid-keys`). */
export function testVapid(): VapidKeys {
  const keys = webpush.generateVAPIDKeys();
  return { subject: "mailto:crew@tests.loamcast.test", ...keys };
}

export const pushSenderFor = (vapid: VapidKeys) => createPushSender(vapid, 5_000);

/** A browser: its P-256 key pair and auth secret (RFC 8291 §3.1, §3.2), endpoint at the fake. */
export type TestBrowser = { name: string; ecdh: ReturnType<typeof createECDH>; authSecret: Buffer; token: string; subscriptionId: string; userId: string };

export async function subscribeBrowser(fake: FakePush, parkId: string, opts: { kinds?: string[]; trailIds?: string[] | null; name?: string } = {}): Promise<TestBrowser> {
  const ecdh = createECDH("prime256v1");
  ecdh.generateKeys();
  const authSecret = randomBytes(16);
  const token = randomUUID();
  const user = await User.create({ email: `push-${token.slice(0, 8)}@tests.loamcast.test`, name: opts.name ?? "Push rider", passwordHash: "x".repeat(60), disabledAt: null });
  const sub = await PushSubscription.create({
    userId: user.id, parkId, endpoint: fake.endpointFor(token), p256dh: ecdh.getPublicKey().toString("base64url"), auth: authSecret.toString("base64url"),
    trailIds: opts.trailIds ?? null, kinds: opts.kinds ?? ["closure", "reopening", "advisory"],
  });
  return { name: opts.name ?? "Push rider", ecdh, authSecret, token, subscriptionId: sub.id, userId: user.id };
}

const hmac = (key: Buffer, data: Buffer) => createHmac("sha256", key).update(data).digest();

/**
 * Decrypts one aes128gcm push message with the browser's private key, written from the RFC rather
 * than taken from the library that encrypted it: RFC 8188 §2 (the header: salt, record size, key
 * id; one record, padding delimiter 0x02) and RFC 8291 §3.3–3.4 (the key derivation from the ECDH
 * secret and the auth secret).
 */
export function decryptPush(browser: TestBrowser, body: Buffer): string {
  const salt = body.subarray(0, 16);
  const idLength = body[20];
  const senderPublic = body.subarray(21, 21 + idLength);
  const record = body.subarray(21 + idLength);
  const ecdhSecret = browser.ecdh.computeSecret(senderPublic);
  const keyInfo = Buffer.concat([Buffer.from("WebPush: info\0"), browser.ecdh.getPublicKey(), senderPublic]);
  const ikm = hmac(hmac(browser.authSecret, ecdhSecret), Buffer.concat([keyInfo, Buffer.from([1])]));
  const prk = hmac(salt, ikm);
  const cek = hmac(prk, Buffer.from("Content-Encoding: aes128gcm\0\x01", "binary")).subarray(0, 16);
  const nonce = hmac(prk, Buffer.from("Content-Encoding: nonce\0\x01", "binary")).subarray(0, 12);
  const decipher = createDecipheriv("aes-128-gcm", cek, nonce);
  decipher.setAuthTag(record.subarray(record.length - 16));
  const padded = Buffer.concat([decipher.update(record.subarray(0, record.length - 16)), decipher.final()]);
  let end = padded.length - 1;
  while (end >= 0 && padded[end] === 0) end--;
  if (padded[end] !== 2) throw new Error("not the last record: no 0x02 padding delimiter");
  return padded.subarray(0, end).toString("utf8");
}

export const pushesTo = (fake: FakePush, browser: TestBrowser): ReceivedPush[] => fake.received.filter((p) => p.subscription === browser.token);
