import { describe, expect, it } from "vitest";
import { loadActor } from "@/lib/server/auth/actor";
import { signToken } from "@/lib/server/auth/tokens";
import { AppError } from "@/lib/shared/errors";
import { drainDue } from "@/lib/notices/delivery-worker";
import { confirmToken, unsubscribeToken } from "@/lib/notices/link-tokens";
import { sendNotice } from "@/lib/notices/send-notice";
import { confirmSubscription, describeUnsubscribe, listSubscriptions, removeSubscription, saveSubscription, unsubscribeByToken } from "@/lib/notices/subscriptions";
import { Subscription } from "@/models";
import { capturedMessages, createUser } from "../helpers";
import { createTrail, fastWorker, linkIn, messageIdOf, parkWithStaff, privateSmtpForFile, tokenOf } from "./fixtures";

const smtp = privateSmtpForFile();

async function newRider() {
  return (await loadActor((await createUser()).id))!;
}

/** The confirmation link mailed (through the shared fake server npm test runs) to `email`. */
async function confirmationLinkFor(email: string) {
  const mail = (await capturedMessages()).filter((m) => m.to.includes(email)).at(-1);
  return mail ? linkIn(mail.raw, "/api/subscriptions/confirm") : null;
}

async function deliverAll() {
  const transport = smtp.transport();
  await drainDue(fastWorker(transport));
  transport.close();
}

const statusOf = (e: unknown) => (e as AppError).status;
const refusal = (promise: Promise<unknown>) => promise.then(() => null, (e) => e as AppError);

describe("subscribing (double opt-in)", () => {
  it("nothing is sent until the rider confirms by the e-mailed link; then notices arrive", async () => {
    const { park, ranger } = await parkWithStaff();
    const rider = await newRider();
    const saved = await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"] });
    expect(saved).toMatchObject({ created: true, confirmationSent: true, subscription: { status: "pending", email: rider.email } });
    expect((await sendNotice(ranger, park.id, { kind: "closure", message: "First closure." })).recipientCount).toBe(0);

    const link = await confirmationLinkFor(rider.email);
    expect(link).toMatch(/^http:\/\/localhost:\d+\/api\/subscriptions\/confirm\?token=/);
    await expect(confirmSubscription(tokenOf(link!))).resolves.toMatchObject({ status: "active", park: { slug: park.slug } });
    // A second click is harmless.
    await expect(confirmSubscription(tokenOf(link!))).resolves.toMatchObject({ status: "active" });
    expect((await sendNotice(ranger, park.id, { kind: "closure", message: "Second closure." })).recipientCount).toBe(1);
    expect((await sendNotice(ranger, park.id, { kind: "advisory", message: "Not asked for." })).recipientCount).toBe(0);
  });

  it("subscribing, deleting and subscribing again mails one address at most 3 confirmations an hour (issue #12 finding 6, ASVS v5.0.0 2.4.1)", async () => {
    const { park } = await parkWithStaff();
    const rider = await newRider();
    const sent: boolean[] = [];
    for (let i = 0; i < 6; i++) {
      const saved = await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"] });
      sent.push(saved.confirmationSent);
      await removeSubscription(rider, saved.subscription.id);
    }
    // Before, every delete reset the row's 10-minute limit and all six were mailed.
    expect(sent).toEqual([true, true, true, false, false, false]);
    expect((await capturedMessages()).filter((m) => m.to.includes(rider.email))).toHaveLength(3);
  });

  it("asking again while pending does not mail another link within ten minutes", async () => {
    const { park } = await parkWithStaff();
    const rider = await newRider();
    await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"] });
    const again = await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure", "reopening"] });
    expect(again).toMatchObject({ created: false, confirmationSent: false, subscription: { status: "pending", kinds: ["closure", "reopening"] } });
  });

  it("refuses tampered, expired and misused confirmation links", async () => {
    const { park } = await parkWithStaff();
    const rider = await newRider();
    const { subscription } = await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"] });
    const good = confirmToken(subscription.id, rider.email);
    const tampered = good.slice(0, -2) + (good.endsWith("AA") ? "BB" : "AA");
    const expired = signToken({ purpose: "confirm-subscription", subscriptionId: subscription.id, email: rider.email }, -60);
    const otherAddress = confirmToken(subscription.id, "someone-else@tests.loamcast.test");
    const wrongPurpose = unsubscribeToken(rider.id, park.id);
    for (const token of [tampered, expired, otherAddress, wrongPurpose]) {
      const error = await refusal(confirmSubscription(token));
      expect(error).toMatchObject({ status: 400, field: "token" });
    }
    expect((await Subscription.findByPk(subscription.id))!.confirmedAt).toBeNull();
  });

  it("trails must belong to the chosen park; a rider manages only their own subscriptions", async () => {
    const { park } = await parkWithStaff();
    const other = await parkWithStaff();
    const foreign = await createTrail(other.park.id, "Not here");
    const rider = await newRider();
    expect(await refusal(saveSubscription(rider, { parkSlug: park.slug, trailIds: [foreign.id], kinds: ["closure"] }))).toMatchObject({ status: 422, field: "trailIds" });
    expect(statusOf(await refusal(saveSubscription(null, { parkSlug: park.slug, kinds: ["closure"] })))).toBe(401);

    const { subscription } = await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"] });
    const stranger = await newRider();
    expect(statusOf(await refusal(removeSubscription(stranger, subscription.id)))).toBe(404); // someone else's reads like a missing one
    expect(await listSubscriptions(stranger)).toEqual([]);
    expect((await listSubscriptions(rider)).map((s) => s.id)).toEqual([subscription.id]);
    await removeSubscription(rider, subscription.id);
    expect(await Subscription.findByPk(subscription.id)).toBeNull();
  });
});

