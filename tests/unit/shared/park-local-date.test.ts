import { describe, expect, it } from "vitest";
import { isValidTimeZone, parkLocalDate, parkLocalTime, shiftDate } from "@/lib/shared/park-clock";

// Offsets from the IANA time zone database (tzdata): America/Los_Angeles is UTC−8 in
// winter (PST) and UTC−7 in summer (PDT); Europe/Zurich is UTC+1 in winter.
describe("park-local dates", () => {
  it("23:30 and 00:30 park time land on different dates", () => {
    // 2026-12-01 23:30 PST = 2026-12-02 07:30 UTC; 00:30 PST next day = 08:30 UTC.
    expect(parkLocalDate(new Date("2026-12-02T07:30:00Z"), "America/Los_Angeles")).toBe("2026-12-01");
    expect(parkLocalDate(new Date("2026-12-02T08:30:00Z"), "America/Los_Angeles")).toBe("2026-12-02");
  });

  it("follows daylight saving time", () => {
    // 2026-07-01 06:30 UTC = 23:30 PDT on 2026-06-30.
    expect(parkLocalDate(new Date("2026-07-01T06:30:00Z"), "America/Los_Angeles")).toBe("2026-06-30");
    expect(parkLocalTime(new Date("2026-07-01T13:42:00Z"), "America/Los_Angeles")).toBe("06:42");
  });

  it("east of Greenwich the date turns earlier in UTC", () => {
    expect(parkLocalDate(new Date("2026-12-01T23:30:00Z"), "Europe/Zurich")).toBe("2026-12-02");
  });

  it("shifts calendar dates across month and year ends", () => {
    expect(shiftDate("2026-03-01", -1)).toBe("2026-02-28");
    expect(shiftDate("2026-12-31", 1)).toBe("2027-01-01");
  });

  it("recognises IANA zones", () => {
    expect(isValidTimeZone("America/Denver")).toBe(true);
    expect(isValidTimeZone("Mars/Olympus")).toBe(false);
  });
});
