import type { ParkWeatherView } from "@/lib/weather/park-weather";
import { WEATHER_ATTRIBUTION } from "@/lib/weather/pure/types";
import { boardLine, formatRain, measuredLine, morningCheckLine } from "@/lib/weather/pure/summary";

/** The licence line Open-Meteo's CC BY 4.0 asks for, beside every use of its data. */
export function WeatherAttribution() {
  return (
    <a href={WEATHER_ATTRIBUTION.href} className="text-xs text-loam-700 underline" rel="noopener" target="_blank">
      {WEATHER_ATTRIBUTION.text}
    </a>
  );
}

/**
 * The park's weather as last stored by the worker. "check" is the ranger's line at the top of the
 * morning check (rain since yesterday evening, the night, the park's caution level); "board" is the
 * riders' line (today's range, rain in the last 24 h). Without values it says so and nothing breaks.
 */
export function WeatherPanel({ weather, timeZone, variant, now = new Date() }: { weather: ParkWeatherView | null; timeZone: string; variant: "check" | "board"; now?: Date }) {
  // Without stored weather the board says nothing; the ranger is told, so a missing feed is noticed.
  if (!weather) {
    return variant === "check" ? (
      <p className="text-sm text-loam-700" data-testid="weather">
        No weather stored for this park yet: check the rain yourself.
      </p>
    ) : null;
  }
  return (
    <section aria-label="Weather" data-testid="weather" className={`rounded-lg border p-3 text-sm ${weather.stale ? "border-flare-700 bg-flare-100" : "border-loam-300 bg-white"}`}>
      <p className="font-semibold text-loam-900">{variant === "check" ? morningCheckLine(weather, now, timeZone) : boardLine(weather)}</p>
      {variant === "check" && (
        <p className="text-loam-800">
          Last 24 h: {formatRain(weather.rain24hMm)} (the park&apos;s caution level is {formatRain(weather.thresholdMm)}).
        </p>
      )}
      {variant === "check" && weather.caution && (
        <p role="note" className="mt-1 rounded bg-flare-100 p-2 font-semibold text-loam-900">
          Caution: {weather.caution}
        </p>
      )}
      <p className="mt-1 flex flex-wrap gap-x-3 text-xs text-loam-700">
        <span>{measuredLine(weather, now, timeZone)}</span>
        <WeatherAttribution />
      </p>
    </section>
  );
}
