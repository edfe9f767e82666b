/** Runs the local fake weather service: `tsx scripts/fakes/fake-weather.ts` (port from WEATHER_URL). */
import { startFakeWeather } from "@/scripts/fakes/weather-server";

const port = Number(new URL(process.env.WEATHER_URL ?? "http://127.0.0.1:4590").port || 4590);

startFakeWeather({ port })
  .then((fake) => console.log(`› Fake weather service on ${fake.origin} (forecasts at ${fake.origin}/v1/forecast)`))
  .catch((error: NodeJS.ErrnoException) => {
    console.error(error.code === "EADDRINUSE" ? `✗ Port taken for the fake weather service: ${error.message}` : error);
    process.exit(1);
  });
