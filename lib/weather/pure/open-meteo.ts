/**
 * The Open-Meteo forecast API (`/v1/forecast`) as we ask for it, and the zod schema its JSON
 * answer must pass before anything is stored. Times are UNIX seconds (`timeformat=unixtime`);
 * values outside physical bounds (a −999 sentinel, a mistyped unit) refuse the whole answer.
 */
import { z } from "zod";
import type { WeatherLocation, WeatherReading } from "./types";

/** Bounds: the coldest and hottest air any bike park rides in, with margin; the wettest hour on record is ~305 mm. */
export const TEMPERATURE_BOUNDS_C = { min: -60, max: 60 } as const;
export const PRECIPITATION_BOUNDS_MM = { min: 0, max: 500 } as const;

const temperature = z.number().min(TEMPERATURE_BOUNDS_C.min).max(TEMPERATURE_BOUNDS_C.max);
const precipitation = z.number().min(PRECIPITATION_BOUNDS_MM.min).max(PRECIPITATION_BOUNDS_MM.max);
const unixSeconds = z.number().int().min(946_684_800).max(4_102_444_800); // 2000 … 2100

export const openMeteoForecastSchema = z
  .object({
    latitude: z.number().min(-90).max(90),
    longitude: z.number().min(-180).max(180),
    current: z.object({ time: unixSeconds, temperature_2m: temperature }),
    hourly_units: z.object({ temperature_2m: z.literal("°C"), precipitation: z.literal("mm") }),
    hourly: z.object({
      time: z.array(unixSeconds).min(24).max(24 * 4),
      temperature_2m: z.array(temperature.nullable()),
      precipitation: z.array(precipitation.nullable()),
    }),
    daily: z.object({ time: z.array(unixSeconds).min(1), sunrise: z.array(unixSeconds.nullable()).min(1) }),
  })
  .refine((r) => r.hourly.temperature_2m.length === r.hourly.time.length && r.hourly.precipitation.length === r.hourly.time.length, {
    message: "hourly arrays differ in length",
    path: ["hourly"],
  });
export type OpenMeteoForecast = z.infer<typeof openMeteoForecastSchema>;

/** The query: 2 past days and today, hourly temperature and rain, today's sunrise, in the park's zone. */
export function forecastQuery(location: WeatherLocation, timeZone: string): URLSearchParams {
  return new URLSearchParams({
    latitude: location.latitude.toFixed(4),
    longitude: location.longitude.toFixed(4),
    current: "temperature_2m",
    hourly: "temperature_2m,precipitation",
    daily: "sunrise",
    past_days: "2",
    forecast_days: "1",
    timezone: timeZone,
    timeformat: "unixtime",
  });
}

/** A validated answer as our reading: the last day's sunrise is today's (forecast_days=1). */
export function readingOf(answer: OpenMeteoForecast): WeatherReading {
  const at = (s: number) => new Date(s * 1000);
  const sunrise = answer.daily.sunrise.at(-1);
  return {
    measuredAt: at(answer.current.time),
    temperatureNowC: answer.current.temperature_2m,
    hours: answer.hourly.time.map((t, i) => ({ at: at(t), temperatureC: answer.hourly.temperature_2m[i], precipitationMm: answer.hourly.precipitation[i] })),
    sunrise: sunrise == null ? null : at(sunrise),
  };
}
