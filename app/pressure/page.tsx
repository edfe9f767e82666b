import Link from "next/link";
import { PressureForm } from "@/components/pressure/pressure-form";
import { getActor } from "@/lib/server/auth/actor";
import { pressurePageData, pressurePageWeather } from "@/lib/pressure/pressure-page";
import { WeatherAttribution } from "@/components/weather/weather-panel";

export const metadata = { title: "Today's pressure" };
export const dynamic = "force-dynamic";

export default async function PressurePage({ searchParams }: { searchParams: Promise<{ park?: string; setup?: string }> }) {
  const { park, setup } = await searchParams;
  const actor = await getActor();
  const data = await pressurePageData(actor, park);
  const weather = await pressurePageWeather(data.park?.slug);
  return (
    <section className="space-y-4">
      <div className="space-y-2">
        <h1 className="text-3xl font-extrabold tracking-tight">Today&apos;s pressure</h1>
        <p className="max-w-prose text-lg text-loam-900">
          A band per wheel for the trails you plan to ride, with the reason behind every change.{" "}
          <Link href="/pressure/how-it-works" className="font-semibold underline">How it works</Link>
        </p>
        <p className="rounded-lg border-2 border-loam-900 bg-white p-3 font-semibold text-loam-900">
          A starting point, not an instruction: never go above the printed maximum of your tyre or rim, and check with a gauge.
        </p>
      </div>
      {weather && (
        <p className="text-sm text-loam-800" data-testid="pressure-weather">
          {weather.text} <WeatherAttribution />
        </p>
      )}
      <PressureForm {...data} signedIn={Boolean(actor)} initialSetupId={data.setups.some((s) => s.id === setup) ? setup : undefined} />
    </section>
  );
}
