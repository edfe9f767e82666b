import "server-only";
/** GET /api/parks/{slug}/closures.ics: the park's planned closures as a calendar riders subscribe to. */
import { Op } from "sequelize";
import { absoluteUrl } from "@/lib/reach/links";
import { env } from "@/lib/server/env";
import { closuresCalendar, noticeClosureEvents, parkStateEvents } from "@/lib/reach/pure/closure-calendar";
import { Notice, ParkState, Trail, type Park } from "@/models";

/** How far back the feed reaches: long enough that a calendar shows last week's closures. */
const LOOKBACK_MS = 30 * 86_400_000;

export async function closuresCalendarFor(park: Park, now = new Date()): Promise<string> {
  const since = new Date(now.getTime() - LOOKBACK_MS);
  const [states, notices, trails] = await Promise.all([
    ParkState.findAll({ where: { parkId: park.id, state: ["closed", "delayed"], startsAt: { [Op.gte]: since } }, order: [["createdAt", "ASC"]] }),
    Notice.findAll({ where: { parkId: park.id, kind: ["closure", "reopening"], createdAt: { [Op.gte]: since } }, order: [["createdAt", "ASC"]] }),
    Trail.findAll({ where: { parkId: park.id }, attributes: ["id", "name"] }),
  ]);
  const calendarPark = { slug: park.slug, name: park.name, timeZone: park.timeZone };
  const events = [
    ...parkStateEvents(states.map((s) => s.get({ plain: true })), calendarPark, now),
    ...noticeClosureEvents(notices.map((n) => n.get({ plain: true })), calendarPark, new Map(trails.map((t) => [t.id, t.name]))),
  ];
  return closuresCalendar(calendarPark, events, { uidDomain: new URL(env().APP_URL).hostname, boardUrl: absoluteUrl(`/parks/${park.slug}`) });
}
