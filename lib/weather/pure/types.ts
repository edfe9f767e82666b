/**
 * Weather as Loamcast keeps it. An hour is named by its end: `precipitationMm` is the total that
 * fell in the hour up to `at` (Open-Meteo's "sum of the preceding hour"), `temperatureC` the air at
 * 2 m at `at`. Either may be null where the service had no value.
 */
export type WeatherHour = { at: Date; temperatureC: number | null; precipitationMm: number | null };

/** What `recentAndForecast` answers: the last 48 h, now, and today's hours, with today's sunrise. */
export type WeatherReading = {
  /** When the service measured "now" (its current-conditions time). */
  measuredAt: Date;
  temperatureNowC: number;
  hours: WeatherHour[];
  sunrise: Date | null;
};

export type WeatherLocation = { latitude: number; longitude: number };

/** The attribution the Open-Meteo licence (CC BY 4.0) asks for, shown wherever the data shows. */
export const WEATHER_ATTRIBUTION = { text: "Weather data by Open-Meteo.com (CC BY 4.0)", href: "https://open-meteo.com/" } as const;
