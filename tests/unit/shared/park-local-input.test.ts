import { describe, expect, it } from "vitest";
import { instantToParkLocal, parkLocalToInstant } from "@/lib/shared/park-clock";

// Offsets from the IANA time zone database: America/Los_Angeles is UTC−8 in winter and UTC−7
// from the second Sunday of March to the first Sunday of November (US Energy Policy Act of 2005);
// Europe/Zurich is UTC+1, and UTC+2 from the last Sunday of March to the last Sunday of October.
describe("park wall-clock times from a datetime-local field", () => {
  it("reads the time at the park, in summer and in winter", () => {
    expect(parkLocalToInstant("2026-07-01T08:00", "America/Los_Angeles")!.toISOString()).toBe("2026-07-01T15:00:00.000Z");
    expect(parkLocalToInstant("2026-01-15T08:00", "America/Los_Angeles")!.toISOString()).toBe("2026-01-15T16:00:00.000Z");
    expect(parkLocalToInstant("2026-07-01T08:00", "Europe/Zurich")!.toISOString()).toBe("2026-07-01T06:00:00.000Z");
    expect(parkLocalToInstant("2026-12-01T08:00", "Europe/Zurich")!.toISOString()).toBe("2026-12-01T07:00:00.000Z");
  });

  it("is right on the days the clocks change (2026-03-08 and 2026-11-01 in Los Angeles)", () => {
    expect(parkLocalToInstant("2026-03-08T12:00", "America/Los_Angeles")!.toISOString()).toBe("2026-03-08T19:00:00.000Z");
    expect(parkLocalToInstant("2026-11-01T12:00", "America/Los_Angeles")!.toISOString()).toBe("2026-11-01T20:00:00.000Z");
  });

  it("round-trips to the same field value", () => {
    for (const local of ["2026-07-01T08:00", "2026-01-15T23:45", "2026-10-31T00:05"]) {
      expect(instantToParkLocal(parkLocalToInstant(local, "America/Denver")!, "America/Denver")).toBe(local);
    }
  });

  it("refuses text that is not a date and time", () => {
    expect(parkLocalToInstant("tomorrow", "Europe/Zurich")).toBeNull();
    expect(parkLocalToInstant("2026-02-30T10:00", "Europe/Zurich")).toBeNull();
  });
});
