import http from "node:http";
import { parkLocalDate, parkLocalInstant, shiftDate } from "@/lib/shared/park-clock";
import { fixtureFor } from "./weather-fixtures";

/**
 * A local stand-in for the Open-Meteo forecast API, for development and tests: GET /v1/forecast
 * answers the JSON shape of the real one (timeformat=unixtime) from a scenario chosen by the
 * coordinate (weather-fixtures.ts), for the hours of the days asked for in the zone asked for.
 * Control API on the same port:
 *   GET /control/health · GET /control/requests (how many forecasts were asked for)
 *   POST /control/fault {"mode": FaultMode, "times"?: n, "delayMs"?: n}  (n requests, or all until "none")
 */
export const FAULT_MODES = ["none", "malformed", "partial", "out-of-bounds", "error500", "slow", "timeout"] as const;
export type FaultMode = (typeof FAULT_MODES)[number];

type Fault = { mode: FaultMode; remaining: number | null; delayMs: number };

export function forecastAnswer(query: URLSearchParams, now = new Date()) {
  const latitude = Number(query.get("latitude"));
  const longitude = Number(query.get("longitude"));
  const timeZone = query.get("timezone") ?? "UTC";
  const pastDays = Number(query.get("past_days") ?? 0);
  const days = pastDays + Number(query.get("forecast_days") ?? 7);
  const fixture = fixtureFor(latitude, longitude);
  const today = parkLocalDate(now, timeZone);
  const time: number[] = [];
  const temperature: number[] = [];
  const precipitation: number[] = [];
  const dayStarts: number[] = [];
  const sunrises: number[] = [];
  for (let d = -pastDays; d < days - pastDays; d++) {
    const date = shiftDate(today, d);
    dayStarts.push(parkLocalInstant(date, "00:00", timeZone).getTime() / 1000);
    sunrises.push(parkLocalInstant(date, "07:30", timeZone).getTime() / 1000);
    for (let hour = 0; hour < 24; hour++) {
      time.push(parkLocalInstant(date, `${String(hour).padStart(2, "0")}:00`, timeZone).getTime() / 1000);
      temperature.push(fixture.temperatureC(d, hour));
      precipitation.push(fixture.precipitationMm(d, hour));
    }
  }
  const current = Math.floor(now.getTime() / 900_000) * 900;
  return {
    latitude,
    longitude,
    generationtime_ms: 0.1,
    utc_offset_seconds: 0,
    timezone: timeZone,
    elevation: 0,
    current_units: { time: "unixtime", interval: "seconds", temperature_2m: "°C" },
    current: { time: current, interval: 900, temperature_2m: fixture.nowC },
    hourly_units: { time: "unixtime", temperature_2m: "°C", precipitation: "mm" },
    hourly: { time, temperature_2m: temperature, precipitation },
    daily_units: { time: "unixtime", sunrise: "unixtime" },
    daily: { time: dayStarts, sunrise: sunrises },
  };
}

/** `now` fixes the fake's clock (tests that work values by hand); by default it is the real one. */
export async function startFakeWeather({ port, host = "127.0.0.1", now = () => new Date() }: { port: number; host?: string; now?: () => Date }) {
  let fault: Fault = { mode: "none", remaining: null, delayMs: 0 };
  let requests = 0;
  const open = new Set<http.ServerResponse>();

  const takeFault = (): Fault => {
    const now = fault;
    if (now.remaining !== null && --now.remaining <= 0) fault = { mode: "none", remaining: null, delayMs: 0 };
    return now;
  };

  const server = http.createServer((req, res) => {
    const url = new URL(req.url ?? "/", `http://${host}`);
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(typeof body === "string" ? body : JSON.stringify(body));
    };
    if (req.method === "GET" && url.pathname === "/control/health") return send(200, { ok: true });
    if (req.method === "GET" && url.pathname === "/control/requests") return send(200, { requests, fault: fault.mode });
    if (req.method === "POST" && url.pathname === "/control/fault") {
      let raw = "";
      req.on("data", (chunk) => (raw += chunk));
      req.on("end", () => {
        try {
          const body = JSON.parse(raw) as { mode?: FaultMode; times?: number; delayMs?: number };
          if (!body.mode || !FAULT_MODES.includes(body.mode)) return send(422, { error: `mode must be one of ${FAULT_MODES.join(", ")}` });
          fault = { mode: body.mode, remaining: body.times ?? null, delayMs: body.delayMs ?? 1500 };
          requests = 0;
          send(200, { mode: fault.mode });
        } catch {
          send(400, { error: "send JSON" });
        }
      });
      return;
    }
    if (req.method !== "GET" || url.pathname !== "/v1/forecast") return send(404, { error: true, reason: "not found" });
    requests++;
    const { mode, delayMs } = takeFault();
    const answer = forecastAnswer(url.searchParams, now());
    switch (mode) {
      case "malformed":
        return send(200, '{"latitude": 47.3, "hourly": {"time": [1, 2,');
      case "partial": {
        const { hourly, ...rest } = answer;
        return send(200, { ...rest, hourly: { time: hourly.time, temperature_2m: hourly.temperature_2m.slice(0, 10) } });
      }
      case "out-of-bounds":
        return send(200, { ...answer, current: { ...answer.current, temperature_2m: -999 } });
      case "error500":
        return send(500, { error: true, reason: "fake: internal error" });
      case "slow":
        return void setTimeout(() => send(200, answer), delayMs);
      case "timeout":
        open.add(res);
        res.on("close", () => open.delete(res));
        return; // never answers; the client's timeout ends it
      default:
        return send(200, answer);
    }
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.address() as { port: number };
  return {
    origin: `http://${host}:${address.port}`,
    close: () =>
      new Promise<void>((resolve) => {
        for (const res of open) res.destroy();
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
