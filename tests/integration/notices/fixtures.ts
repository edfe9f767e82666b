import { afterAll, beforeAll } from "vitest";
import net from "node:net";
import { randomUUID } from "node:crypto";
import { loadActor } from "@/lib/server/auth/actor";
import { startFakeSmtp } from "@/scripts/fakes/smtp-server";
import { workerDefaults, type WorkerOptions } from "@/lib/notices/delivery-worker";
import { createNoticeTransport } from "@/lib/notices/notice-transport";
import { NoticeDelivery, Park, Subscription, Trail, User, sequelize } from "@/models";
import { addStaff, createPark, createUser } from "../helpers";

/** Shared set-up for the notice tests: parks with staff, many subscribers, a private fake SMTP server. */
export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** A fake SMTP server of this test's own, so an outage staged here touches nothing else. */
export async function privateSmtp() {
  const smtpPort = await freePort();
  const controlPort = await freePort();
  const server = await startFakeSmtp({ smtpPort, controlPort });
  const smtpUrl = `smtp://127.0.0.1:${smtpPort}`;
  return { server, smtpUrl, controlUrl: `http://127.0.0.1:${controlPort}`, transport: (maxConnections = 4) => createNoticeTransport({ smtpUrl, maxConnections }) };
}

type PrivateSmtp = Awaited<ReturnType<typeof privateSmtp>>;

/**
 * One notice test file's own fake SMTP server: started before its tests, stopped after them with
 * the file's parks removed and the pool closed. Read through getters, so `smtp.server` is the
 * running server inside any test.
 */
export function privateSmtpForFile(): PrivateSmtp {
  let smtp: PrivateSmtp | undefined;
  beforeAll(async () => {
    smtp = await privateSmtp();
  });
  afterAll(async () => {
    await removeCreatedParks();
    await smtp?.server.close();
    await sequelize.close();
  });
  const running = () => {
    if (!smtp) throw new Error("The fake SMTP server starts in beforeAll: read it inside a test.");
    return smtp;
  };
  return {
    get server() { return running().server; },
    get smtpUrl() { return running().smtpUrl; },
    get controlUrl() { return running().controlUrl; },
    transport: (maxConnections?: number) => running().transport(maxConnections),
  };
}

export const messageIdOf = (raw: string) => /^Message-ID:\s*(<[^>\r\n]+>)/im.exec(raw)?.[1] ?? null;

/** Backoff in milliseconds instead of minutes, so tests wait for retries without long sleeps. */
export function fastWorker(transport: ReturnType<typeof createNoticeTransport>, overrides: Partial<WorkerOptions> = {}): WorkerOptions {
  return workerDefaults(transport, { batchSize: 50, concurrency: 4, retry: { maxAttempts: 200, baseDelayMs: 2, maxDelayMs: 20 }, staleClaimMs: 60_000, ...overrides });
}

const createdParks: string[] = [];

/** Removes the parks this file created, with their notices, deliveries and subscriptions (cascade). */
export async function removeCreatedParks() {
  await Park.destroy({ where: { id: createdParks.splice(0) } });
}

export async function parkWithStaff() {
  const park = await createPark();
  createdParks.push(park.id);
  const manager = await createUser();
  const ranger = await createUser();
  await addStaff(park.id, manager.id, "manager");
  await addStaff(park.id, ranger.id, "ranger");
  return { park, manager: (await loadActor(manager.id))!, ranger: (await loadActor(ranger.id))! };
}

export async function createTrail(parkId: string, name: string) {
  const line = { type: "LineString" as const, coordinates: [[8.5, 46.8], [8.51, 46.79]] };
  return Trail.create({
    parkId, name, difficulty: "intermediate", kind: "flow", geometry: line, simplified: line, lengthM: 1200,
    ascentM: 0, descentM: 150, avgGradePct: -12, maxGradePct: -20, minElevationM: 900, maxElevationM: 1050,
    suggestedDifficulty: null, minLon: 8.5, minLat: 46.79, maxLon: 8.51, maxLat: 46.8, pointCount: 2, createdBy: null,
  });
}

type SubscriberOptions = { confirmed?: boolean; trailIds?: string[] | null; kinds?: string[]; unsubscribed?: boolean };

/** `count` riders subscribed to the park, created in bulk (they never sign in). */
export async function createSubscribers(parkId: string, count: number, opts: SubscriberOptions = {}) {
  const tag = randomUUID().slice(0, 8);
  const users = await User.bulkCreate(
    Array.from({ length: count }, (_, i) => ({ email: `sub-${tag}-${i}@tests.loamcast.test`, name: `Subscriber ${i}`, passwordHash: "x".repeat(60), disabledAt: null })),
    { returning: true },
  );
  await Subscription.bulkCreate(
    users.map((u) => ({
      userId: u.id, parkId, email: u.email, trailIds: opts.trailIds ?? null, kinds: opts.kinds ?? ["closure", "reopening", "advisory"],
      confirmedAt: opts.confirmed === false ? null : new Date(), unsubscribedAt: opts.unsubscribed ? new Date() : null,
    })),
  );
  return users;
}

export async function stateCounts(noticeId: string) {
  const rows = await NoticeDelivery.findAll({ where: { noticeId }, attributes: ["state"] });
  const counts: Record<string, number> = {};
  for (const r of rows) counts[r.state] = (counts[r.state] ?? 0) + 1;
  return counts;
}

export const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Undoes quoted-printable (RFC 2045 §6.7) so links in a raw message can be read whole. */
export const decodeQuotedPrintable = (raw: string) =>
  raw.replace(/=\r?\n/g, "").replace(/=([0-9A-F]{2})/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16)));

export function linkIn(raw: string, path: string): string | null {
  const escaped = path.replace(/[/?]/g, (c) => `\\${c}`);
  return new RegExp(`https?://[^\\s"<>]+${escaped}\\?token=[A-Za-z0-9._%-]+`).exec(decodeQuotedPrintable(raw))?.[0] ?? null;
}

export const tokenOf = (link: string) => new URL(link).searchParams.get("token")!;
