import { describe, expect, it } from "vitest";
import { drainDue, processBatch } from "@/lib/notices/delivery-worker";
import { sendNotice } from "@/lib/notices/send-notice";
import { NoticeDelivery } from "@/models";
import { createSubscribers, fastWorker, messageIdOf, parkWithStaff, pause, privateSmtpForFile, stateCounts } from "./fixtures";

// Faults: stop the mail server during a notice and start it again; every subscriber gets
// exactly one e-mail (security.md, "Reliability practice"). Counting is by Message-ID at the server.
const smtp = privateSmtpForFile();

const messagesOf = (noticeId: string) => smtp.server.messages.filter((m) => messageIdOf(m.raw)?.startsWith(`<notice-${noticeId}.`));

async function countState(noticeId: string, state: string) {
  return NoticeDelivery.count({ where: { noticeId, state } });
}

describe("a notice to 1,000 subscribers through a mail outage", () => {
  it("reaches every subscriber exactly once after the server recovers, and the deliveries table agrees", async () => {
    const { park, ranger } = await parkWithStaff();
    await createSubscribers(park.id, 1000);
    const { id, recipientCount } = await sendNotice(ranger, park.id, { kind: "closure", message: "Storm damage on the upper mountain. All trails closed while the crew clears fallen trees." });
    expect(recipientCount).toBe(1000);
    expect(await countState(id, "queued")).toBe(1000);

    // 1. The server accepts: some go out.
    let transport = smtp.transport();
    let rounds = 0;
    while ((await countState(id, "sent")) < 300 && rounds++ < 50) await processBatch(fastWorker(transport));
    transport.close();
    const sentBeforeOutage = await countState(id, "sent");
    expect(sentBeforeOutage).toBeGreaterThanOrEqual(300);

    // 2. Outage: the SMTP port is closed. Attempts fail and are scheduled again, none is lost.
    await smtp.server.setMode("refuse");
    transport = smtp.transport();
    rounds = 0;
    while ((await countState(id, "retrying")) < 300 && rounds++ < 200) await processBatch(fastWorker(transport));
    transport.close();
    expect(await countState(id, "retrying")).toBeGreaterThanOrEqual(300);
    expect(await countState(id, "failed")).toBe(0);
    expect(messagesOf(id)).toHaveLength(sentBeforeOutage);
    const failedAttempt = await NoticeDelivery.findOne({ where: { noticeId: id, state: "retrying" } });
    expect(failedAttempt!.lastError).toMatch(/ECONNREFUSED|connect/i);

    // 3. Back up: two workers at once run it to completion.
    await smtp.server.setMode("accept");
    const first = smtp.transport();
    const second = smtp.transport();
    rounds = 0;
    while ((await countState(id, "sent")) < 1000 && rounds++ < 100) {
      await Promise.all([drainDue(fastWorker(first)), drainDue(fastWorker(second))]);
      await pause(25); // retries are due within 20 ms
    }
    first.close();
    second.close();

    const received = messagesOf(id);
    const ids = received.map((m) => messageIdOf(m.raw)!);
    expect(received).toHaveLength(1000);
    expect(new Set(ids).size).toBe(1000);

    const rows = await NoticeDelivery.findAll({ where: { noticeId: id } });
    expect(await stateCounts(id)).toEqual({ sent: 1000 });
    expect(new Set(rows.map((r) => r.messageId))).toEqual(new Set(ids));
    for (const row of rows) expect(row.sentAt).not.toBeNull();
    // The recipient of each message is the row's address.
    const toById = new Map(received.map((m) => [messageIdOf(m.raw)!, m.to]));
    for (const row of rows) expect(toById.get(row.messageId)).toEqual([row.email]);
    // Some rows really went through the outage and were retried.
    expect(rows.filter((r) => r.attempts > 1).length).toBeGreaterThanOrEqual(300);
  });

  it("two workers draining the same notice at once never send a message twice", async () => {
    const { park, manager } = await parkWithStaff();
    await createSubscribers(park.id, 400);
    const { id } = await sendNotice(manager, park.id, { kind: "advisory", message: "Lift 2 runs on the weekend timetable from Saturday." });
    const a = smtp.transport(2);
    const b = smtp.transport(2);
    const [ra, rb] = await Promise.all([drainDue(fastWorker(a, { batchSize: 10 })), drainDue(fastWorker(b, { batchSize: 10 }))]);
    a.close();
    b.close();
    expect(ra.sent + rb.sent).toBe(400);
    expect(ra.sent).toBeGreaterThan(0);
    expect(rb.sent).toBeGreaterThan(0);
    const ids = messagesOf(id).map((m) => messageIdOf(m.raw));
    expect(ids).toHaveLength(400);
    expect(new Set(ids).size).toBe(400);
    const workers = await NoticeDelivery.aggregate("claimedBy", "count", { distinct: true, where: { noticeId: id } });
    expect(Number(workers)).toBe(2);
  });
});
