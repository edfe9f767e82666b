import { DIFFICULTIES } from "@/lib/trails/pure/vocabulary";
import { STATUS_LOOKS, TRAIL_STATUS_KEYS } from "@/lib/map/pure/status";
import { difficultyValues } from "@/lib/trails/pure/schemas";
import { DifficultySymbol } from "@/components/difficulty-badge";
import { StatusSwatch } from "./status-swatch";

/** What the map's lines, patterns and pins mean. Plain HTML: it reads before the map loads. */
export function MapLegend() {
  return (
    <section aria-labelledby="map-legend-heading" className="card space-y-3 text-sm" data-testid="map-legend">
      <h2 id="map-legend-heading" className="text-base font-bold">Reading the map</h2>
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <h3 className="mb-1 font-semibold">Today&apos;s status: line pattern and word</h3>
          <ul className="space-y-1">
            {TRAIL_STATUS_KEYS.map((key) => (
              <li key={key} className="flex items-center gap-2" data-legend-status={key}>
                <StatusSwatch status={key} />
                <span>
                  <strong>{STATUS_LOOKS[key].label}</strong>: {STATUS_LOOKS[key].patternText}
                </span>
              </li>
            ))}
          </ul>
        </div>
        <div>
          <h3 className="mb-1 font-semibold">Difficulty: line colour and sign</h3>
          <ul className="space-y-1">
            {difficultyValues.map((d) => (
              <li key={d} className="flex items-center gap-2" data-legend-difficulty={d}>
                <DifficultySymbol difficulty={d} />
                <span>
                  <strong>{DIFFICULTIES[d].label}</strong>: {DIFFICULTIES[d].signName}, {DIFFICULTIES[d].colourName} line
                </span>
              </li>
            ))}
          </ul>
        </div>
      </div>
      <p>
        <span aria-hidden="true" className="mr-1 inline-flex h-5 w-5 items-center justify-center rounded-full border-2 border-loam-900 bg-flare-400 font-bold">!</span>
        Hazard pin, named on the map when you zoom in. Small white dots are built features (berms, jumps, drops), shown close up.
      </p>
    </section>
  );
}
