// The worker's weather pass against the fake service in each of its fault modes: nothing breaks,
// nothing bad is stored, the last good values stay (with their age), and retries back off.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parkWeather, rideTemperatures } from "@/lib/weather/park-weather";
import { refreshDueParks, runWeatherLoop, WEATHER_EVERY_MS } from "@/lib/weather/refresh";
import { randomUUID } from "node:crypto";
import { Park, ParkWeather, WeatherHour, sequelize } from "@/models";
import { createPark } from "../helpers";
import { NOW, ownFake, stormPark } from "./fixtures";

let env: Awaited<ReturnType<typeof ownFake>>;
beforeAll(async () => {
  env = await ownFake();
});
afterAll(async () => {
  await env.fake.close();
  await sequelize.close();
});

const later = (minutes: number) => new Date(NOW.getTime() + minutes * 60_000);
const pass = (parkId: string, now = NOW) => refreshDueParks(env.service, { now, log: env.log, only: [parkId] });

describe("weather pass", () => {
  it("stores a good answer: the storm's 14 mm since yesterday 18:00, 3 °C now", async () => {
    await env.control.fault("none");
    const park = await stormPark();
    expect(await pass(park.id)).toEqual({ due: 1, stored: 1, failed: 0 });
    const view = await parkWeather(park, NOW);
    // Fixture (scripts/fakes/weather-fixtures.ts): 9.5 mm in the hours ending 19:00–23:00 yesterday + 4.5 mm ending 00:00–04:00 today.
    expect(view).toMatchObject({ rainSinceEveningMm: 14, rain24hMm: 14, nowC: 3, today: { minC: 3, maxC: 8 }, overnight: { minC: 3, frost: false }, stale: false });
    expect(view?.lastRainAt).toBe(new Date("2026-12-02T04:00:00-08:00").toISOString());
    // 14 mm reaches the default caution level of 10 mm.
    expect(view?.caution).toMatch(/reaches the park's caution level of 10 mm/);
    expect(await WeatherHour.count({ where: { parkId: park.id } })).toBe(72);
    // Not due again within 30 minutes.
    expect(await pass(park.id, later(10))).toEqual({ due: 0, stored: 0, failed: 0 });
  });

  it("reads the freeze-thaw and dry-week fixtures: a frost, no caution", async () => {
    const cold = await Park.create({ slug: `cold-${randomUUID().slice(0, 8)}`, name: "Cold Park", timeZone: "America/Denver", centerLon: -105.61, centerLat: 39.02, baseElevationM: 2800, summitElevationM: 3200 });
    const dry = await createPark();
    await env.control.fault("none");
    await refreshDueParks(env.service, { now: NOW, log: env.log, only: [cold.id, dry.id] });
    // 07:45 PST is 08:45 MST. Freeze-thaw: −6 °C at 03:00–05:00, 5 °C at 13:00–14:00; now −4 °C; dry.
    expect(await parkWeather(cold, NOW)).toMatchObject({ nowC: -4, overnight: { minC: -6, frost: true }, today: { minC: -6, maxC: 5 }, rain24hMm: 0, caution: null });
    // 10:00–14:00: (2 + 3.5 + 4.5 + 5 + 5) / 5 = 4 °C.
    expect(await rideTemperatures(cold, undefined, NOW)).toMatchObject({ trailC: 4, pumpC: -4 });
    // Dry week (Europe/Zurich, 16:45 there): 9 + 5·cos(2π(h − 15)/24): 4 °C at 03:00, 14 °C at 15:00; no rain.
    expect(await parkWeather(dry, NOW)).toMatchObject({ nowC: 9, today: { minC: 4, maxC: 14 }, rain24hMm: 0, rainSinceEveningMm: 0, lastRainAt: null, caution: null });
  });

  for (const mode of ["malformed", "partial", "out-of-bounds"] as const) {
    it(`refuses a ${mode} answer: logged, not stored, not retried`, async () => {
      const park = await stormPark();
      await env.control.fault(mode);
      const before = env.lines.length;
      expect(await pass(park.id)).toEqual({ due: 1, stored: 0, failed: 1 });
      expect(await env.control.requests()).toBe(1);
      expect(await WeatherHour.count({ where: { parkId: park.id } })).toBe(0);
      expect(await parkWeather(park, NOW)).toBeNull();
      expect(await rideTemperatures(park, undefined, NOW)).toBeNull();
      const row = await ParkWeather.findByPk(park.id);
      expect(row?.fetchedAt).toBeNull();
      expect(row?.lastError).toMatch(mode === "malformed" ? /weather service|JSON/ : /validation/);
      expect(env.lines.slice(before).join("")).toMatch(/weather answer refused/);
    });
  }

  it("keeps the last good values when a later answer is refused, and shows their age when stale", async () => {
    const park = await stormPark();
    await env.control.fault("none");
    await pass(park.id);
    await env.control.fault("out-of-bounds");
    expect(await pass(park.id, later(40))).toMatchObject({ failed: 1 });
    const view = await parkWeather(park, later(40));
    expect(view).toMatchObject({ nowC: 3, stale: false, rainSinceEveningMm: 14 });
    // Two hours after the good fetch (no −999 °C anywhere):
    const stale = await parkWeather(park, later(120));
    expect(stale).toMatchObject({ stale: true, age: "2 h", nowC: 3 });
    expect((await ParkWeather.findByPk(park.id))?.lastError).toMatch(/validation/);
  });

  it("tries a 500 three times with backoff, then records the failure", async () => {
    const park = await stormPark();
    await env.control.fault("error500");
    expect(await pass(park.id)).toMatchObject({ failed: 1 });
    expect(await env.control.requests()).toBe(3);
    expect((await ParkWeather.findByPk(park.id))?.lastError).toBe("weather service answered 500");
  });

  it("recovers within one pass when only the first attempt gets a 500", async () => {
    const park = await stormPark();
    await env.control.fault("error500", { times: 1 });
    expect(await pass(park.id)).toMatchObject({ stored: 1, failed: 0 });
    expect(await env.control.requests()).toBe(2);
  });

  it("gives up on a service that never answers (timeout per attempt), and waits for a slow one within it", async () => {
    const park = await stormPark();
    await env.control.fault("timeout");
    expect(await pass(park.id)).toMatchObject({ failed: 1 });
    expect((await ParkWeather.findByPk(park.id))?.lastError).toBe("no answer within 300 ms");
    await env.control.fault("slow", { delayMs: 100 });
    expect(await pass(park.id, later(31))).toMatchObject({ stored: 1 });
    expect(await parkWeather(park, later(31))).toMatchObject({ nowC: 3 });
  });

  it("the worker's loop goes on through faults until it is stopped", async () => {
    await env.control.fault("error500");
    const stop = new AbortController();
    const loop = runWeatherLoop(env.service, { checkMs: 20, signal: stop.signal, log: env.log });
    await new Promise((resolve) => setTimeout(resolve, 300));
    stop.abort();
    await expect(loop).resolves.toBeUndefined();
    expect(WEATHER_EVERY_MS).toBe(30 * 60_000);
    await env.control.fault("none");
  });
});