describe("unsubscribing by the signed link (RFC 8058 one-click)", () => {
  it("the link in a delivered notice unsubscribes without signing in; later notices skip the rider", async () => {
    const { park, ranger } = await parkWithStaff();
    const rider = await newRider();
    const { subscription } = await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure", "reopening"] });
    await confirmSubscription(confirmToken(subscription.id, rider.email));
    const { id } = await sendNotice(ranger, park.id, { kind: "closure", message: "Closed for the race." });
    await deliverAll();
    const mail = smtp.server.messages.find((m) => messageIdOf(m.raw)?.startsWith(`<notice-${id}.`))!;
    const header = /^List-Unsubscribe:\s*<([^>]+)>/im.exec(mail.raw.replace(/\r\n[ \t]+/g, " "))![1];
    expect(linkIn(mail.raw, "/unsubscribe")).not.toBeNull();

    await expect(describeUnsubscribe(tokenOf(header))).resolves.toEqual({ park: { slug: park.slug, name: park.name }, subscribed: true });
    await expect(unsubscribeByToken(tokenOf(header))).resolves.toMatchObject({ unsubscribed: true, wasSubscribed: true });
    await expect(unsubscribeByToken(tokenOf(header))).resolves.toMatchObject({ unsubscribed: true, wasSubscribed: false });
    expect((await sendNotice(ranger, park.id, { kind: "reopening", message: "Open again." })).recipientCount).toBe(0);
    // An old confirmation link does not bring the subscription back.
    expect(await refusal(confirmSubscription(confirmToken(subscription.id, rider.email)))).toMatchObject({ status: 400 });
  });

  it("refuses an expired, tampered or wrong-purpose unsubscribe token", async () => {
    const { park } = await parkWithStaff();
    const rider = await newRider();
    const { subscription } = await saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"] });
    await confirmSubscription(confirmToken(subscription.id, rider.email));
    const good = unsubscribeToken(rider.id, park.id);
    const [body, mac] = good.split(".");
    const forgedBody = Buffer.from(JSON.stringify({ purpose: "unsubscribe", userId: rider.id, parkId: park.id, exp: 9_999_999_999 })).toString("base64url");
    const bad = [
      signToken({ purpose: "unsubscribe", userId: rider.id, parkId: park.id }, -60),
      `${body}.${mac.slice(0, -2)}${mac.endsWith("AA") ? "BB" : "AA"}`,
      `${forgedBody}.${mac}`,
      confirmToken(subscription.id, rider.email),
      "short",
    ];
    for (const token of bad) {
      expect(await refusal(unsubscribeByToken(token)), token.slice(0, 24)).toMatchObject({ status: 400, field: "token" });
      expect(await refusal(describeUnsubscribe(token))).toMatchObject({ status: 400, field: "token" });
    }
    expect((await Subscription.findByPk(subscription.id))!.unsubscribedAt).toBeNull();
  });
});
