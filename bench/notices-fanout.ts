/**
 * Benchmark: one notice to 10,000 subscribers, delivered to a fake SMTP server started here on
 * free ports, against bare pooled nodemailer sending the same 10,000 messages (same recipients,
 * bodies and Message-IDs) to the same server in the same run. Counts duplicates and losses at the
 * server by Message-ID. Needs PostgreSQL: `npm run bench:notices` starts the test cluster.
 * Prints figures; asserts nothing (timings vary by machine).
 */
import net from "node:net";
import os from "node:os";
import nodemailer from "nodemailer";
import type SMTPPool from "nodemailer/lib/smtp-pool";
import { Op, QueryTypes } from "sequelize";
import { loadActor } from "@/lib/server/auth/actor";
import { env } from "@/lib/server/env";
import { startFakeSmtp } from "@/scripts/fakes/smtp-server";
import { composeNoticeEmail } from "@/lib/notices/compose";
import { drainDue, workerDefaults } from "@/lib/notices/delivery-worker";
import { subscriptionLinks, unsubscribeToken } from "@/lib/notices/link-tokens";
import { createNoticeTransport, socketWithoutDelay } from "@/lib/notices/notice-transport";
import { sendNotice } from "@/lib/notices/send-notice";
import { Notice, NoticeDelivery, Park, ParkMembership, Subscription, User, sequelize } from "@/models";
import { emitResult } from "./lib/result";

