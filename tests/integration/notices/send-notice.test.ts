import { describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { loadActor } from "@/lib/server/auth/actor";
import { AppError } from "@/lib/shared/errors";
import { drainDue } from "@/lib/notices/delivery-worker";
import { NOTICES_PER_PARK_PER_HOUR, previewNotice, sendNotice } from "@/lib/notices/send-notice";
import { AuditEvent, Notice, NoticeDelivery, Park, User } from "@/models";
import { createUser } from "../helpers";
import { createSubscribers, createTrail, fastWorker, messageIdOf, parkWithStaff, privateSmtpForFile } from "./fixtures";

const smtp = privateSmtpForFile();

const closure = { kind: "closure", message: "Closed after last night's rain. We will look again at noon." };
const errorOf = (promise: Promise<unknown>) => promise.then(() => null, (e) => e);

describe("who may send a notice (ASVS v5.0.0 8.2.1, 8.2.2)", () => {
  it("a ranger of another park, a rider and an anonymous caller are refused, and nothing is written", async () => {
    const { park } = await parkWithStaff();
    const other = await parkWithStaff();
    const rider = await loadActor((await createUser()).id);
    expect(((await errorOf(sendNotice(other.ranger, park.id, closure))) as AppError).status).toBe(403);
    expect(((await errorOf(sendNotice(rider, park.id, closure))) as AppError).status).toBe(403);
    expect(((await errorOf(sendNotice(null, park.id, closure))) as AppError).status).toBe(401);
    expect(((await errorOf(previewNotice(other.manager, park.id, closure))) as AppError).status).toBe(403);
    expect(await Notice.count({ where: { parkId: park.id } })).toBe(0);
  });

  it("the park's manager and ranger and an admin may send", async () => {
    const { park, manager, ranger } = await parkWithStaff();
    const admin = await loadActor((await createUser({ role: "admin" })).id);
    for (const actor of [manager, ranger, admin]) await expect(sendNotice(actor, park.id, closure)).resolves.toMatchObject({ recipientCount: 0 });
    expect(await Notice.count({ where: { parkId: park.id } })).toBe(3);
  });
});

describe("who receives a notice", () => {
  it("only confirmed, subscribed riders who asked for this kind and these trails (double opt-in)", async () => {
    const { park, ranger } = await parkWithStaff();
    const [a, b] = [await createTrail(park.id, "Ridgeback"), await createTrail(park.id, "Fernline")];
    const wholePark = await createSubscribers(park.id, 3);
    const unconfirmed = await createSubscribers(park.id, 2, { confirmed: false });
    const unsubscribed = await createSubscribers(park.id, 1, { unsubscribed: true });
    const onA = await createSubscribers(park.id, 2, { trailIds: [a.id] });
    const onB = await createSubscribers(park.id, 1, { trailIds: [b.id] });
    const reopeningsOnly = await createSubscribers(park.id, 1, { kinds: ["reopening"] });
    const [disabled] = await createSubscribers(park.id, 1);
    await User.update({ disabledAt: new Date() }, { where: { id: disabled.id } });

    const input = { kind: "closure", trailIds: [a.id], message: "Ridgeback closed: berm repairs." };
    const preview = await previewNotice(ranger, park.id, input);
    const sent = await sendNotice(ranger, park.id, input);
    expect(preview.recipientCount).toBe(5);
    expect(sent.recipientCount).toBe(5);
    const rows = await NoticeDelivery.findAll({ where: { noticeId: sent.id } });
    expect(rows.map((r) => r.email).sort()).toEqual([...wholePark, ...onA].map((u) => u.email).sort());

    const whole = await sendNotice(ranger, park.id, { kind: "closure", message: "Whole park closed: lightning." });
    const wholeRows = await NoticeDelivery.findAll({ where: { noticeId: whole.id } });
    expect(wholeRows.map((r) => r.email).sort()).toEqual([...wholePark, ...onA, ...onB].map((u) => u.email).sort());

    const reopening = await sendNotice(ranger, park.id, { kind: "reopening", trailIds: [b.id], message: "Fernline open again." });
    expect(reopening.recipientCount).toBe(3 + 1 + 1); // whole park, Fernline, reopenings-only

    // Sending delivers to exactly those rows; the others' addresses never reach the server.
    const transport = smtp.transport();
    await drainDue(fastWorker(transport));
    transport.close();
    const received = smtp.server.messages.flatMap((m) => m.to);
    for (const u of [...unconfirmed, ...unsubscribed, disabled]) expect(received).not.toContain(u.email);
    expect(received.filter((to) => to === reopeningsOnly[0].email)).toHaveLength(1);
  });
});

describe("what a notice may say", () => {
  it("refuses trails of another park, a past or misplaced 'closed until', and bad messages, writing nothing", async () => {
    const { park, ranger } = await parkWithStaff();
    const other = await parkWithStaff();
    const foreign = await createTrail(other.park.id, "Elsewhere");
    const refused = [
      { input: { ...closure, trailIds: [foreign.id] }, field: "trailIds" },
      { input: { ...closure, closedUntil: new Date(Date.now() - 60_000).toISOString() }, field: "closedUntil" },
      { input: { kind: "advisory", message: "x", closedUntil: new Date(Date.now() + 3_600_000).toISOString() }, field: "closedUntil" },
      { input: { ...closure, message: "   " }, field: "message" },
      { input: { ...closure, message: "x".repeat(2001) }, field: "message" },
      { input: { ...closure, message: "bell\u0007" }, field: "message" },
      { input: { ...closure, kind: "party" }, field: "kind" },
      { input: { ...closure, trailIds: ["not-a-uuid"] }, field: "trailIds.0" },
    ];
    for (const { input, field } of refused) {
      const error = await errorOf(sendNotice(ranger, park.id, input));
      const reported = error instanceof AppError ? error.field : (error as ZodError).issues[0].path.join(".");
      expect(reported, JSON.stringify(input).slice(0, 80)).toBe(field);
    }
    expect(await Notice.count({ where: { parkId: park.id } })).toBe(0);
  });

  it("a subject supplied by the caller is refused; CR/LF in names never reaches a header (ASVS v5.0.0 1.3.11)", async () => {
    const { park, ranger } = await parkWithStaff();
    const injection = await errorOf(sendNotice(ranger, park.id, { ...closure, subject: "Closed\r\nBcc: victim@example.test" }));
    expect(injection).toBeInstanceOf(ZodError);
    expect((injection as ZodError).issues[0].code).toBe("unrecognized_keys");

    await Park.update({ name: "Harrow\r\nBcc: victim@example.test" }, { where: { id: park.id } });
    const trail = await createTrail(park.id, "Ridgeback\nX-Evil: 1");
    const [rider] = await createSubscribers(park.id, 1);
    const { id } = await sendNotice(ranger, park.id, { kind: "closure", trailIds: [trail.id], message: "Line one\r\nBcc: victim@example.test\r\n<script>alert(1)</script> & more" });
    const notice = (await Notice.findByPk(id))!;
    expect(notice.subject).toBe("Harrow Bcc: victim@example.test: Ridgeback X-Evil: 1 closed");
    const transport = smtp.transport();
    await drainDue(fastWorker(transport));
    transport.close();
    const mail = smtp.server.messages.find((m) => messageIdOf(m.raw)?.startsWith(`<notice-${id}.`))!;
    expect(mail.to).toEqual([rider.email]);
    const head = mail.raw.split(/\r\n\r\n/)[0].replace(/\r\n[ \t]+/g, " "); // unfolded (RFC 5322 §2.2.3)
    expect(head).not.toMatch(/^Bcc:/im);
    expect(head).not.toMatch(/^X-Evil:/im);
    expect(head.match(/^Subject:/gim)).toHaveLength(1);
    expect(head).toMatch(/^List-Unsubscribe-Post: List-Unsubscribe=One-Click$/m);
    expect(head).toMatch(/^List-Unsubscribe: <http[^>]+\/api\/unsubscribe\?token=[^>]+>$/m);

    const preview = await previewNotice(ranger, park.id, { kind: "advisory", message: "<script>alert(1)</script> & more" });
    expect(preview.html).toContain("&lt;script&gt;alert(1)&lt;/script&gt; &amp; more");
    expect(preview.html).not.toContain("<script>");
  });
});

describe("anti-automation (ASVS v5.0.0 2.4.1)", () => {
  it(`allows ${NOTICES_PER_PARK_PER_HOUR} notices per park per hour, even when sent at once, then answers 429`, async () => {
    const { park, manager } = await parkWithStaff();
    const attempts = await Promise.allSettled(Array.from({ length: NOTICES_PER_PARK_PER_HOUR + 5 }, () => sendNotice(manager, park.id, closure)));
    const refused = attempts.filter((a): a is PromiseRejectedResult => a.status === "rejected");
    expect(attempts.filter((a) => a.status === "fulfilled")).toHaveLength(NOTICES_PER_PARK_PER_HOUR);
    expect(refused).toHaveLength(5);
    for (const r of refused) expect(r.reason).toMatchObject({ status: 429, message: expect.stringMatching(/past hour/) });
    expect(await Notice.count({ where: { parkId: park.id } })).toBe(NOTICES_PER_PARK_PER_HOUR);
    // Another park is not held back.
    const other = await parkWithStaff();
    await expect(sendNotice(other.manager, other.park.id, closure)).resolves.toMatchObject({ recipientCount: 0 });
  });

  it("records the notice, its deliveries and an audit event together", async () => {
    const { park, ranger } = await parkWithStaff();
    await createSubscribers(park.id, 4);
    const { id, recipientCount } = await sendNotice(ranger, park.id, closure);
    expect(recipientCount).toBe(4);
    expect((await Notice.findByPk(id))!.recipientCount).toBe(4);
    expect(await NoticeDelivery.count({ where: { noticeId: id, state: "queued" } })).toBe(4);
    expect(await AuditEvent.findOne({ where: { subjectId: id, action: "notice.send" } })).toMatchObject({ actorId: ranger.id, data: { recipientCount: 4 } });
  });
});
