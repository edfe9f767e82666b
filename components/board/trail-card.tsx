import Link from "next/link";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { describeFeatures } from "@/lib/conditions/pure/labels";
import { kindLabel } from "@/lib/trails/pure/vocabulary";
import type { BoardTrail } from "@/lib/conditions/board";
import { parkLocalTime, formatParkDay } from "@/lib/shared/park-clock";
import { HazardList } from "./hazard-list";
import { StatusLabel } from "./status-label";

function lastSeen(trail: BoardTrail, timeZone: string): string {
  if (trail.inspectedToday && trail.lastReportAt) return `Inspected ${parkLocalTime(new Date(trail.lastReportAt), timeZone)}`;
  if (!trail.lastReportAt) return "Not inspected yet today";
  const when = formatParkDay(new Date(trail.lastReportAt), timeZone);
  return `Not inspected yet today · last inspected ${when}`;
}

function ChangeLine({ trail }: { trail: BoardTrail }) {
  if (!trail.changedSinceYesterday) return null;
  const { status, surfacesAdded, surfacesRemoved } = trail.changes;
  const parts = [
    status ? `was ${status.from} yesterday` : null,
    surfacesAdded.length ? `now ${surfacesAdded.join(", ")}` : null,
    surfacesRemoved.length ? `no longer ${surfacesRemoved.join(", ")}` : null,
  ].filter(Boolean);
  return (
    <p className="text-sm font-semibold text-loam-800" data-testid="changed">
      <span aria-hidden="true">↻ </span>Changed since yesterday: {parts.join(" · ")}
    </p>
  );
}

export function TrailCard({ trail, timeZone }: { trail: BoardTrail; timeZone: string }) {
  const features = describeFeatures(trail.features);
  return (
    <li className="card space-y-2" data-testid="board-trail" data-trail-id={trail.id}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 className="text-lg font-bold leading-tight">{trail.name}</h3>
          <p className="flex flex-wrap items-center gap-x-2 text-sm text-loam-600">
            <DifficultyBadge difficulty={trail.difficulty} />
            <span>· {kindLabel(trail.kind)}</span>
          </p>
        </div>
        <StatusLabel status={trail.effectiveStatus} />
      </div>
      <p className="text-sm text-loam-700" data-testid="inspected">
        {lastSeen(trail, timeZone)}
      </p>
      {trail.status && trail.effectiveStatus !== trail.status && <p className="text-sm">Trail report: {trail.status} (the park-wide notice comes first).</p>}
      {trail.reason && <p className="font-semibold">{trail.reason}</p>}
      {trail.inspectedToday && trail.surfaces.length > 0 && (
        <ul className="flex flex-wrap gap-1.5" aria-label="Surfaces">
          {trail.surfaces.map((s) => (
            <li key={s} className="rounded-full border border-loam-300 bg-loam-50 px-2 py-0.5 text-sm">
              {s}
            </li>
          ))}
        </ul>
      )}
      {trail.inspectedToday && features && <p className="text-sm text-loam-700">{features}</p>}
      {trail.note && <p className="text-sm italic">“{trail.note}”</p>}
      <ChangeLine trail={trail} />
      <div className="flex flex-wrap items-center gap-x-4 text-sm">
        {trail.hazards.length > 0 ? (
          <details className="w-full">
            <summary className="inline-flex min-h-tap cursor-pointer list-none items-center gap-1 rounded-lg border-2 border-flare-500 bg-flare-100 px-3 font-semibold [&::-webkit-details-marker]:hidden" data-testid="hazard-count">
              <span aria-hidden="true">⚠</span>
              {trail.hazards.length} hazard{trail.hazards.length === 1 ? "" : "s"}
              <span className="ml-1 text-sm font-normal underline underline-offset-2">show</span>
              <span aria-hidden="true">▾</span>
            </summary>
            <HazardList hazards={trail.hazards} />
          </details>
        ) : (
          <span className="text-loam-600" data-testid="hazard-count">
            No hazards pinned
          </span>
        )}
        <Link href={`/trails/${trail.id}/history`} className="inline-flex min-h-tap items-center font-semibold text-moss-700 underline">
          History
        </Link>
      </div>
    </li>
  );
}
