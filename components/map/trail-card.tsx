import Link from "next/link";
import { DIFFICULTIES } from "@/lib/trails/pure/vocabulary";
import { formatParkTime, formatLength, formatSurfaces } from "@/lib/map/pure/format";
import { statusKey } from "@/lib/map/pure/status";
import type { HazardMapProperties } from "@/lib/map/pure/geojson";
import type { TrailMapProperties } from "@/lib/map/pure/schemas";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { StatusBadge } from "./status-swatch";

type CardShell = { onClose: () => void; children: React.ReactNode; label: string };

function Card({ onClose, children, label }: CardShell) {
  return (
    <section aria-label={label} aria-live="polite" className="card absolute inset-x-2 bottom-2 z-10 max-h-[70%] overflow-auto shadow-lg sm:left-auto sm:right-2 sm:w-80" data-testid="map-card">
      <button type="button" onClick={onClose} className="btn-quiet float-right -mr-2 -mt-2 min-h-tap min-w-tap px-2" aria-label="Close">
        ✕
      </button>
      {children}
    </section>
  );
}

/** What a rider sees after tapping a trail on the map. */
export function TrailCard({ trail, timeZone, onClose }: { trail: TrailMapProperties; timeZone: string; onClose: () => void }) {
  return (
    <Card onClose={onClose} label={`${trail.name}: details`}>
      <h2 className="text-lg font-bold">{trail.name}</h2>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
        <dt className="text-loam-600">Difficulty</dt>
        <dd>
          <DifficultyBadge difficulty={trail.difficulty} />
        </dd>
        <dt className="text-loam-600">Today</dt>
        <dd>
          <StatusBadge status={statusKey(trail.status)} />
        </dd>
        <dt className="text-loam-600">Surface</dt>
        <dd>{formatSurfaces(trail.surfaces)}</dd>
        <dt className="text-loam-600">Last inspected</dt>
        <dd>{formatParkTime(trail.lastReportAt, timeZone)}</dd>
        <dt className="text-loam-600">Length</dt>
        <dd>
          {formatLength(trail.lengthM)}
          {trail.descentM !== null && ` · ${Math.round(trail.descentM)} m descent`}
        </dd>
      </dl>
      <Link href={`/trails/${trail.id}`} className="btn-primary mt-3 w-full">
        Trail page: {trail.name}
      </Link>
      <p className="sr-only">{DIFFICULTIES[trail.difficulty].label} trail.</p>
    </Card>
  );
}

export function HazardCard({ hazard, trailName, timeZone, onClose }: { hazard: HazardMapProperties; trailName: string | null; timeZone: string; onClose: () => void }) {
  return (
    <Card onClose={onClose} label={`Hazard: ${hazard.kindLabel}`}>
      <h2 className="text-lg font-bold">Hazard: {hazard.kindLabel}</h2>
      {trailName && <p className="text-sm">On {trailName}</p>}
      {hazard.note && <p className="mt-1">{hazard.note}</p>}
      <p className="mt-1 text-sm text-loam-600">Pinned {formatParkTime(hazard.reportedAt, timeZone)}</p>
    </Card>
  );
}
