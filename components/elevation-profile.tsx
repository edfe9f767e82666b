import { profileChart, type ProfileMark } from "@/lib/trails/pure/profile-chart";
import type { ProfilePoint } from "@/lib/trails/pure/profile";
import type { DistanceSystem } from "@/lib/shared/units";

/** The elevation profile as inline SVG, drawn wherever it renders (no chart library, no script needed). */
export function ElevationProfile({ profile, system, id = "profile", marks = [] }: { profile: ProfilePoint[]; system: DistanceSystem; id?: string; marks?: ProfileMark[] }) {
  const chart = profileChart(profile, system, undefined, marks);
  if (!chart) return <p className="text-sm text-loam-600">The file has no elevation, so there is no profile.</p>;
  const { plot } = chart;
  return (
    <figure className="space-y-1">
      <svg viewBox={`0 0 ${chart.width} ${chart.height}`} role="img" aria-labelledby={`${id}-title`} className="h-auto w-full max-w-2xl" data-testid="elevation-profile">
        <title id={`${id}-title`}>{chart.summary}</title>
        {chart.yTicks.map((t) => (
          <g key={`y${t.label}`}>
            <line x1={plot.left} x2={plot.right} y1={t.at} y2={t.at} stroke="#d7cdbd" strokeWidth="1" />
            <text x={plot.left - 6} y={t.at} textAnchor="end" dominantBaseline="middle" fontSize="14" fill="#4b3d2d">{t.label}</text>
          </g>
        ))}
        {chart.xTicks.map((t) => (
          <g key={`x${t.label}`}>
            <line x1={t.at} x2={t.at} y1={plot.bottom} y2={plot.bottom + 4} stroke="#7c6749" />
            <text x={t.at} y={plot.bottom + 18} textAnchor="middle" fontSize="14" fill="#4b3d2d">{t.label}</text>
          </g>
        ))}
        <path d={chart.area} fill="#e3f0df" />
        <path d={chart.line} fill="none" stroke="#245522" strokeWidth="2" strokeLinejoin="round" />
        <line x1={plot.left} x2={plot.right} y1={plot.bottom} y2={plot.bottom} stroke="#7c6749" />
        {/* Built features, numbered as in the list below the chart. */}
        {chart.marks.map((m) => (
          <g key={`m${m.label}`} data-profile-mark={m.label}>
            <line x1={m.x} x2={m.x} y1={m.y} y2={m.y - 16} stroke="#221c16" />
            <circle cx={m.x} cy={m.y - 24} r="9" fill="#ffffff" stroke="#221c16" strokeWidth="1.5" />
            <text x={m.x} y={m.y - 24} textAnchor="middle" dominantBaseline="central" fontSize="12" fontWeight="700" fill="#221c16">{m.label}</text>
          </g>
        ))}
        <text x={plot.left - 6} y={plot.top - 12} textAnchor="end" fontSize="13" fill="#4b3d2d">{chart.yUnit}</text>
        <text x={plot.right} y={chart.height - 4} textAnchor="end" fontSize="13" fill="#4b3d2d">{`distance (${chart.xUnit})`}</text>
      </svg>
      <figcaption className="text-sm text-loam-600">{chart.summary}</figcaption>
    </figure>
  );
}
