import { describe, expect, it } from "vitest";
import { instantToParkLocal, parkLocalInstant, parkLocalTime, parkLocalToInstant } from "@/lib/shared/park-clock";

/*
 * Wall-clock times at the 2026 daylight-saving changes, resolved with "compatible" semantics
 * (a time in a spring-forward gap moves later by the gap; a repeated autumn time takes the earlier
 * instant). Expected instants are computed by hand from the rules of the IANA time zone database
 * (tzdata 2025 files `northamerica`, `europe`, `australasia`, `asia`):
 * - America/Los_Angeles: Rule US 2007 max, Mar Sun>=8 2:00 → PDT (UTC−7); Nov Sun>=1 2:00 → PST (UTC−8).
 *   2026: the gap is 02:00–03:00 on 8 March; 01:00–02:00 repeats on 1 November.
 * - Europe/Zurich: Rule EU 1981 max, Mar lastSun 1:00u → CEST (UTC+2); Oct lastSun 1:00u → CET (UTC+1).
 *   2026: the gap is 02:00–03:00 on 29 March; 02:00–03:00 repeats on 25 October.
 * - Pacific/Auckland: Rule NZ 2007 max, Sep lastSun 2:00s → NZDT (UTC+13); Apr Sun>=1 2:00s → NZST (UTC+12).
 *   2026: 02:00–03:00 repeats on 5 April (03:00 NZDT = 02:00 NZST); the gap is 02:00–03:00 on 27 September.
 * - Asia/Kolkata: UTC+5:30 all year (no daylight saving since 1945).
 */
const at = (date: string, time: string, zone: string) => parkLocalInstant(date, time, zone).toISOString();

describe("park clock at daylight-saving changes (IANA tz rules)", () => {
  it("America/Los_Angeles: 02:30 in the spring gap moves to 03:30 PDT", () => {
    expect(at("2026-03-08", "02:30", "America/Los_Angeles")).toBe("2026-03-08T10:30:00.000Z");
    expect(parkLocalTime(parkLocalInstant("2026-03-08", "02:30", "America/Los_Angeles"), "America/Los_Angeles")).toBe("03:30");
    expect(at("2026-03-08", "01:59", "America/Los_Angeles")).toBe("2026-03-08T09:59:00.000Z"); // still PST
    expect(at("2026-03-08", "03:00", "America/Los_Angeles")).toBe("2026-03-08T10:00:00.000Z"); // PDT
  });

  it("America/Los_Angeles: 01:30 on the autumn night takes the earlier instant (PDT)", () => {
    expect(at("2026-11-01", "01:30", "America/Los_Angeles")).toBe("2026-11-01T08:30:00.000Z");
    expect(at("2026-11-01", "02:30", "America/Los_Angeles")).toBe("2026-11-01T10:30:00.000Z"); // PST, once
  });

  it("Europe/Zurich: 02:30 in the spring gap moves to 03:30 CEST; the repeated 02:30 in autumn is the earlier (CEST)", () => {
    expect(at("2026-03-29", "02:30", "Europe/Zurich")).toBe("2026-03-29T01:30:00.000Z");
    expect(at("2026-10-25", "02:30", "Europe/Zurich")).toBe("2026-10-25T00:30:00.000Z");
    expect(at("2026-10-25", "03:30", "Europe/Zurich")).toBe("2026-10-25T02:30:00.000Z"); // CET
  });

  it("Pacific/Auckland: the repeated 02:30 on 5 April is the earlier (NZDT); 02:30 in the September gap moves to 03:30 NZDT", () => {
    expect(at("2026-04-05", "02:30", "Pacific/Auckland")).toBe("2026-04-04T13:30:00.000Z");
    expect(at("2026-09-27", "02:30", "Pacific/Auckland")).toBe("2026-09-26T14:30:00.000Z");
  });

  it("Asia/Kolkata has no transition: the same offset on every one of those dates", () => {
    // 02:30 IST is 21:00 UTC the day before, whatever the date.
    expect(at("2026-03-08", "02:30", "Asia/Kolkata")).toBe("2026-03-07T21:00:00.000Z");
    expect(at("2026-03-29", "02:30", "Asia/Kolkata")).toBe("2026-03-28T21:00:00.000Z");
    expect(at("2026-04-05", "02:30", "Asia/Kolkata")).toBe("2026-04-04T21:00:00.000Z");
    expect(at("2026-10-25", "02:30", "Asia/Kolkata")).toBe("2026-10-24T21:00:00.000Z");
    expect(at("2026-11-01", "02:30", "Asia/Kolkata")).toBe("2026-10-31T21:00:00.000Z");
  });

  it("reading an instant back gives the wall clock on either side of a change (both 01:30s of 1 November in Los Angeles)", () => {
    expect(parkLocalTime(new Date("2026-11-01T08:30:00Z"), "America/Los_Angeles")).toBe("01:30"); // PDT
    expect(parkLocalTime(new Date("2026-11-01T09:30:00Z"), "America/Los_Angeles")).toBe("01:30"); // PST
    expect(instantToParkLocal(new Date("2026-03-08T10:30:00Z"), "America/Los_Angeles")).toBe("2026-03-08T03:30");
    expect(instantToParkLocal(new Date("2026-04-04T13:30:00Z"), "Pacific/Auckland")).toBe("2026-04-05T02:30");
  });

  it("a datetime-local field is read the same way", () => {
    expect(parkLocalToInstant("2026-03-08T02:30", "America/Los_Angeles")!.toISOString()).toBe("2026-03-08T10:30:00.000Z");
    expect(parkLocalToInstant("2026-10-25T02:30", "Europe/Zurich")!.toISOString()).toBe("2026-10-25T00:30:00.000Z");
    expect(parkLocalToInstant("2026-04-05T02:30", "Pacific/Auckland")!.toISOString()).toBe("2026-04-04T13:30:00.000Z");
  });
});
