/**
 * The worker: notices, and each park's weather every 30 minutes (lib/weather). `npm run worker` runs
 * until SIGINT/SIGTERM; `tsx scripts/worker.ts --once` sends everything due now, fetches the weather
 * that is due, then exits. Several may run at once; claims keep notices apart.
 */
import { drainDue, newWorkerId } from "@/lib/notices/delivery-worker";
import { createNoticeTransport } from "@/lib/notices/notice-transport";
import { report, runWorkerLoop } from "@/lib/notices/worker-loop";
import { workerSettings } from "@/lib/notices/worker-settings";
import { logger } from "@/lib/server/logger";
import { sequelize } from "@/models";
import { refreshDueParks, runWeatherLoop } from "@/lib/weather/refresh";
import { weatherServiceFromEnv } from "@/lib/weather/service";

async function main() {
  const settings = workerSettings();
  const { connections, ...rest } = settings;
  const transport = createNoticeTransport({ maxConnections: connections });
  const options = { workerId: newWorkerId(), transport, ...rest };
  const log = logger.child({ workerId: options.workerId });
  const stopping = new AbortController();
  const stop = (signal: string) => {
    if (stopping.signal.aborted) return;
    log.info({ signal }, `${signal}: finishing the batch in hand, then stopping`);
    stopping.abort();
  };
  process.on("SIGINT", () => stop("SIGINT"));
  process.on("SIGTERM", () => stop("SIGTERM"));

  const weather = weatherServiceFromEnv();
  if (!weather) log.info("WEATHER_URL is not set: no weather is fetched");
  try {
    if (process.argv.includes("--once")) {
      const result = await drainDue(options, () => stopping.signal.aborted);
      report(result, log);
      log.info({ ...result }, `done: ${result.sent} sent, ${result.retrying} to retry later, ${result.failed} failed`);
      if (weather) {
        const fetched = await refreshDueParks(weather, { log });
        log.info({ ...fetched }, `weather: ${fetched.stored} of ${fetched.due} due parks updated, ${fetched.failed} failed`);
      }
    } else {
      log.info({ pollMs: settings.pollMs }, `started (polling every ${settings.pollMs} ms)`);
      await Promise.all([
        runWorkerLoop(options, { pollMs: settings.pollMs, signal: stopping.signal, log }),
        weather ? runWeatherLoop(weather, { checkMs: 60_000, signal: stopping.signal, log: log.child({ part: "weather" }) }) : null,
      ]);
    }
  } finally {
    transport.close();
    await sequelize.close();
  }
}

main().then(
  () => process.exit(0),
  (error) => {
    logger.fatal({ err: error }, "worker stopped by an error");
    process.exit(1);
  },
);
