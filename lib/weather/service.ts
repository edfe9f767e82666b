import "server-only";
import { env } from "@/lib/server/env";
import { openMeteoDriver, type WeatherService } from "./open-meteo-driver";

/** The weather service WEATHER_URL names (Open-Meteo or the local fake); null when it is unset. */
export function weatherServiceFromEnv(): WeatherService | null {
  const { WEATHER_URL, WEATHER_TIMEOUT_MS } = env();
  return WEATHER_URL ? openMeteoDriver({ baseUrl: WEATHER_URL, timeoutMs: WEATHER_TIMEOUT_MS }) : null;
}
