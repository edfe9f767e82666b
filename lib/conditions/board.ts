import "server-only";
import { QueryTypes } from "sequelize";
import { changesSinceYesterday, type DayChanges } from "@/lib/conditions/pure/changes";
import { effectiveStatus } from "@/lib/conditions/pure/effective-status";
import type { FeatureStates, ParkStateKind, ReportStatus } from "@/lib/conditions/pure/schemas";
import { cachedForPark } from "@/lib/parks/park-cache";
import { prepareJson, type PreparedJson } from "@/lib/server/api/etag";
import { sequelize } from "@/models";
import { BOARD_SQL } from "./board-sql";

export type BoardHazard = { id: string; trailId: string | null; kind: string; note: string | null; lon: number; lat: number; reportedAt: string; photoIds: string[] };
export type BoardParkState = { id: string; state: ParkStateKind; message: string; startsAt: string; endsAt: string | null };

export type BoardTrail = {
  id: string;
  name: string;
  difficulty: string;
  kind: string;
  /** Today's status as reported; null when the trail has not been inspected today. */
  status: ReportStatus | null;
  /** What riders should follow: the park-wide state overrides the trail's own status. */
  effectiveStatus: ReportStatus | null;
  revision: number;
  reason: string | null;
  surfaces: string[];
  features: FeatureStates;
  note: string | null;
  inspectedToday: boolean;
  /** The latest inspection on or before today (today's when there is one). */
  lastReportAt: string | null;
  yesterday: { status: ReportStatus; surfaces: string[] } | null;
  changedSinceYesterday: boolean;
  changes: DayChanges;
  hazards: BoardHazard[];
};

export type Board = {
  park: { slug: string; name: string; timeZone: string; fictional: boolean };
  date: string;
  generatedAt: string;
  parkState: BoardParkState | null;
  inspectedCount: number;
  trails: BoardTrail[];
  /** Open hazards pinned off any trail. */
  parkHazards: BoardHazard[];
};

type Row = {
  slug: string;
  park_name: string;
  time_zone: string;
  fictional: boolean;
  today: string;
  park_state: BoardParkState | null;
  park_hazards: BoardHazard[] | null;
  trail_id: string | null;
  trail_name: string;
  difficulty: string;
  kind: string;
  revision: number | null;
  status: ReportStatus | null;
  reason: string | null;
  surfaces: string[] | null;
  features: FeatureStates | null;
  note: string | null;
  last_report_at: Date | null;
  yesterday_status: ReportStatus | null;
  yesterday_surfaces: string[] | null;
  hazards: BoardHazard[] | null;
};

const iso = (value: string | Date | null) => (value ? new Date(value).toISOString() : null);
const hazards = (list: BoardHazard[] | null): BoardHazard[] => (list ?? []).map((h) => ({ ...h, reportedAt: iso(h.reportedAt)! }));

function trailFrom(row: Row, parkState: BoardParkState | null): BoardTrail {
  const today = row.status ? { status: row.status, surfaces: row.surfaces ?? [] } : null;
  const yesterday = row.yesterday_status ? { status: row.yesterday_status, surfaces: row.yesterday_surfaces ?? [] } : null;
  const changes = changesSinceYesterday(today, yesterday);
  return {
    id: row.trail_id!,
    name: row.trail_name,
    difficulty: row.difficulty,
    kind: row.kind,
    status: row.status,
    effectiveStatus: effectiveStatus(row.status, parkState),
    revision: row.revision ?? 0,
    reason: row.reason,
    surfaces: row.surfaces ?? [],
    features: row.features ?? {},
    note: row.note,
    inspectedToday: Boolean(row.status),
    lastReportAt: iso(row.last_report_at),
    yesterday,
    changedSinceYesterday: changes.changed,
    changes,
    hazards: hazards(row.hazards),
  };
}

/** The board at `now`, from one indexed query (BOARD_SQL); null when there is no such park. */
async function readBoard(slug: string, now: Date, useMaster = false): Promise<Board | null> {
  const rows = await sequelize.query<Row>(BOARD_SQL, { bind: [slug, now.toISOString()], type: QueryTypes.SELECT, useMaster });
  if (rows.length === 0) return null;
  const first = rows[0];
  const parkState = first.park_state ? { ...first.park_state, startsAt: iso(first.park_state.startsAt)!, endsAt: iso(first.park_state.endsAt) } : null;
  const trails = rows.filter((r) => r.trail_id).map((r) => trailFrom(r, parkState));
  return {
    park: { slug: first.slug, name: first.park_name, timeZone: first.time_zone, fictional: first.fictional },
    date: first.today,
    generatedAt: now.toISOString(),
    parkState,
    inspectedCount: trails.filter((t) => t.inspectedToday).length,
    trails,
    parkHazards: hazards(first.park_hazards),
  };
}

/** The board with its JSON text and ETag, as the API sends it. */
export type BoardAnswer = PreparedJson & { board: Board };


/**
 * Today's board, its JSON and ETag, from the per-park cache (lib/parks/park-cache.ts): computed
 * once per change of the park, whichever instance wrote it. Callers share the answer: never
 * modify it. Null when there is no such park.
 */
export async function boardAnswer(slug: string): Promise<BoardAnswer | null> {
  const answer = await cachedForPark(slug, "board", async () => {
    const board = await readBoard(slug, new Date(), true);
    // The ETag ignores generatedAt, so an unchanged board answers 304 to a phone on poor signal.
    return board && { board, ...prepareJson(board, { ...board, generatedAt: null }) };
  });
  return answer ?? null;
}

/** Today's board for a park (cached), or the board at another instant when `now` is given; null when there is no such park. */
export async function boardForPark(slug: string, now?: Date): Promise<Board | null> {
  if (now) return readBoard(slug, now);
  return (await boardAnswer(slug))?.board ?? null;
}
