import { afterAll, describe, expect, it } from "vitest";
import webpush from "web-push";
import { drainDue, processBatch } from "@/lib/notices/delivery-worker";
import { sendNotice } from "@/lib/notices/send-notice";
import { NoticeDelivery, PushSubscription } from "@/models";
import { vapidProblem } from "@/scripts/fakes/push-server";
import { createSubscribers, fastWorker, parkWithStaff, pause, privateSmtpForFile, stateCounts } from "./fixtures";
import { decryptPush } from "@/scripts/fakes/push-browser";
import { privatePushForFile, pushesTo, pushSenderFor, subscribeBrowser, testVapid } from "./push-fixtures";

// Push alerts through the same queue as e-mail: one delivery per notice and browser, retried
// through an outage of the push service, never sent twice, and a 410 removes the browser.
const smtp = privateSmtpForFile();
const push = privatePushForFile();
const vapid = testVapid();

const transports: ReturnType<typeof smtp.transport>[] = [];
const mailTransport = () => {
  const transport = smtp.transport(1);
  transports.push(transport);
  return transport;
};
// Registered last, so it runs first: the pooled connections close before the fake SMTP server does.
afterAll(() => transports.forEach((t) => t.close()));

const worker = (overrides = {}) => fastWorker(mailTransport(), { push: pushSenderFor(vapid), ...overrides });

