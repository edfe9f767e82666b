import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { closuresCalendar, noticeClosureEvents, parkStateEvents, type ClosureNoticeRow, type ParkStateRow } from "@/lib/reach/pure/closure-calendar";

// Checked against RFC 5545 (iCalendar) and parsed back with ical.js, a reference parser of the format.
const park = { slug: "pine-hollow", name: "Pine Hollow", timeZone: "Europe/Zurich" };
const now = new Date("2026-12-02T06:00:00Z");
const options = { uidDomain: "loamcast.test", boardUrl: "https://loamcast.test/parks/pine-hollow" };

const state = (over: Partial<ParkStateRow>): ParkStateRow => ({
  id: "s1",
  state: "closed",
  message: "Snow on the upper mountain.",
  startsAt: new Date("2026-12-03T08:00:00Z"),
  endsAt: new Date("2026-12-03T12:00:00Z"),
  clearedAt: null,
  createdAt: new Date("2026-12-02T05:00:00Z"),
  ...over,
});
const notice = (over: Partial<ClosureNoticeRow>): ClosureNoticeRow => ({
  id: "n1",
  kind: "closure",
  trailIds: ["t1"],
  subject: "Closed",
  message: "Bridge repair.",
  closedUntil: new Date("2026-12-05T16:00:00Z"),
  createdAt: new Date("2026-12-01T07:00:00Z"),
  ...over,
});

function parse(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  return { calendar, events: calendar.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v)) };
}

describe("planned closures calendar", () => {
  it("has the lines RFC 5545 requires and a VTIMEZONE for the park's zone", () => {
    const text = closuresCalendar(park, parkStateEvents([state({})], park, now), options);
    expect(text).toMatch(/^BEGIN:VCALENDAR\r\nVERSION:2\.0\r\nPRODID:/); // §3.6: VERSION and PRODID are required
    expect(text.trimEnd().endsWith("END:VCALENDAR")).toBe(true);
    for (const line of text.split("\r\n")) expect(new TextEncoder().encode(line).length).toBeLessThanOrEqual(75); // §3.1 folding
    const { calendar, events } = parse(text);
    expect(calendar.getFirstSubcomponent("vtimezone")?.getFirstPropertyValue("tzid")).toBe("Europe/Zurich");
    expect(events).toHaveLength(1);
    expect(text).toMatch(/DTSTAMP:\d{8}T\d{6}Z/); // §3.8.7.2: DTSTAMP in UTC
    // Zurich is UTC+1 in December (IANA tz database, Europe/Zurich): 08:00Z is 09:00 at the park.
    expect(text).toContain("DTSTART;TZID=Europe/Zurich:20261203T090000");
    expect(events[0].summary).toBe("Pine Hollow: closed");
    expect(events[0].uid).toBe("park-closed-2026-12-03.pine-hollow@loamcast.test");
  });

  it("a state replaced the same day keeps its UID with a higher SEQUENCE and the new end", () => {
    const first = parse(closuresCalendar(park, parkStateEvents([state({})], park, now), options)).events[0];
    const replaced = [
      state({ clearedAt: new Date("2026-12-02T07:00:00Z") }),
      state({ id: "s2", endsAt: new Date("2026-12-03T15:00:00Z"), createdAt: new Date("2026-12-02T07:00:00Z") }),
    ];
    const second = parse(closuresCalendar(park, parkStateEvents(replaced, park, now), options)).events;
    expect(second).toHaveLength(1);
    expect(second[0].uid).toBe(first.uid);
    expect(second[0].sequence).toBeGreaterThan(first.sequence);
    expect(second[0].endDate.toJSDate().toISOString()).toBe("2026-12-03T15:00:00.000Z");
  });

  it("a planned state cleared before it starts is cancelled, not dropped", () => {
    const events = parkStateEvents([state({ clearedAt: new Date("2026-12-02T09:00:00Z") })], park, now);
    const text = closuresCalendar(park, events, options);
    expect(text).toContain("STATUS:CANCELLED");
    expect(events[0].sequence).toBe(1);
  });

  it("advisories are not closures", () => {
    expect(parkStateEvents([state({ state: "advisory" })], park, now)).toEqual([]);
    expect(noticeClosureEvents([notice({ kind: "advisory" })], park, new Map())).toEqual([]);
  });

  it("an open-ended delay runs to the end of the park's day", () => {
    const [event] = parkStateEvents([state({ state: "delayed", startsAt: new Date("2026-12-02T07:00:00Z"), endsAt: null })], park, now);
    expect(event.end.toISOString()).toBe("2026-12-02T23:00:00.000Z"); // midnight in Zurich (UTC+1)
    expect(event.description).toContain("Until further notice.");
  });

  it("a second closure notice while the trail is closed extends the same event; a reopening ends it", () => {
    const names = new Map([["t1", "Root Canal"]]);
    const extended = noticeClosureEvents(
      [notice({}), notice({ id: "n2", createdAt: new Date("2026-12-03T07:00:00Z"), closedUntil: new Date("2026-12-08T16:00:00Z") })],
      park,
      names,
    );
    expect(extended).toHaveLength(1);
    expect(extended[0]).toMatchObject({ key: "closure-t1-n1", sequence: 1, summary: "Root Canal: closed" });
    expect(extended[0].end.toISOString()).toBe("2026-12-08T16:00:00.000Z");
    const reopened = noticeClosureEvents([notice({}), notice({ id: "n3", kind: "reopening", closedUntil: null, createdAt: new Date("2026-12-02T10:00:00Z") })], park, names);
    expect(reopened[0]).toMatchObject({ key: "closure-t1-n1", sequence: 1 });
    expect(reopened[0].end.toISOString()).toBe("2026-12-02T10:00:00.000Z");
  });

  it("a closure after the last one ended is a new event", () => {
    const events = noticeClosureEvents([notice({}), notice({ id: "n4", createdAt: new Date("2026-12-10T07:00:00Z"), closedUntil: new Date("2026-12-11T07:00:00Z") })], park, new Map());
    expect(events.map((e) => e.key)).toEqual(["closure-t1-n1", "closure-t1-n4"]);
  });
});
