/** A park at the fake's storm coordinate, and a fake weather service of the test's own (its own faults, its own clock). */
import { randomUUID } from "node:crypto";
import pino from "pino";
import { openMeteoDriver } from "@/lib/weather/open-meteo-driver";
import { Park } from "@/models";
import { startFakeWeather, type FaultMode } from "@/scripts/fakes/weather-server";

/** 07:45 park time on Wed 2 Dec 2026 (PST, UTC−8): after the storm (last rain in the hour to 04:00) and the fake's sunrise (07:30). */
export const NOW = new Date("2026-12-02T07:45:00-08:00");

export async function stormPark() {
  const slug = `storm-${randomUUID().slice(0, 8)}`;
  return Park.create({ slug, name: `Storm Park ${slug}`, timeZone: "America/Los_Angeles", centerLon: -121.94, centerLat: 47.3, baseElevationM: 880, summitElevationM: 960 });
}

export async function ownFake(now = NOW) {
  const fake = await startFakeWeather({ port: 0, now: () => now });
  const control = {
    fault: async (mode: FaultMode, extra: { times?: number; delayMs?: number } = {}) => {
      const response = await fetch(`${fake.origin}/control/fault`, { method: "POST", body: JSON.stringify({ mode, ...extra }) });
      if (!response.ok) throw new Error(`fault ${mode}: ${response.status}`);
    },
    requests: async () => ((await (await fetch(`${fake.origin}/control/requests`)).json()) as { requests: number }).requests,
  };
  const lines: string[] = [];
  const log = pino({ level: "warn" }, { write: (line: string) => void lines.push(line) });
  const service = openMeteoDriver({ baseUrl: fake.origin, timeoutMs: 300, attempts: 3, backoffMs: 10, log });
  return { fake, control, service, log, lines };
}
