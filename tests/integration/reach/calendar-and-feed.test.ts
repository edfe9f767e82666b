import ICAL from "ical.js";
import { afterAll, describe, expect, it } from "vitest";
import { GET as statusGet, OPTIONS as statusOptions } from "@/app/api/parks/[parkSlug]/status.json/route";
import { parkToday } from "@/lib/conditions/park-today";
import { setParkState } from "@/lib/conditions/park-state";
import { closuresCalendarFor } from "@/lib/reach/closures";
import { Notice, TrailReport, sequelize } from "@/models";
import { createTrail, parkWithTrails } from "../conditions/fixtures";

afterAll(() => sequelize.close());

const HOUR = 3_600_000;
const events = (text: string) => new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent").map((v) => new ICAL.Event(v));

describe("closures.ics", () => {
  it("lists a planned park closure and a trail closure; changing the closure updates the same UID", async () => {
    const { park, ranger, trails } = await parkWithTrails(1);
    const startsAt = new Date(Date.now() + 26 * HOUR);
    await setParkState(ranger, park, { state: "closed", message: "Race day: the park is closed to the public.", startsAt: startsAt.toISOString(), endsAt: new Date(startsAt.getTime() + 4 * HOUR).toISOString() });
    await Notice.create({ parkId: park.id, kind: "closure", trailIds: [trails[0].id], subject: "Trail 1 closed", message: "Bridge repair.", closedUntil: new Date(Date.now() + 72 * HOUR), createdBy: null });

    const first = events(await closuresCalendarFor(park));
    expect(first.map((e) => e.summary).sort()).toEqual([`${park.name}: closed`, "Trail 1: closed"]);
    const closure = first.find((e) => e.summary === `${park.name}: closed`)!;
    expect(closure.startDate.toJSDate().getTime()).toBe(Math.floor(startsAt.getTime() / 1000) * 1000);
    expect(closure.component.getFirstProperty("dtstart")?.getParameter("tzid")).toBe(park.timeZone);

    // Staff move the end an hour later: setParkState replaces the row, the calendar keeps the UID.
    await setParkState(ranger, park, { state: "closed", message: "Race day: the park is closed to the public.", startsAt: startsAt.toISOString(), endsAt: new Date(startsAt.getTime() + 5 * HOUR).toISOString() });
    const second = events(await closuresCalendarFor(park));
    expect(second).toHaveLength(2);
    const moved = second.find((e) => e.uid === closure.uid)!;
    expect(moved.sequence).toBeGreaterThan(closure.sequence);
    expect(moved.endDate.toJSDate().getTime()).toBe(Math.floor((startsAt.getTime() + 5 * HOUR) / 1000) * 1000);
  });
});

describe("status.json", () => {
  it("gives today's statuses with CORS for any origin, an ETag and a minute at the CDN", async () => {
    const { park, trails } = await parkWithTrails(2);
    await createTrail(park, "Trail 3");
    await TrailReport.create({ trailId: trails[0].id, parkId: park.id, reportDate: parkToday(park), status: "caution", reason: "Roots are wet", surfaces: ["wet"], features: {}, note: null, reporterId: null });
    const call = (headers: Record<string, string> = {}) =>
      statusGet(new Request(`http://localhost/api/parks/${park.slug}/status.json`, { headers: { origin: "https://pine-hollow.example", ...headers } }), { params: Promise.resolve({ parkSlug: park.slug }) });

    const response = await call();
    expect(response.status).toBe(200);
    expect(response.headers.get("access-control-allow-origin")).toBe("*");
    expect(response.headers.get("access-control-expose-headers")).toContain("ETag");
    expect(response.headers.get("cache-control")).toContain("s-maxage=60");
    const feed = await response.json();
    expect(feed.park).toMatchObject({ slug: park.slug, name: park.name, timeZone: park.timeZone });
    expect(feed.counts).toEqual({ open: 0, caution: 1, closed: 0, notInspected: 2 });
    expect(feed.trails[0]).toMatchObject({ name: "Trail 1", status: "caution", reason: "Roots are wet" });
    expect(feed.trails[0].lastInspectedAt).not.toBeNull();
    expect(feed.parkNotice).toBeNull();

    const etag = response.headers.get("etag")!;
    expect((await call({ "if-none-match": etag })).status).toBe(304);
    await TrailReport.create({ trailId: trails[1].id, parkId: park.id, reportDate: parkToday(park), status: "open", reason: null, surfaces: ["tacky"], features: {}, note: null, reporterId: null });
    const changed = await call({ "if-none-match": etag });
    expect(changed.status).toBe(200);
    expect(changed.headers.get("etag")).not.toBe(etag);

    const preflight = statusOptions();
    expect(preflight.status).toBe(204);
    expect(preflight.headers.get("access-control-allow-headers")).toContain("If-None-Match");
  });

  it("answers 404 for a park that does not exist", async () => {
    const response = await statusGet(new Request("http://localhost/api/parks/nowhere/status.json"), { params: Promise.resolve({ parkSlug: "no-such-park-here" }) });
    expect(response.status).toBe(404);
  });
});
