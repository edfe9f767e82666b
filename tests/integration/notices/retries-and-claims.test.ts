import { spawn } from "node:child_process";
import { describe, expect, it } from "vitest";
import { getNotice, listDeliveries } from "@/lib/notices/notice-queries";
import { drainDue, processBatch } from "@/lib/notices/delivery-worker";
import { retryFailedDeliveries, sendNotice } from "@/lib/notices/send-notice";
import { AppError } from "@/lib/shared/errors";
import { NoticeDelivery } from "@/models";
import { createSubscribers, fastWorker, messageIdOf, parkWithStaff, pause, privateSmtpForFile, stateCounts } from "./fixtures";

const smtp = privateSmtpForFile();

const messagesOf = (noticeId: string) => smtp.server.messages.filter((m) => messageIdOf(m.raw)?.startsWith(`<notice-${noticeId}.`));

describe("retries, exhausted deliveries and stale claims", () => {
  it("a delivery that exhausts its retries ends 'failed' with its last error, visible to staff, and can be retried", async () => {
    const { park, ranger } = await parkWithStaff();
    await createSubscribers(park.id, 5);
    const { id } = await sendNotice(ranger, park.id, { kind: "closure", message: "Lower meadow trails closed for mowing." });
    await smtp.server.setMode("tempfail");
    const transport = smtp.transport();
    const policy = { maxAttempts: 3, baseDelayMs: 1, maxDelayMs: 5 };
    for (let round = 0; round < 20 && (await NoticeDelivery.count({ where: { noticeId: id, state: "failed" } })) < 5; round++) {
      await drainDue(fastWorker(transport, { retry: policy }));
      await pause(10);
    }
    expect(await stateCounts(id)).toEqual({ failed: 5 });
    const rows = await NoticeDelivery.findAll({ where: { noticeId: id } });
    for (const row of rows) {
      expect(row.attempts).toBe(3);
      expect(row.lastError).toMatch(/Gave up after 3 attempts.*451/);
    }
    expect(messagesOf(id)).toHaveLength(0);

    // Staff see it, in the notice's counts and at the top of its deliveries.
    const notice = await getNotice(ranger, id);
    expect(notice.deliveries.failed).toBe(5);
    expect((await listDeliveries(id))[0]).toMatchObject({ state: "failed", attempts: 3 });

    // "Retry failed" puts them back; with the server accepting again each goes out once.
    await smtp.server.setMode("accept");
    expect(await retryFailedDeliveries(ranger, id)).toEqual({ id, requeued: 5 });
    await drainDue(fastWorker(transport, { retry: policy }));
    transport.close();
    expect(await stateCounts(id)).toEqual({ sent: 5 });
    expect(new Set(messagesOf(id).map((m) => messageIdOf(m.raw))).size).toBe(5);
    expect(messagesOf(id)).toHaveLength(5);
  });

  it("only staff of the notice's park may retry or read it", async () => {
    const { park, ranger } = await parkWithStaff();
    const other = await parkWithStaff();
    const { id } = await sendNotice(ranger, park.id, { kind: "advisory", message: "Bike wash closed today." });
    for (const actor of [other.ranger, other.manager]) {
      expect(((await retryFailedDeliveries(actor, id).catch((e) => e)) as AppError).status).toBe(403);
      expect(((await getNotice(actor, id).catch((e) => e)) as AppError).status).toBe(403);
    }
  });

  it("a claim left by a crashed worker is taken up after the timeout; a sent row is never sent again", async () => {
    const { park, ranger } = await parkWithStaff();
    await createSubscribers(park.id, 3);
    const { id } = await sendNotice(ranger, park.id, { kind: "reopening", message: "Ridge line reopened after the repairs." });
    const [stale, fresh, sent] = await NoticeDelivery.findAll({ where: { noticeId: id }, order: [["email", "ASC"]] });
    const longAgo = new Date(Date.now() - 10 * 60_000);
    await stale.update({ state: "sending", claimedBy: "crashed-worker", claimedAt: longAgo, attempts: 1 });
    await fresh.update({ state: "sending", claimedBy: "busy-worker", claimedAt: new Date(), attempts: 1 });
    await sent.update({ state: "sent", claimedBy: "old-worker", claimedAt: longAgo, sentAt: longAgo, attempts: 1 });

    const transport = smtp.transport();
    await processBatch(fastWorker(transport, { staleClaimMs: 60_000 }));
    transport.close();
    await stale.reload();
    await fresh.reload();
    await sent.reload();
    expect(stale).toMatchObject({ state: "sent", attempts: 2 });
    expect(fresh).toMatchObject({ state: "sending", claimedBy: "busy-worker" });
    expect(sent).toMatchObject({ state: "sent", claimedBy: "old-worker" });
    expect(messagesOf(id).map((m) => messageIdOf(m.raw))).toEqual([stale.messageId]);
  });

  it("a stale claim that already used every attempt is failed, visibly, not resent", async () => {
    const { park, ranger } = await parkWithStaff();
    await createSubscribers(park.id, 1);
    const { id } = await sendNotice(ranger, park.id, { kind: "closure", message: "Skills area closed." });
    const row = (await NoticeDelivery.findOne({ where: { noticeId: id } }))!;
    await row.update({ state: "sending", claimedBy: "crashed-worker", claimedAt: new Date(Date.now() - 10 * 60_000), attempts: 3 });
    const transport = smtp.transport();
    await processBatch(fastWorker(transport, { staleClaimMs: 60_000, retry: { maxAttempts: 3, baseDelayMs: 1, maxDelayMs: 5 } }));
    transport.close();
    await row.reload();
    expect(row.state).toBe("failed");
    expect(row.lastError).toMatch(/worker stopped while sending/);
    expect(messagesOf(id)).toHaveLength(0);
  });

  it("the worker script sends what is due and stops cleanly on SIGTERM", async () => {
    const { park, ranger } = await parkWithStaff();
    await createSubscribers(park.id, 20);
    const { id } = await sendNotice(ranger, park.id, { kind: "closure", message: "Upper traverse closed: snow." });
    const child = spawn("node_modules/.bin/tsx", ["--conditions=react-server", "scripts/worker.ts"], {
      env: { ...process.env, SMTP_URL: smtp.smtpUrl, FAKE_SMTP_CONTROL_URL: smtp.controlUrl, NOTICE_POLL_MS: "100" },
      stdio: ["ignore", "pipe", "pipe"],
    });
    let output = "";
    child.stdout.on("data", (c) => (output += c));
    child.stderr.on("data", (c) => (output += c));
    const exited = new Promise<number | null>((resolve) => child.on("exit", (code) => resolve(code)));
    for (let i = 0; i < 200 && messagesOf(id).length < 20; i++) await pause(100);
    child.kill("SIGTERM");
    expect(await exited).toBe(0);
    expect(output).toContain("SIGTERM: finishing the batch in hand");
    expect(await stateCounts(id)).toEqual({ sent: 20 });
    expect(messagesOf(id)).toHaveLength(20);
  });
});
