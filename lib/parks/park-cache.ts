import "server-only";
import { QueryTypes } from "sequelize";
import { parkVersionListener, primaryRows, sequelize, type ListenerMark } from "@/models";

/**
 * Answers computed per park (the board, the map's GeoJSON) kept in this process until the park
 * changes. "Changes" is decided by PostgreSQL, not by this process: triggers raise the park's
 * row in park_versions on every write to what these answers show (migrations/20261202-1601), and
 * each request reads that row from the primary, one indexed lookup, before using a cached answer.
 * So an answer cached by instance B is dropped the moment instance A's write commits. The same
 * triggers NOTIFY every instance (models/park-version-listener.ts): while that connection is up,
 * an answer whose park has had no notification since its version was read is served without
 * asking the database at all; with the connection down or silent, every request reads the
 * version row as before. An answer
 * also expires at the park's next midnight (its "today" rolls over) and when a scheduled park
 * state starts or ends, which happen without a write.
 * On a miss the answer is computed from the primary too: a replica that lags would otherwise
 * let an old answer be cached under the new version.
 */
const VERSION_SQL = `
SELECT p.id, COALESCE(v.version, 0)::text AS version,
       to_char(($2::timestamptz AT TIME ZONE p.time_zone)::date, 'YYYY-MM-DD') AS today
FROM parks p LEFT JOIN park_versions v ON v.park_id = p.id
WHERE p.slug = $1`;

/** The next instant, after $2, at which the answer changes by itself: park-local midnight or a park state's start or end. */
const VALID_UNTIL_SQL = `
SELECT LEAST(
  ((($2::timestamptz AT TIME ZONE p.time_zone)::date + 1)::timestamp AT TIME ZONE p.time_zone),
  (SELECT min(b.t) FROM park_states s CROSS JOIN LATERAL (VALUES (s.starts_at), (s.ends_at)) AS b(t)
   WHERE s.park_id = p.id AND s.cleared_at IS NULL AND b.t > $2::timestamptz)
) AS valid_until
FROM parks p WHERE p.id = $1`;

type Entry<T> = { parkId: string; version: string; today: string; validUntil: number; mark: ListenerMark; value: Promise<T> };

/** Parks × answer kinds is small; the cap only guards against a flood of slugs. */
const MAX_ENTRIES = 1_000;
const globalForCache = globalThis as unknown as { loamcastParkCache?: Map<string, Entry<unknown>> };
const entries = (globalForCache.loamcastParkCache ??= new Map());

export type ParkStamp = { parkId: string; version: string; today: string };

/** The park's current version and park-local date, read from the primary; null when there is no such park. */
export async function parkStamp(slug: string, now: Date): Promise<ParkStamp | null> {
  const [row] = await primaryRows<{ id: string; version: string; today: string }>(VERSION_SQL, [slug, now.toISOString()]);
  return row ? { parkId: row.id, version: row.version, today: row.today } : null;
}

async function validUntil(parkId: string, now: Date): Promise<number> {
  const [row] = await sequelize.query<{ valid_until: Date | string | null }>(VALID_UNTIL_SQL, { bind: [parkId, now.toISOString()], type: QueryTypes.SELECT, useMaster: true });
  return row?.valid_until ? new Date(row.valid_until).getTime() : now.getTime();
}

/**
 * `compute(stamp)` for this park and kind, or the answer cached for the park's current version.
 * Concurrent misses share one computation. Null when there is no such park. A failed computation
 * is not kept.
 */
export async function cachedForPark<T>(slug: string, kind: string, compute: (stamp: ParkStamp) => Promise<T>, now = new Date()): Promise<T | null> {
  const key = `${kind}\u0000${slug}`;
  const known = entries.get(key) as Entry<T> | undefined;
  const fresh = known && now.getTime() < known.validUntil;
  if (fresh && parkVersionListener.unchangedSince(known.parkId, known.mark)) return known.value;

  const before = parkVersionListener.snapshot();
  const stamp = await parkStamp(slug, now);
  if (!stamp) return null;
  const mark = parkVersionListener.markAfter(stamp.parkId, before);
  if (fresh && known.parkId === stamp.parkId && known.version === stamp.version && known.today === stamp.today) {
    known.mark = mark;
    return known.value;
  }

  const entry: Entry<T> = { parkId: stamp.parkId, version: stamp.version, today: stamp.today, validUntil: Infinity, mark, value: compute(stamp) };
  entries.delete(key);
  if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value!);
  entries.set(key, entry);
  try {
    const [, until] = await Promise.all([entry.value, validUntil(stamp.parkId, now)]);
    entry.validUntil = until;
  } catch (error) {
    if (entries.get(key) === entry) entries.delete(key);
    throw error;
  }
  return entry.value;
}
