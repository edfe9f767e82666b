import pg from "pg";
import { DEFAULT_DATABASE_URL } from "./database-url";
import { sequelize } from "./db";

/**
 * One connection per process to the primary that LISTENs for the park_versions triggers'
 * notifications (migrations/20261203-0401): each carries the id of a park whose board or map just
 * changed, sent by PostgreSQL when the writing transaction commits, to every instance.
 * lib/parks/park-cache.ts trusts a cached answer without asking the database only while this
 * connection has stayed up since the answer's version was read and no notification for its park
 * has arrived since, and this process has written nothing since (its own write's notification may
 * still be on its way when the writer reads the board back); otherwise it falls back to reading
 * the version row.
 */
export const PARK_VERSIONS_CHANNEL = "loamcast_park_versions";

/** How often the idle connection is asked for a sign of life; a silent one stops being trusted. */
const HEARTBEAT_MS = 5_000;
const RETRY_MS = 2_000;

/** The listener's state before a version read: which connection, and how many notifications so far. */
export type ListenerSnapshot = { epoch: number; total: number };
/** What a cached answer keeps: the connection it was confirmed under, its park's notification count, this process's write count. */
export type ListenerMark = { epoch: number; changes: number; localWrites: number };

class ParkVersionListener {
  /** Raised on every connect and every loss: a mark from another epoch is never trusted. */
  private epoch = 0;
  private live = false;
  private lastHeard = 0;
  private total = 0;
  private localWrites = 0;
  private readonly changes = new Map<string, number>();
  private client: pg.Client | null = null;
  private started = false;

  /** Take it before reading a park's version. */
  snapshot(): ListenerSnapshot {
    this.start();
    return { epoch: this.trusted() ? this.epoch : -1, total: this.total };
  }

  /**
   * After the version read: a mark for the park that holds only if no notification at all arrived
   * since `before` (one might have been this park's, for a write the read did not see).
   */
  markAfter(parkId: string, before: ListenerSnapshot): ListenerMark {
    const quiet = before.epoch === this.epoch && before.total === this.total;
    return { epoch: quiet ? before.epoch : -1, changes: this.changes.get(parkId) ?? 0, localWrites: this.localWrites };
  }

  /** Any statement of this process that may have written (every one but a SELECT): no mark taken before it holds. */
  noteLocalWrite() {
    this.localWrites++;
    this.total++;
  }

  /** True when nothing about the park can have changed since `mark` was taken (and it was taken while listening). */
  unchangedSince(parkId: string, mark: ListenerMark): boolean {
    return mark.epoch >= 0 && this.trusted() && mark.epoch === this.epoch && mark.localWrites === this.localWrites && (this.changes.get(parkId) ?? 0) === mark.changes;
  }

  private trusted() {
    return this.live && Date.now() - this.lastHeard < 2 * HEARTBEAT_MS;
  }

  private start() {
    if (this.started) return;
    this.started = true;
    void this.connect();
  }

  private lost(client: pg.Client) {
    if (this.client !== client) return;
    this.client = null;
    this.live = false;
    this.epoch++;
    client.end().catch(() => {});
    setTimeout(() => void this.connect(), RETRY_MS).unref();
  }

  private async connect() {
    const client = new pg.Client({ connectionString: process.env.DATABASE_URL || DEFAULT_DATABASE_URL, keepAlive: true, application_name: "loamcast park versions" });
    this.client = client;
    client.on("error", () => this.lost(client));
    client.on("end", () => this.lost(client));
    client.on("notification", (message) => {
      if (message.channel !== PARK_VERSIONS_CHANNEL || !message.payload) return;
      this.changes.set(message.payload, (this.changes.get(message.payload) ?? 0) + 1);
      this.total++;
      this.lastHeard = Date.now();
    });
    try {
      await client.connect();
      await client.query(`LISTEN ${PARK_VERSIONS_CHANNEL}`);
      // A new epoch: marks taken before this connection listened are worth nothing.
      this.epoch++;
      this.lastHeard = Date.now();
      this.live = true;
      // The socket must not keep a script or a test run alive.
      (client as unknown as { connection?: { stream?: { unref?: () => void } } }).connection?.stream?.unref?.();
      this.heartbeat(client);
    } catch {
      this.lost(client);
    }
  }

  private heartbeat(client: pg.Client) {
    const timer = setInterval(() => {
      if (this.client !== client) return clearInterval(timer);
      client.query("SELECT 1").then(
        () => (this.lastHeard = Date.now()),
        () => this.lost(client),
      );
    }, HEARTBEAT_MS);
    timer.unref();
  }
}

const globalForListener = globalThis as unknown as { loamcastParkVersionListener?: ParkVersionListener };
/** The process's one listener (shared by every module copy Next loads), connected on first use. */
export const parkVersionListener =
  globalForListener.loamcastParkVersionListener ??
  (() => {
    const listener = (globalForListener.loamcastParkVersionListener = new ParkVersionListener());
    // After the statement (a COMMIT too) and before its caller goes on: a read-back then revalidates.
    sequelize.addHook("afterQuery", (_options, query) => {
      if (!/^\s*SELECT\b/i.test((query as unknown as { sql?: string }).sql ?? "")) listener.noteLocalWrite();
    });
    return listener;
  })();
