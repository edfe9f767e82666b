import "server-only";
import { Op } from "sequelize";
import { ParkWeather, WeatherHour, sequelize } from "@/models";
import type { WeatherReading } from "./pure/types";

/** Hours older than this are dropped: the history page shows rain beside a year of reports. */
const KEEP_HOURS_MS = 400 * 24 * 3600_000;

/** A good reading, all or nothing: its hours (newer values replace a forecast) and the park's "now". */
export async function storeReading(parkId: string, reading: WeatherReading, now = new Date()) {
  await sequelize.transaction(async (transaction) => {
    await WeatherHour.bulkCreate(
      reading.hours.map((h) => ({ parkId, at: h.at, temperatureC: h.temperatureC, precipitationMm: h.precipitationMm })),
      { updateOnDuplicate: ["temperatureC", "precipitationMm"], transaction },
    );
    await WeatherHour.destroy({ where: { parkId, at: { [Op.lt]: new Date(now.getTime() - KEEP_HOURS_MS) } }, transaction });
    await ParkWeather.upsert(
      { parkId, measuredAt: reading.measuredAt, temperatureNowC: reading.temperatureNowC, sunrise: reading.sunrise, fetchedAt: now, lastAttemptAt: now, lastError: null },
      { transaction },
    );
  });
}

/** A failed fetch: the last good values stay; only the attempt and its reason are written. */
export async function recordFailure(parkId: string, reason: string, now = new Date()) {
  const [row, created] = await ParkWeather.findOrCreate({ where: { parkId }, defaults: { parkId, lastAttemptAt: now, lastError: reason.slice(0, 300) } });
  if (!created) await row.update({ lastAttemptAt: now, lastError: reason.slice(0, 300) });
}
