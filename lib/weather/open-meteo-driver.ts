import "server-only";
import type { Logger } from "pino";
import { logger } from "@/lib/server/logger";
import { forecastQuery, openMeteoForecastSchema, readingOf } from "./pure/open-meteo";
import type { WeatherLocation, WeatherReading } from "./pure/types";

/** The one interface pages and the worker know; Open-Meteo (or the local fake) behind it. */
export type WeatherService = { recentAndForecast(location: WeatherLocation, timeZone: string): Promise<WeatherReading> };

/** Why a fetch gave nothing: the service was away or slow, said no, or answered something we refuse. */
export class WeatherError extends Error {
  constructor(
    readonly kind: "unreachable" | "status" | "invalid",
    message: string,
  ) {
    super(message);
    this.name = "WeatherError";
  }
}

export type DriverOptions = {
  /** Scheme, host and port: https://api.open-meteo.com, or the fake's address. */
  baseUrl: string;
  timeoutMs?: number;
  attempts?: number;
  /** First pause between attempts; doubled each time. */
  backoffMs?: number;
  log?: Logger;
};

const retryable = (status: number) => status === 429 || status >= 500;
const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Plain `fetch` against `/v1/forecast` (JSON), each attempt cut off by AbortSignal.timeout; a
 * network error, timeout, 429 or 5xx is tried again with exponential backoff. A 4xx or an answer
 * that fails the schema is not retried: it is logged with its first problems and refused.
 */
export function openMeteoDriver({ baseUrl, timeoutMs = 8000, attempts = 3, backoffMs = 500, log = logger }: DriverOptions): WeatherService {
  return {
    async recentAndForecast(location, timeZone) {
      const url = new URL("/v1/forecast", baseUrl);
      url.search = forecastQuery(location, timeZone).toString();
      let last: WeatherError = new WeatherError("unreachable", "no attempt made");
      for (let attempt = 1; attempt <= attempts; attempt++) {
        if (attempt > 1) await pause(backoffMs * 2 ** (attempt - 2));
        let response: Response;
        let body: unknown;
        try {
          response = await fetch(url, { signal: AbortSignal.timeout(timeoutMs), headers: { accept: "application/json" } });
          if (!response.ok) {
            await response.body?.cancel();
            last = new WeatherError("status", `weather service answered ${response.status}`);
            if (retryable(response.status)) continue;
            throw last;
          }
          body = await response.json();
        } catch (error) {
          if (error instanceof WeatherError) throw error;
          const timedOut = (error as Error)?.name === "TimeoutError";
          last = new WeatherError(timedOut ? "unreachable" : error instanceof SyntaxError ? "invalid" : "unreachable", timedOut ? `no answer within ${timeoutMs} ms` : `weather service: ${(error as Error)?.message ?? error}`);
          if (last.kind === "invalid") break;
          continue;
        }
        const parsed = openMeteoForecastSchema.safeParse(body);
        if (!parsed.success) {
          const problems = parsed.error.issues.slice(0, 3).map((i) => `${i.path.join(".")}: ${i.message}`);
          log.warn({ problems, latitude: location.latitude, longitude: location.longitude }, "weather answer refused: it failed validation");
          throw new WeatherError("invalid", `answer failed validation (${problems.join("; ")})`);
        }
        return readingOf(parsed.data);
      }
      if (last.kind === "invalid") log.warn({ err: last }, "weather answer refused: not JSON");
      throw last;
    },
  };
}
