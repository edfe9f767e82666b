import { describe, expect, it } from "vitest";
import { createECDH, randomBytes, randomUUID } from "node:crypto";
import { loadActor } from "@/lib/server/auth/actor";
import { AppError } from "@/lib/shared/errors";
import { listPushSubscriptions, removePushSubscription, savePushSubscription } from "@/lib/notices/push-subscriptions";
import { sendNotice } from "@/lib/notices/send-notice";
import { NoticeDelivery } from "@/models";
import { createUser } from "../helpers";
import { createTrail, parkWithStaff, privateSmtpForFile } from "./fixtures";

// Turning browser alerts on and off through lib/ (the API routes are thin over these), and who they reach.
privateSmtpForFile();

const rider = async () => (await loadActor((await createUser()).id))!;
const refusal = (promise: Promise<unknown>) => promise.then(() => null, (e) => e as AppError);

function browser(endpoint = `https://push.example-service.test/send/${randomUUID()}`) {
  const key = createECDH("prime256v1");
  key.generateKeys();
  return { endpoint, expirationTime: null, keys: { p256dh: key.getPublicKey().toString("base64url"), auth: randomBytes(16).toString("base64url") } };
}

describe("browser alerts", () => {
  it("a rider turns alerts on for a park; the same browser again changes its choice instead of adding a second", async () => {
    const { park } = await parkWithStaff();
    const me = await rider();
    const subscription = browser();
    const first = await savePushSubscription(me, { parkSlug: park.slug, kinds: ["closure"], subscription });
    expect(first).toMatchObject({ created: true, subscription: { park: { slug: park.slug }, kinds: ["closure"], trailIds: null, endpointOrigin: "https://push.example-service.test" } });
    const again = await savePushSubscription(me, { parkSlug: park.slug, kinds: ["advisory", "closure"], subscription });
    expect(again).toMatchObject({ created: false, subscription: { id: first.subscription.id, kinds: ["closure", "advisory"] } });
    expect((await listPushSubscriptions(me)).map((s) => s.id)).toEqual([first.subscription.id]);
  });

  it("refuses addresses the worker must not POST to, keys no push can be encrypted to, and trails of another park", async () => {
    const { park } = await parkWithStaff();
    const other = await parkWithStaff();
    const otherTrail = await createTrail(other.park.id, "Elsewhere");
    const me = await rider();
    for (const endpoint of ["http://push.example-service.test/x", "https://169.254.169.254/latest", "https://[::1]/x", "https://localhost/x", "https://u:p@push.example-service.test/x"]) {
      const refused = await refusal(savePushSubscription(me, { parkSlug: park.slug, kinds: ["closure"], subscription: browser(endpoint) }));
      expect([endpoint, refused?.status, refused?.field]).toEqual([endpoint, 422, "subscription.endpoint"]);
    }
    const notAPoint = { ...browser(), keys: { p256dh: Buffer.concat([Buffer.from([4]), Buffer.alloc(64, 0xff)]).toString("base64url"), auth: randomBytes(16).toString("base64url") } };
    expect(await refusal(savePushSubscription(me, { parkSlug: park.slug, kinds: ["closure"], subscription: notAPoint }))).toMatchObject({ status: 422, field: "subscription.keys.p256dh" });
    expect(await refusal(savePushSubscription(me, { parkSlug: park.slug, trailIds: [otherTrail.id], kinds: ["closure"], subscription: browser() }))).toMatchObject({ status: 422, field: "trailIds" });
    expect(await listPushSubscriptions(me)).toEqual([]);
  });

  it("only its rider lists and removes a browser; anyone else reads it as missing", async () => {
    const { park } = await parkWithStaff();
    const me = await rider();
    const someoneElse = await rider();
    const { subscription } = await savePushSubscription(me, { parkSlug: park.slug, kinds: ["closure"], subscription: browser() });
    expect(await listPushSubscriptions(someoneElse)).toEqual([]);
    expect((await refusal(removePushSubscription(someoneElse, subscription.id)))?.status).toBe(404);
    expect((await refusal(removePushSubscription(null, subscription.id)))?.status).toBe(401);
    expect((await refusal(savePushSubscription(null, { parkSlug: park.slug, kinds: ["closure"], subscription: browser() })))?.status).toBe(401);
    await removePushSubscription(me, subscription.id);
    expect(await listPushSubscriptions(me)).toEqual([]);
  });

  it("a browser following one trail gets that trail's notices and the whole park's, not another trail's (as e-mail does)", async () => {
    const { park, ranger } = await parkWithStaff();
    const [ridge, meadow] = await Promise.all([createTrail(park.id, "Ridge"), createTrail(park.id, "Meadow")]);
    const me = await rider();
    await savePushSubscription(me, { parkSlug: park.slug, trailIds: [ridge.id], kinds: ["closure", "advisory"], subscription: browser() });
    const pushesFor = async (input: object) => NoticeDelivery.count({ where: { noticeId: (await sendNotice(ranger, park.id, input)).id, channel: "push" } });
    expect(await pushesFor({ kind: "closure", trailIds: [ridge.id], message: "Ridge closed." })).toBe(1);
    expect(await pushesFor({ kind: "closure", trailIds: [meadow.id], message: "Meadow closed." })).toBe(0);
    expect(await pushesFor({ kind: "advisory", message: "Lift times change." })).toBe(1);
    expect(await pushesFor({ kind: "reopening", trailIds: [ridge.id], message: "Ridge open." })).toBe(0);
  });
});
