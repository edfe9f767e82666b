import { describe, expect, it } from "vitest";
import { parkLocalInstant, parkLocalDate, parkLocalTime } from "@/lib/shared/park-clock";
import { parkToday } from "@/lib/conditions/park-today";

// UTC offsets from the IANA time zone database (tzdata): America/Los_Angeles is UTC−8 (PST)
// in winter and UTC−7 (PDT) in summer; in 2026 PDT starts on 8 March at 02:00 local time.
// Pacific/Kiritimati is UTC+14; Asia/Kolkata UTC+5:30.
describe("park-local clock", () => {
  it("finds the instant of a park-local wall-clock time", () => {
    expect(parkLocalInstant("2026-12-02", "06:42", "America/Los_Angeles").toISOString()).toBe("2026-12-02T14:42:00.000Z");
    expect(parkLocalInstant("2026-07-01", "06:42", "America/Los_Angeles").toISOString()).toBe("2026-07-01T13:42:00.000Z");
    expect(parkLocalInstant("2026-12-02", "00:30", "Asia/Kolkata").toISOString()).toBe("2026-12-01T19:00:00.000Z");
  });

  it("23:30 and 00:30 park time are different park dates, even when they share a UTC date", () => {
    const late = parkLocalInstant("2026-12-01", "23:30", "Pacific/Kiritimati");
    const early = parkLocalInstant("2026-12-02", "00:30", "Pacific/Kiritimati");
    expect(late.toISOString().slice(0, 10)).toBe(early.toISOString().slice(0, 10)); // both 2026-12-01 in UTC
    expect(parkToday({ timeZone: "Pacific/Kiritimati" }, late)).toBe("2026-12-01");
    expect(parkToday({ timeZone: "Pacific/Kiritimati" }, early)).toBe("2026-12-02");
  });

  it("round-trips with parkLocalDate and parkLocalTime across the spring DST change", () => {
    for (const [date, time] of [
      ["2026-03-07", "23:30"],
      ["2026-03-08", "01:30"],
      ["2026-03-08", "03:30"],
      ["2026-11-01", "06:42"],
    ]) {
      const instant = parkLocalInstant(date, time, "America/Los_Angeles");
      expect(parkLocalDate(instant, "America/Los_Angeles")).toBe(date);
      expect(parkLocalTime(instant, "America/Los_Angeles")).toBe(time);
    }
  });

  it("a time skipped by the spring change lands after the gap", () => {
    // 02:30 on 8 March 2026 does not exist in Los Angeles (clocks jump from 02:00 to 03:00).
    const instant = parkLocalInstant("2026-03-08", "02:30", "America/Los_Angeles");
    expect(parkLocalTime(instant, "America/Los_Angeles")).toBe("03:30");
  });
});
