import "server-only";
import type { Logger } from "pino";
import { Op } from "sequelize";
import { logger } from "@/lib/server/logger";
import { Park, ParkWeather } from "@/models";
import type { WeatherService } from "./open-meteo-driver";
import { recordFailure, storeReading } from "./store";

/** Each park is fetched every 30 minutes (Open-Meteo's models update hourly at most). */
export const WEATHER_EVERY_MS = 30 * 60_000;

export type RefreshResult = { due: number; stored: number; failed: number };

/**
 * Fetches every park whose last attempt is older than WEATHER_EVERY_MS (or that was never
 * fetched), one after the other, and stores each good reading. A failure is recorded for that
 * park and the next park goes on: nothing a weather service answers stops the worker.
 */
/** `only` limits the pass to some parks (tests). */
export async function refreshDueParks(service: WeatherService, { now = new Date(), log = logger, only }: { now?: Date; log?: Logger; only?: string[] } = {}): Promise<RefreshResult> {
  const recent = await ParkWeather.findAll({ where: { lastAttemptAt: { [Op.gt]: new Date(now.getTime() - WEATHER_EVERY_MS) } }, attributes: ["parkId"] });
  const skip = recent.map((r) => r.parkId);
  const ids = { ...(skip.length ? { [Op.notIn]: skip } : {}), ...(only ? { [Op.in]: only } : {}) };
  const parks = await Park.findAll({ where: Reflect.ownKeys(ids).length ? { id: ids } : {}, attributes: ["id", "slug", "centerLat", "centerLon", "timeZone"] });
  const result: RefreshResult = { due: parks.length, stored: 0, failed: 0 };
  for (const park of parks) {
    try {
      const reading = await service.recentAndForecast({ latitude: park.centerLat, longitude: park.centerLon }, park.timeZone);
      await storeReading(park.id, reading, now);
      result.stored++;
    } catch (error) {
      result.failed++;
      const reason = (error as Error)?.message ?? String(error);
      log.warn({ park: park.slug, reason }, `weather for ${park.slug} not updated: ${reason}`);
      await recordFailure(park.id, reason, now).catch((e) => log.error({ err: e }, "could not record the weather failure"));
    }
  }
  return result;
}

/** The worker's weather loop: a pass every `checkMs`, until the signal aborts. */
export async function runWeatherLoop(service: WeatherService, { checkMs, signal, log = logger }: { checkMs: number; signal: AbortSignal; log?: Logger }) {
  while (!signal.aborted) {
    try {
      const result = await refreshDueParks(service, { log });
      if (result.due > 0) log.info({ ...result }, `weather: ${result.stored} parks updated, ${result.failed} failed`);
    } catch (error) {
      log.error({ err: error }, "weather pass failed; trying again later");
    }
    await new Promise<void>((resolve) => {
      const timer = setTimeout(resolve, checkMs);
      signal.addEventListener("abort", () => (clearTimeout(timer), resolve()), { once: true });
    });
  }
}
