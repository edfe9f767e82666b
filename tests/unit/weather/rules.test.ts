import { describe, expect, it } from "vitest";
import { ageText, dayRange, isStale, lastRainAt, meanForHours, overnightLow, rainBetween, rainByDay, rainCaution, yesterdayEvening } from "@/lib/weather/pure/rules";
import type { WeatherHour } from "@/lib/weather/pure/types";

/**
 * Worked examples by hand, in America/Los_Angeles on 1–2 December 2026 (PST, UTC−8, no
 * daylight-saving change: tz database). An hour is named by its end (Open-Meteo's hourly
 * precipitation is the sum of the preceding hour, per its forecast API documentation).
 */
const ZONE = "America/Los_Angeles";
const local = (date: string, hour: number) => new Date(`${date}T${String(hour).padStart(2, "0")}:00:00-08:00`);
const hour = (date: string, h: number, temperatureC: number | null, precipitationMm: number | null = 0): WeatherHour => ({ at: local(date, h), temperatureC, precipitationMm });

// Yesterday (1 Dec): rain in the hours ending 19:00–23:00, 1.0 + 2.0 + 2.5 + 2.5 + 1.5 = 9.5 mm.
// Today (2 Dec): rain in the hours ending 00:00–04:00, 1.5 + 1.0 + 1.0 + 0.6 + 0.4 = 4.5 mm.
const RAIN_1 = { 19: 1.0, 20: 2.0, 21: 2.5, 22: 2.5, 23: 1.5 } as Record<number, number>;
const RAIN_2 = { 0: 1.5, 1: 1.0, 2: 1.0, 3: 0.6, 4: 0.4 } as Record<number, number>;
const TEMP_2 = [4, 4, 3.5, 3, 3, 3, 3, 3.5, 4.5, 6, 8, 8, 8, 8, 8, 7.5, 7, 6, 5.5, 5, 5, 4.5, 4.5, 4];
const hours: WeatherHour[] = [
  ...Array.from({ length: 24 }, (_, h) => hour("2026-12-01", h, 6, RAIN_1[h] ?? 0)),
  ...Array.from({ length: 24 }, (_, h) => hour("2026-12-02", h, TEMP_2[h], RAIN_2[h] ?? 0)),
];
const NOW = new Date("2026-12-02T07:45:00-08:00");

