import { afterAll, beforeAll } from "vitest";
import { randomUUID } from "node:crypto";
import webpush from "web-push";
import { createPushSender, type VapidKeys } from "@/lib/notices/push-sender";
import { startFakePush, type ReceivedPush } from "@/scripts/fakes/push-server";
import { newTestBrowserKeys, type TestBrowserKeys } from "@/scripts/fakes/push-browser";
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
export type TestBrowser = TestBrowserKeys & { name: string; token: string; subscriptionId: string; userId: string };

export async function subscribeBrowser(fake: FakePush, parkId: string, opts: { kinds?: string[]; trailIds?: string[] | null; name?: string } = {}): Promise<TestBrowser> {
  const keys = newTestBrowserKeys();
  const token = randomUUID();
  const user = await User.create({ email: `push-${token.slice(0, 8)}@tests.loamcast.test`, name: opts.name ?? "Push rider", passwordHash: "x".repeat(60), disabledAt: null });
  const sub = await PushSubscription.create({
    userId: user.id, parkId, endpoint: fake.endpointFor(token), p256dh: keys.p256dh, auth: keys.auth,
    trailIds: opts.trailIds ?? null, kinds: opts.kinds ?? ["closure", "reopening", "advisory"],
  });
  return { ...keys, name: opts.name ?? "Push rider", token, subscriptionId: sub.id, userId: user.id };
}

export const pushesTo = (fake: FakePush, browser: TestBrowser): ReceivedPush[] => fake.received.filter((p) => p.subscription === browser.token);
