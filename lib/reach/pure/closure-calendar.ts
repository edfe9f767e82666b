/**
 * Planned closures as an iCalendar feed (RFC 5545). Each event keeps one UID for its whole life,
 * so a change (a later end, a cancellation) updates the rider's calendar instead of adding a copy;
 * SEQUENCE counts the changes (RFC 5545 §3.8.7.4).
 */
import { ICalCalendar, ICalEventStatus } from "ical-generator";
import { DateTime } from "luxon";
import { tzlib_get_ical_block } from "timezones-ical-library";
import { parkLocalInstant, parkLocalDate, shiftDate } from "@/lib/shared/park-clock";

export type ParkStateRow = { id: string; state: "closed" | "delayed" | "advisory"; message: string; startsAt: Date; endsAt: Date | null; clearedAt: Date | null; createdAt: Date };
export type ClosureNoticeRow = { id: string; kind: "closure" | "reopening" | "advisory"; trailIds: string[] | null; subject: string; message: string; closedUntil: Date | null; createdAt: Date };
export type CalendarPark = { slug: string; name: string; timeZone: string };

export type ClosureEvent = {
  /** Stable across changes: the key of what is closed and when it started. */
  key: string;
  sequence: number;
  summary: string;
  description: string;
  start: Date;
  end: Date;
  lastModified: Date;
  cancelled: boolean;
};

/** The end of the park-local day holding `instant`: where an open-ended state is drawn to. */
function endOfParkDay(instant: Date, timeZone: string): Date {
  return parkLocalInstant(shiftDate(parkLocalDate(instant, timeZone), 1), "00:00", timeZone);
}

const latest = (...dates: Date[]) => new Date(Math.max(...dates.map((d) => d.getTime())));

/**
 * Park-wide closures and delays. A state replaced on the same park-local day by one of the same
 * kind is the same event (staff moving the end time), so it keeps its UID.
 */
export function parkStateEvents(rows: ParkStateRow[], park: CalendarPark, now: Date): ClosureEvent[] {
  const groups = new Map<string, ParkStateRow[]>();
  for (const row of rows) {
    if (row.state === "advisory") continue;
    const key = `park-${row.state}-${parkLocalDate(row.startsAt, park.timeZone)}`;
    groups.set(key, [...(groups.get(key) ?? []), row]);
  }
  return [...groups].map(([key, group]) => {
    const ordered = [...group].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
    const last = ordered[ordered.length - 1];
    const cancelled = Boolean(last.clearedAt && last.clearedAt <= last.startsAt);
    const clearedEarly = last.clearedAt && (!last.endsAt || last.clearedAt < last.endsAt) ? last.clearedAt : null;
    const end = cancelled ? last.endsAt ?? endOfParkDay(last.startsAt, park.timeZone) : clearedEarly ?? last.endsAt ?? endOfParkDay(latest(last.startsAt, now), park.timeZone);
    const what = last.state === "closed" ? "closed" : "opening late";
    return {
      key,
      sequence: ordered.length - 1 + (last.clearedAt ? 1 : 0),
      summary: `${park.name}: ${what}`,
      description: last.endsAt || clearedEarly ? last.message : `${last.message}\nUntil further notice.`,
      start: last.startsAt,
      end: end > last.startsAt ? end : last.startsAt,
      lastModified: latest(last.createdAt, last.clearedAt ?? last.createdAt),
      cancelled,
    };
  });
}

/**
 * Closures announced by notice with a "closed until". A closure notice sent while the same trail
 * is still closed extends that closure (same UID); a reopening notice ends it early.
 */
export function noticeClosureEvents(notices: ClosureNoticeRow[], park: CalendarPark, trailNames: Map<string, string>): ClosureEvent[] {
  type Open = { first: ClosureNoticeRow; last: ClosureNoticeRow; count: number; end: Date; reopenedAt: Date | null };
  const chains = new Map<string, Open[]>();
  const ordered = [...notices].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  for (const notice of ordered) {
    if (notice.kind === "advisory") continue;
    for (const subject of notice.trailIds ?? ["park"]) {
      const list = chains.get(subject) ?? [];
      const current = list[list.length - 1];
      const stillClosed = current && !current.reopenedAt && current.end > notice.createdAt;
      if (notice.kind === "reopening") {
        if (stillClosed) current.reopenedAt = notice.createdAt;
      } else if (notice.closedUntil) {
        if (stillClosed) Object.assign(current, { last: notice, count: current.count + 1, end: notice.closedUntil });
        else list.push({ first: notice, last: notice, count: 1, end: notice.closedUntil, reopenedAt: null });
      }
      chains.set(subject, list);
    }
  }
  return [...chains].flatMap(([subject, list]) =>
    list.map((chain) => {
      const name = subject === "park" ? park.name : trailNames.get(subject) ?? "A trail";
      return {
        key: `closure-${subject}-${chain.first.id}`,
        sequence: chain.count - 1 + (chain.reopenedAt ? 1 : 0),
        summary: `${name}: closed`,
        description: chain.reopenedAt ? `${chain.last.message}\nReopened early.` : chain.last.message,
        start: chain.first.createdAt,
        end: chain.reopenedAt ?? chain.end,
        lastModified: chain.reopenedAt ?? chain.last.createdAt,
        cancelled: false,
      };
    }),
  );
}

/** The calendar text, times in the park's zone with its VTIMEZONE. */
export function closuresCalendar(park: CalendarPark, events: ClosureEvent[], options: { uidDomain: string; boardUrl: string }): string {
  const calendar = new ICalCalendar({
    name: `${park.name}: planned closures`,
    description: `Park-wide closures, late openings and trail closures at ${park.name}.`,
    prodId: { company: "Loamcast", product: "Planned closures", language: "EN" },
    url: options.boardUrl,
    ttl: 60 * 30,
  });
  // No calendar-wide zone: DTSTAMP and LAST-MODIFIED must stay in UTC (RFC 5545 §3.8.7.2); the
  // generator still writes the VTIMEZONE of every zone the events use.
  calendar.timezone({ name: null, generator: (zone) => tzlib_get_ical_block(zone)[0] });
  const local = (instant: Date) => DateTime.fromJSDate(instant).setZone(park.timeZone);
  for (const event of [...events].sort((a, b) => a.start.getTime() - b.start.getTime())) {
    calendar.createEvent({
      id: `${event.key}.${park.slug}@${options.uidDomain}`,
      sequence: event.sequence,
      stamp: event.lastModified,
      lastModified: event.lastModified,
      start: local(event.start),
      end: local(event.end),
      timezone: park.timeZone,
      summary: event.summary,
      description: event.description,
      url: options.boardUrl,
      status: event.cancelled ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
    });
  }
  return calendar.toString();
}
