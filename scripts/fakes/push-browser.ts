import { createDecipheriv, createECDH, createHmac, randomBytes } from "node:crypto";

/**
 * The browser's side of Web Push, for tests: a subscription's keys (RFC 8291 §3.1, §3.2) and the
 * decryption of what the push service received, so a test can read the alert as the browser would.
 */
export type TestBrowserKeys = { ecdh: ReturnType<typeof createECDH>; authSecret: Buffer; p256dh: string; auth: string };

export function newTestBrowserKeys(): TestBrowserKeys {
  const ecdh = createECDH("prime256v1");
  ecdh.generateKeys();
  const authSecret = randomBytes(16);
  return { ecdh, authSecret, p256dh: ecdh.getPublicKey().toString("base64url"), auth: authSecret.toString("base64url") };
}

const hmac = (key: Buffer, data: Buffer) => createHmac("sha256", key).update(data).digest();

/**
 * Decrypts one aes128gcm push message with the browser's private key, written from the RFC rather
 * than taken from the library that encrypted it: RFC 8188 §2 (the header: salt, record size, key
 * id; one record, padding delimiter 0x02) and RFC 8291 §3.3–3.4 (the key derivation from the ECDH
 * secret and the auth secret).
 */
export function decryptPush(browser: TestBrowserKeys, body: Buffer): string {
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

