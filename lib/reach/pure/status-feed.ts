/**
 * The public status feed a park's own website reads, and the counts every outward channel
 * (embed card, link preview image, print sheet) shows. Built from the board, so every channel
 * says exactly what the board says.
 */
import type { ReportStatus } from "@/lib/conditions/pure/schemas";

type FeedTrail = { id: string; name: string; difficulty: string; effectiveStatus: ReportStatus | null; status: ReportStatus | null; reason: string | null; lastReportAt: string | null };
type FeedBoard = {
  park: { slug: string; name: string; timeZone: string };
  date: string;
  parkState: { state: string; message: string; startsAt: string; endsAt: string | null } | null;
  trails: FeedTrail[];
};

export type StatusCounts = { open: number; caution: number; closed: number; notInspected: number };

export function statusCounts(trails: Pick<FeedTrail, "effectiveStatus">[]): StatusCounts {
  const counts: StatusCounts = { open: 0, caution: 0, closed: 0, notInspected: 0 };
  for (const trail of trails) counts[trail.effectiveStatus ?? "notInspected"] += 1;
  return counts;
}

/** `baseUrl` is the app's own origin, so links in the feed work from any website. */
export function statusFeed(board: FeedBoard, baseUrl: string) {
  const link = (path: string) => new URL(path, baseUrl).toString();
  return {
    park: { slug: board.park.slug, name: board.park.name, timeZone: board.park.timeZone, url: link(`/parks/${board.park.slug}`) },
    date: board.date,
    parkNotice: board.parkState && { state: board.parkState.state, message: board.parkState.message, startsAt: board.parkState.startsAt, endsAt: board.parkState.endsAt },
    counts: statusCounts(board.trails),
    trails: board.trails.map((t) => ({
      id: t.id,
      name: t.name,
      difficulty: t.difficulty,
      /** What riders should follow today (a park-wide closure closes every trail); null when not inspected. */
      status: t.effectiveStatus,
      /** The trail's own inspection result, before any park-wide state. */
      reportedStatus: t.status,
      reason: t.reason,
      lastInspectedAt: t.lastReportAt,
      url: link(`/trails/${t.id}`),
    })),
  };
}

export type StatusFeed = ReturnType<typeof statusFeed>;