describe("push alerts", () => {
  it("a closure reaches two browsers once each while the push service refuses for a while, and each payload decrypts to the notice", async () => {
    const { park, ranger } = await parkWithStaff();
    const first = await subscribeBrowser(push.server, park.id, { name: "First" });
    const second = await subscribeBrowser(push.server, park.id, { name: "Second", kinds: ["closure"] });
    // Not asked for closures: gets nothing.
    const advisoriesOnly = await subscribeBrowser(push.server, park.id, { kinds: ["advisory"] });
    await createSubscribers(park.id, 2);

    push.server.setMode("unavailable");
    const { id, recipientCount } = await sendNotice(ranger, park.id, { kind: "closure", message: "Lower meadow flooded after the storm; every trail closed until the crew has walked it." });
    expect(recipientCount).toBe(4); // two e-mails and two browsers
    const pushRows = await NoticeDelivery.findAll({ where: { noticeId: id, channel: "push" } });
    expect(pushRows.map((r) => r.pushSubscriptionId).sort()).toEqual([first.subscriptionId, second.subscriptionId].sort());

    // The outage: pushes are refused with 503, scheduled again, none lost and none failed.
    for (let round = 0; round < 3; round++) {
      await processBatch(worker());
      await pause(25);
    }
    expect(pushesTo(push.server, first)).toHaveLength(0);
    const retrying = await NoticeDelivery.findAll({ where: { noticeId: id, channel: "push" } });
    for (const row of retrying) {
      expect(row.state).toBe("retrying");
      expect(row.attempts).toBeGreaterThanOrEqual(2);
      expect(row.lastError).toMatch(/^Push 503/);
    }

    // Back up: two workers at once finish it.
    push.server.setMode("accept");
    for (let round = 0; round < 20 && (await NoticeDelivery.count({ where: { noticeId: id, state: "sent" } })) < 4; round++) {
      await Promise.all([drainDue(worker()), drainDue(worker())]);
      await pause(25);
    }
    expect(await stateCounts(id)).toEqual({ sent: 4 });
    expect(pushesTo(push.server, advisoriesOnly)).toHaveLength(0);
    for (const browser of [first, second]) {
      const received = pushesTo(push.server, browser);
      expect(received).toHaveLength(1);
      expect(received[0].ttl).toBe(86_400);
      expect(received[0].vapidKey).toBe(vapid.publicKey);
      const payload = JSON.parse(decryptPush(browser, Buffer.from(received[0].body, "base64")));
      expect(payload).toEqual({
        title: `${park.name}: all trails closed`,
        body: "Lower meadow flooded after the storm; every trail closed until the crew has walked it.",
        url: expect.stringMatching(new RegExp(`/parks/${park.slug}$`)),
        tag: `notice-${id}`,
      });
    }
  });

  it("two workers draining the same notice never push to a browser twice", async () => {
    const { park, manager } = await parkWithStaff();
    const browsers = await Promise.all(Array.from({ length: 30 }, () => subscribeBrowser(push.server, park.id)));
    const { id } = await sendNotice(manager, park.id, { kind: "advisory", message: "Lift 2 runs on the weekend timetable from Saturday." });
    const [a, b] = await Promise.all([drainDue(worker({ batchSize: 3 })), drainDue(worker({ batchSize: 3 }))]);
    expect(a.sent + b.sent).toBe(30);
    expect(a.sent).toBeGreaterThan(0);
    expect(b.sent).toBeGreaterThan(0);
    for (const browser of browsers) expect(pushesTo(push.server, browser)).toHaveLength(1);
    // A third worker later (a restart) finds nothing left to send.
    expect((await drainDue(worker())).claimed).toBe(0);
    expect(await stateCounts(id)).toEqual({ sent: 30 });
  });

  it("a browser whose subscription expired (410) is removed, and its delivery is shown as failed", async () => {
    const { park, ranger } = await parkWithStaff();
    const expired = await subscribeBrowser(push.server, park.id);
    const live = await subscribeBrowser(push.server, park.id);
    push.server.markGone(expired.token);
    const { id } = await sendNotice(ranger, park.id, { kind: "reopening", message: "Upper ridge is open again." });
    await drainDue(worker());
    expect(await PushSubscription.findByPk(expired.subscriptionId)).toBeNull();
    expect(await PushSubscription.findByPk(live.subscriptionId)).not.toBeNull();
    const failed = await NoticeDelivery.findOne({ where: { noticeId: id, userId: expired.userId } });
    expect(failed!.state).toBe("failed");
    expect(failed!.attempts).toBe(1);
    expect(failed!.pushSubscriptionId).toBeNull();
    expect(failed!.lastError).toMatch(/^Push 410.*removed/);
    expect(pushesTo(push.server, live)).toHaveLength(1);
    // The next notice does not try it again.
    const next = await sendNotice(ranger, park.id, { kind: "advisory", message: "Bike wash by the car park is fixed." });
    expect(await NoticeDelivery.count({ where: { noticeId: next.id, channel: "push" } })).toBe(1);
  });

  it("the fake push service refuses a bad VAPID token, so the checks above cannot pass by accident", async () => {
    const { park, ranger } = await parkWithStaff();
    const browser = await subscribeBrowser(push.server, park.id);
    // Signed by a key other than the one named in k=: 403, permanent, not retried.
    const impostor = testVapid();
    const forged = async (target: { endpoint: string; p256dh: string; auth: string }, payload: string) => {
      const details = webpush.generateRequestDetails({ endpoint: target.endpoint, keys: { p256dh: target.p256dh, auth: target.auth } }, payload, { vapidDetails: impostor, contentEncoding: "aes128gcm" });
      const headers = { ...details.headers, Authorization: String(details.headers.Authorization).replace(/k=[A-Za-z0-9_-]+/, `k=${vapid.publicKey}`) } as Record<string, string>;
      delete headers["Content-Length"];
      const response = await fetch(details.endpoint, { method: "POST", headers: Object.fromEntries(Object.entries(headers).map(([k, v]) => [k, String(v)])), body: new Uint8Array(details.body) });
      if (!response.ok) throw Object.assign(new Error(await response.text()), { statusCode: response.status });
    };
    const { id } = await sendNotice(ranger, park.id, { kind: "closure", message: "Closed for a race." });
    await drainDue(fastWorker(mailTransport(), { push: forged }));
    const row = await NoticeDelivery.findOne({ where: { noticeId: id, channel: "push" } });
    expect(row!.state).toBe("failed");
    expect(row!.lastError).toMatch(/^Push 403.*signature does not match k/);
    expect(pushesTo(push.server, browser)).toHaveLength(0);

    // The token checks one by one (RFC 8292 §2: aud is the push origin, exp at most 24 h ahead).
    const origin = push.server.origin;
    const header = (aud: string, expSeconds?: number) => {
      const { Authorization } = webpush.getVapidHeaders(aud, vapid.subject, vapid.publicKey, vapid.privateKey, "aes128gcm", expSeconds);
      return Authorization;
    };
    const now = Math.floor(Date.now() / 1000);
    expect(vapidProblem(header(origin), origin)).toBeNull();
    expect(vapidProblem(header("http://127.0.0.1:1"), origin)).toBe(`aud must be ${origin}`);
    expect(vapidProblem(header(origin, now + 60), origin, now + 120)).toBe("the JWT has expired");
    expect(vapidProblem(header(origin, now + 3600), origin, now - 2 * 86_400)).toBe("exp is more than 24 hours ahead");
    expect(vapidProblem(`WebPush ${header(origin).slice(6)}`, origin)).toBe("no vapid Authorization header");
    const tampered = header(origin).replace(/t=([^.]+)\.([^.]+)\./, (_m, h: string) => `t=${h}.${Buffer.from(JSON.stringify({ aud: origin, exp: now + 60, sub: "mailto:x@y.test" })).toString("base64url")}.`);
    expect(vapidProblem(tampered, origin)).toBe("the JWT signature does not match k");
  });
});