const SUBSCRIBERS = Number(process.env.BENCH_SUBSCRIBERS ?? 10_000);
const CONNECTIONS = 4;
const TAG = `bench-${Date.now().toString(36)}`;

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = net.createServer().listen(0, "127.0.0.1", () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
const messageIdOf = (raw: string) => /^Message-ID:\s*(<[^>\r\n]+>)/im.exec(raw)?.[1] ?? null;

async function setUp() {
  const park = await Park.create({ slug: TAG, name: "Bench Hollow (benchmark)", timeZone: "Europe/Zurich", centerLon: 8.5, centerLat: 46.8, baseElevationM: 900, summitElevationM: 1800 });
  const ranger = await User.create({ email: `${TAG}-ranger@bench.loamcast.test`, name: "Bench Ranger", passwordHash: "x".repeat(60), disabledAt: null, emailVerifiedAt: new Date() });
  await ParkMembership.create({ parkId: park.id, userId: ranger.id, role: "ranger" });
  for (let start = 0; start < SUBSCRIBERS; start += 2000) {
    const users = await User.bulkCreate(
      Array.from({ length: Math.min(2000, SUBSCRIBERS - start) }, (_, i) => ({ email: `${TAG}-${start + i}@bench.loamcast.test`, name: `Rider ${start + i}`, passwordHash: "x".repeat(60), disabledAt: null, emailVerifiedAt: new Date() })),
      { returning: true },
    );
    await Subscription.bulkCreate(users.map((u) => ({ userId: u.id, parkId: park.id, email: u.email, trailIds: null, confirmedAt: new Date(), unsubscribedAt: null })));
  }
  return { park, ranger: (await loadActor(ranger.id))! };
}

type Row = { label: string; messages: number; seconds: number; duplicates: number; lost: number };

function tally(label: string, seconds: number, expected: Set<string>, raws: string[]): Row {
  const ids = raws.map(messageIdOf).filter((id): id is string => id !== null && expected.has(id));
  const unique = new Set(ids);
  return { label, messages: ids.length, seconds, duplicates: ids.length - unique.size, lost: expected.size - unique.size };
}

async function queueNotice(park: Park, actor: NonNullable<Awaited<ReturnType<typeof loadActor>>>, message: string) {
  const started = performance.now();
  const { id, recipientCount } = await sendNotice(actor, park.id, { kind: "closure", message }, { perHour: 1000 });
  return { id, recipientCount, queueMs: performance.now() - started };
}

async function main() {
  const smtpPort = await freePort();
  const server = await startFakeSmtp({ smtpPort, controlPort: await freePort() });
  const smtpUrl = `smtp://127.0.0.1:${smtpPort}`;
  const setUpStart = performance.now();
  const { park, ranger } = await setUp();
  console.log(`set-up: ${SUBSCRIBERS} confirmed subscribers in ${((performance.now() - setUpStart) / 1000).toFixed(1)} s`);
  const rows: Row[] = [];
  const queueTimes: number[] = [];

  // 1. Bare pooled nodemailer: the same messages the worker will send for notice A; once as
  // nodemailer comes, once with the worker's sockets (Nagle off) to separate the two effects.
  const a = await queueNotice(park, ranger, "Storm damage: all trails closed while the crew clears the lines.");
  queueTimes.push(a.queueMs);
  const notice = (await Notice.findByPk(a.id))!;
  const deliveries = await NoticeDelivery.findAll({ where: { noticeId: a.id }, attributes: ["userId", "email", "messageId"] });
  const expectedA = new Set(deliveries.map((d) => d.messageId));
  const links = subscriptionLinks(env().APP_URL);
  const messages = deliveries.map((d) => {
    const token = unsubscribeToken(d.userId, park.id);
    const email = composeNoticeEmail({ park, subject: notice.subject, message: notice.message, closedUntil: null, appUrl: env().APP_URL, unsubscribePageUrl: links.unsubscribePage(token), oneClickUrl: links.oneClick(token) });
    return { from: env().MAIL_FROM, to: d.email, subject: email.subject, text: email.text, html: email.html, headers: email.headers, messageId: d.messageId };
  });
  const bareVariants = [
    { label: `bare pooled nodemailer (${CONNECTIONS} connections)`, extra: {} },
    { label: `bare pooled nodemailer, Nagle off (${CONNECTIONS} connections)`, extra: { getSocket: socketWithoutDelay } },
  ];
  let started = 0;
  for (const variant of bareVariants) {
    const bare = nodemailer.createTransport({ host: "127.0.0.1", port: smtpPort, pool: true, maxConnections: CONNECTIONS, ignoreTLS: true, ...variant.extra } as SMTPPool.Options);
    started = performance.now();
    await Promise.all(messages.map((m) => bare.sendMail(m)));
    rows.push(tally(variant.label, (performance.now() - started) / 1000, expectedA, server.messages.map((m) => m.raw)));
    bare.close();
    server.messages.length = 0;
  }

  // 2. The notice worker: claim, send, settle, for notice A itself.
  const one = createNoticeTransport({ smtpUrl, maxConnections: CONNECTIONS });
  started = performance.now();
  await drainDue(workerDefaults(one, { concurrency: 4 * CONNECTIONS }));
  rows.push(tally(`notice worker: 1 × ${CONNECTIONS} connections, ${4 * CONNECTIONS} in flight`, (performance.now() - started) / 1000, expectedA, server.messages.map((m) => m.raw)));
  one.close();
  server.messages.length = 0;

  // 3. Two workers at once on a second notice (as two processes would, sharing the queue).
  const b = await queueNotice(park, ranger, "Reopening at noon: all trails open again.");
  queueTimes.push(b.queueMs);
  const expectedB = new Set((await NoticeDelivery.findAll({ where: { noticeId: b.id }, attributes: ["messageId"] })).map((d) => d.messageId));
  const [t1, t2] = [createNoticeTransport({ smtpUrl, maxConnections: CONNECTIONS / 2 }), createNoticeTransport({ smtpUrl, maxConnections: CONNECTIONS / 2 })];
  started = performance.now();
  await Promise.all([drainDue(workerDefaults(t1, { concurrency: 2 * CONNECTIONS })), drainDue(workerDefaults(t2, { concurrency: 2 * CONNECTIONS }))]);
  rows.push(tally(`notice workers: 2 × ${CONNECTIONS / 2} connections, ${2 * CONNECTIONS} in flight`, (performance.now() - started) / 1000, expectedB, server.messages.map((m) => m.raw)));
  t1.close();
  t2.close();
  const states = await sequelize.query(`SELECT state, count(*)::int AS n FROM notice_deliveries WHERE notice_id IN ($1, $2) GROUP BY state`, { bind: [a.id, b.id], type: QueryTypes.SELECT });

  console.log(`\nmachine: ${os.cpus().length} × ${os.cpus()[0]?.model ?? "cpu"}, Node ${process.version}; fake SMTP in this process`);
  console.log(`queueing (notice + ${SUBSCRIBERS} deliveries in one transaction): ${queueTimes.map((t) => `${t.toFixed(0)} ms`).join(", ")}`);
  console.table(rows.map((r) => ({ sender: r.label, messages: r.messages, seconds: +r.seconds.toFixed(2), "msg/s": Math.round(r.messages / r.seconds), duplicates: r.duplicates, lost: r.lost })));
  console.log("delivery rows by state:", JSON.stringify(states));
  const [plain, nagleOff, worker, twoWorkers] = rows;
  const rate = (r: Row) => r.messages / r.seconds;
  const total = (rs: Row[], key: "duplicates" | "lost") => rs.reduce((sum, r) => sum + r[key], 0);
  emitResult([
    { benchmark: `notice to ${SUBSCRIBERS.toLocaleString("en-US")} subscribers: worker vs bare pooled nodemailer`, ours: rate(worker), bare: rate(plain), unit: "msg/s" },
    { benchmark: "notice fan-out: worker vs bare pooled nodemailer, Nagle off", ours: rate(worker), bare: rate(nagleOff), unit: "msg/s" },
    { benchmark: "notice fan-out: two workers vs bare pooled nodemailer", ours: rate(twoWorkers), bare: rate(plain), unit: "msg/s" },
    { benchmark: "notice fan-out: duplicates (workers vs bare, all runs)", ours: total([worker, twoWorkers], "duplicates"), bare: total([plain, nagleOff], "duplicates"), unit: "messages" },
    { benchmark: "notice fan-out: losses (workers vs bare, all runs)", ours: total([worker, twoWorkers], "lost"), bare: total([plain, nagleOff], "lost"), unit: "messages" },
  ]);

  await Park.destroy({ where: { id: park.id } });
  await User.destroy({ where: { email: { [Op.like]: `${TAG}-%` } } });
  await server.close();
  await sequelize.close();
}

main().catch(async (error) => {
  console.error(error);
  await sequelize.close();
  process.exit(1);
});
