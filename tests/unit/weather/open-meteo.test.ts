import { describe, expect, it } from "vitest";
import { forecastQuery, openMeteoForecastSchema, readingOf } from "@/lib/weather/pure/open-meteo";
import { forecastAnswer } from "@/scripts/fakes/weather-server";

/** The answer shape of the Open-Meteo forecast API (open-meteo.com/en/docs, JSON with timeformat=unixtime), as the fake serves it. */
const NOW = new Date("2026-12-02T15:45:00Z");
const answer = () => forecastAnswer(forecastQuery({ latitude: 47.3, longitude: -121.94 }, "America/Los_Angeles"), NOW);

describe("Open-Meteo answer schema", () => {
  it("asks for two past days and today, hourly temperature and rain, sunrise, in the park's zone, in UNIX time", () => {
    const q = forecastQuery({ latitude: 47.3, longitude: -121.94 }, "America/Los_Angeles");
    expect(Object.fromEntries(q)).toMatchObject({ hourly: "temperature_2m,precipitation", daily: "sunrise", past_days: "2", forecast_days: "1", timezone: "America/Los_Angeles", timeformat: "unixtime", current: "temperature_2m" });
  });

  it("accepts a good answer and reads it as hours named by their end", () => {
    const parsed = openMeteoForecastSchema.parse(answer());
    const reading = readingOf(parsed);
    expect(reading.hours).toHaveLength(72);
    expect(reading.temperatureNowC).toBe(3);
    // 2 Dec 2026 04:00 PST = 12:00 UTC: the storm's last wet hour, 0.4 mm.
    expect(reading.hours.find((h) => h.at.toISOString() === "2026-12-02T12:00:00.000Z")?.precipitationMm).toBe(0.4);
    expect(reading.sunrise?.toISOString()).toBe("2026-12-02T15:30:00.000Z");
  });

  it("refuses values out of bounds: −999 °C, 600 mm in an hour, negative rain", () => {
    const cold = answer();
    cold.hourly.temperature_2m[3] = -999;
    expect(openMeteoForecastSchema.safeParse(cold).success).toBe(false);
    const flood = answer();
    flood.hourly.precipitation[3] = 600;
    expect(openMeteoForecastSchema.safeParse(flood).success).toBe(false);
    const negative = answer();
    negative.hourly.precipitation[3] = -0.1;
    expect(openMeteoForecastSchema.safeParse(negative).success).toBe(false);
    const hot = answer();
    hot.current.temperature_2m = 61;
    expect(openMeteoForecastSchema.safeParse(hot).success).toBe(false);
  });

  it("refuses partial answers: a missing array, arrays of different lengths, another unit", () => {
    const { hourly, ...rest } = answer();
    expect(openMeteoForecastSchema.safeParse({ ...rest, hourly: { time: hourly.time, temperature_2m: hourly.temperature_2m } }).success).toBe(false);
    expect(openMeteoForecastSchema.safeParse({ ...rest, hourly: { ...hourly, precipitation: hourly.precipitation.slice(0, 10) } }).success).toBe(false);
    expect(openMeteoForecastSchema.safeParse({ ...rest, hourly, hourly_units: { temperature_2m: "°F", precipitation: "mm" } }).success).toBe(false);
  });

  it("keeps a null hour as unknown", () => {
    const gap = answer();
    (gap.hourly.precipitation as (number | null)[])[5] = null;
    expect(readingOf(openMeteoForecastSchema.parse(gap)).hours[5].precipitationMm).toBeNull();
  });
});
