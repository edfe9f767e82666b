import Link from "next/link";
import { formatParkTime, formatLength } from "@/lib/map/pure/format";
import { statusKey } from "@/lib/map/pure/status";
import type { HazardMapProperties } from "@/lib/map/pure/geojson";
import type { TrailMapProperties } from "@/lib/map/pure/schemas";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { StatusBadge } from "./status-swatch";

/** The list item starts with the hazard's kind, which the map data words in lower case. */
const sentenceCase = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * Everything the map shows, as text: each trail with its status, and the open hazards. Rendered
 * on the server, so it reads with a screen reader, a keyboard, or before the map has loaded.
 */
export function TrailTextList({ trails, hazards, timeZone, trailNames }: { trails: TrailMapProperties[]; hazards: HazardMapProperties[]; timeZone: string; trailNames: Map<string, string> }) {
  return (
    <section aria-labelledby="trail-list-heading" id="trail-list" className="space-y-3" data-testid="trail-text-list">
      <h2 id="trail-list-heading" className="text-xl font-bold">Trails today</h2>
      {trails.length === 0 && <p>No trails have been mapped in this park yet.</p>}
      <ul className="divide-y divide-loam-200 rounded-xl border border-loam-200 bg-white">
        {trails.map((t) => (
          <li key={t.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-3 py-2" data-trail-row={t.id}>
            {/* On a phone the name takes its own line, so difficulty and status always sit together below it. */}
            <Link href={`/trails/${t.id}`} className="basis-full font-semibold text-loam-900 underline-offset-2 hover:underline sm:min-w-40 sm:flex-1 sm:basis-auto">
              {t.name}
            </Link>
            <DifficultyBadge difficulty={t.difficulty} />
            <StatusBadge status={statusKey(t.status)} />
            <span className="text-sm text-loam-600">
              {formatLength(t.lengthM)}
              {t.descentM !== null && ` · ${Math.round(t.descentM)} m descent`} · last inspected {formatParkTime(t.lastReportAt, timeZone)}
            </span>
          </li>
        ))}
      </ul>
      <h3 className="text-lg font-bold">Open hazards</h3>
      {hazards.length === 0 ? (
        <p>No open hazards are pinned.</p>
      ) : (
        <ul className="list-disc space-y-1 pl-5">
          {hazards.map((h) => (
            <li key={h.id}>
              <strong>{sentenceCase(h.kindLabel)}</strong>
              {h.trailId && trailNames.get(h.trailId) ? ` on ${trailNames.get(h.trailId)}` : ""}
              {h.note ? `: ${h.note}` : ""} <span className="text-sm text-loam-600">(pinned {formatParkTime(h.reportedAt, timeZone)})</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