describe("rain", () => {
  it("sums the hours that ended since yesterday 18:00 park time", () => {
    expect(yesterdayEvening(NOW, ZONE)).toEqual(local("2026-12-01", 18));
    // 9.5 + 4.5 = 14.0 mm, from 14 hours (19:00 … 07:00), none missing.
    expect(rainBetween(hours, yesterdayEvening(NOW, ZONE), NOW)).toEqual({ mm: 14, hours: 13, missing: 0 });
  });

  it("counts only hours that have ended: the forecast for later today is not rain that fell", () => {
    const wetLater = [...hours.filter((h) => h.at < local("2026-12-02", 12)), hour("2026-12-02", 12, 8, 5)];
    expect(rainBetween(wetLater, local("2026-12-02", 5), NOW).mm).toBe(0);
  });

  it("the last 24 h from 07:45 start after 07:45 yesterday: the same 14.0 mm", () => {
    expect(rainBetween(hours, new Date(NOW.getTime() - 24 * 3600_000), NOW).mm).toBe(14);
  });

  it("the last rain ended at 04:00; none gives null", () => {
    expect(lastRainAt(hours, NOW)).toEqual(local("2026-12-02", 4));
    expect(lastRainAt(hours.map((h) => ({ ...h, precipitationMm: 0 })), NOW)).toBeNull();
  });

  it("counts missing hours without inventing rain", () => {
    const gaps = hours.map((h) => (h.at.getTime() === local("2026-12-01", 20).getTime() ? { ...h, precipitationMm: null } : h));
    // 14.0 − 2.0 (the hour ending 20:00 is unknown) = 12.0 mm.
    expect(rainBetween(gaps, yesterdayEvening(NOW, ZONE), NOW)).toEqual({ mm: 12, hours: 13, missing: 1 });
  });

  it("gives each day its rain; the hour ending at midnight belongs to the day before", () => {
    const days = rainByDay(hours, NOW, ZONE);
    // 1 Dec: 9.5 mm + the hour ending 00:00 on 2 Dec (1.5 mm) = 11.0 mm over its 24 hours.
    expect(days.get("2026-12-01")).toEqual({ mm: 11, partial: false });
    // 2 Dec so far (hours ending 01:00–07:00): 1.0 + 1.0 + 0.6 + 0.4 = 3.0 mm.
    expect(days.get("2026-12-02")).toEqual({ mm: 3, partial: true });
    // 30 November has one stored hour (ending 00:00 on 1 Dec): too few to call it dry.
    expect(days.has("2026-11-30")).toBe(false);
  });

  it("cautions when the park's level is reached, and never below it", () => {
    expect(rainCaution(14, 10)).toMatch(/14 mm in the last 24 h reaches the park's caution level of 10 mm/);
    expect(rainCaution(10, 10)).not.toBeNull();
    expect(rainCaution(9.9, 10)).toBeNull();
    // USDA Forest Service wet-weather guidance for motorised trails (2 in = 50.8 mm in 24 h), as an example of a park's own level.
    expect(rainCaution(14, 50.8)).toBeNull();
  });
});

describe("temperatures", () => {
  it("today's range over every hour of the park-local day", () => {
    expect(dayRange(hours, "2026-12-02", ZONE)).toEqual({ minC: 3, maxC: 8 });
    expect(dayRange(hours, "2026-12-03", ZONE)).toBeNull();
  });

  it("the forecast mean for 10:00–14:00 takes the five hourly values 10, 11, 12, 13 and 14", () => {
    // (8 + 8 + 8 + 8 + 8) / 5 = 8.
    expect(meanForHours(hours, "2026-12-02", { from: 10, to: 14 }, ZONE)).toBe(8);
    // 14:00–16:00: (8 + 7.5 + 7) / 3 = 7.5.
    expect(meanForHours(hours, "2026-12-02", { from: 14, to: 16 }, ZONE)).toBe(7.5);
    // 08:00–09:00: (4.5 + 6) / 2 = 5.25, shown to one decimal: 5.3.
    expect(meanForHours(hours, "2026-12-02", { from: 8, to: 9 }, ZONE)).toBe(5.3);
    expect(meanForHours(hours.map((h) => ({ ...h, temperatureC: null })), "2026-12-02", { from: 10, to: 14 }, ZONE)).toBeNull();
  });

  it("the night's low runs from yesterday 18:00 to sunrise, and frost means below 0 °C", () => {
    const sunrise = local("2026-12-02", 7);
    // 1 Dec 18:00–23:00 at 6 °C, 2 Dec 00:00–07:00: lowest 3 °C (03:00–06:00).
    expect(overnightLow(hours, sunrise, NOW, ZONE)).toEqual({ minC: 3, frost: false });
    const frosty = hours.map((h) => (h.at.getTime() === local("2026-12-02", 5).getTime() ? { ...h, temperatureC: -1.5 } : h));
    expect(overnightLow(frosty, sunrise, NOW, ZONE)).toEqual({ minC: -1.5, frost: true });
    // Exactly 0 °C is not below zero (air frost is below 0 °C).
    const zero = hours.map((h) => (h.at.getTime() === local("2026-12-02", 5).getTime() ? { ...h, temperatureC: 0 } : h));
    expect(overnightLow(zero, sunrise, NOW, ZONE)?.frost).toBe(false);
    // A frost after sunrise is not "overnight".
    const late = hours.map((h) => (h.at.getTime() === local("2026-12-02", 8).getTime() ? { ...h, temperatureC: -3 } : h));
    expect(overnightLow(late, sunrise, new Date("2026-12-02T09:00:00-08:00"), ZONE)?.minC).toBe(3);
  });
});

describe("age of stored values", () => {
  it("is stale after 90 minutes and says how old", () => {
    const fetched = new Date("2026-12-02T06:00:00Z");
    expect(isStale(fetched, new Date("2026-12-02T07:30:00Z"))).toBe(false);
    expect(isStale(fetched, new Date("2026-12-02T07:31:00Z"))).toBe(true);
    expect(ageText(fetched, new Date("2026-12-02T06:12:00Z"))).toBe("12 min");
    expect(ageText(fetched, new Date("2026-12-02T09:05:00Z"))).toBe("3 h 5 min");
    expect(ageText(fetched, new Date("2026-12-05T06:00:00Z"))).toBe("3 days");
  });
});
