import { DifficultyBadge } from "@/components/difficulty-badge";
import { formatDistance, formatGrade, formatHeight, type DistanceSystem } from "@/lib/shared/units";

export type TrailFigures = {
  lengthM: number;
  ascentM: number | null;
  descentM: number | null;
  avgGradePct: number | null;
  maxGradePct: number | null;
  minElevationM: number | null;
  maxElevationM: number | null;
  suggestedDifficulty: string | null;
};

const NONE = "no elevation in file";

/** A trail's measured figures as a definition list, in the viewer's units. */
export function TrailFiguresList({ figures, system }: { figures: TrailFigures; system: DistanceSystem }) {
  const height = (m: number | null) => (m === null ? NONE : formatHeight(m, system));
  const grade = (pct: number | null) => (pct === null ? NONE : formatGrade(pct));
  const rows: [string, React.ReactNode, string][] = [
    ["Length", formatDistance(figures.lengthM, system), "length"],
    ["Descent", height(figures.descentM), "descent"],
    ["Climb", height(figures.ascentM), "ascent"],
    ["Average grade", grade(figures.avgGradePct), "avg-grade"],
    ["Steepest grade", grade(figures.maxGradePct), "max-grade"],
    ["Lowest / highest", figures.minElevationM === null ? NONE : `${height(figures.minElevationM)} / ${height(figures.maxElevationM)}`, "elevation"],
    ["Suggested rating", figures.suggestedDifficulty ? <DifficultyBadge difficulty={figures.suggestedDifficulty} /> : NONE, "suggested"],
  ];
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4">
      {rows.map(([label, value, key]) => (
        <div key={key} data-testid={`figure-${key}`}>
          <dt className="text-xs font-semibold uppercase tracking-wide text-loam-600">{label}</dt>
          <dd className="font-semibold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
