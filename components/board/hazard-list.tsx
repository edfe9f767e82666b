import { HAZARD_KIND_LABELS } from "@/lib/conditions/pure/labels";
import type { BoardHazard } from "@/lib/conditions/board";
import type { HazardKind } from "@/lib/hazards/pure/schemas";

/** Open hazards with their notes and photo thumbnails (loaded only when shown). */
export function HazardList({ hazards }: { hazards: BoardHazard[] }) {
  return (
    <ul className="space-y-3">
      {hazards.map((h) => (
        <li key={h.id} className="rounded-lg border border-loam-200 bg-loam-50 p-2" data-testid="hazard">
          <p className="font-semibold">
            <span aria-hidden="true">⚠ </span>
            {HAZARD_KIND_LABELS[h.kind as HazardKind] ?? h.kind}
          </p>
          {h.note && <p className="text-sm">{h.note}</p>}
          {h.photoIds.length > 0 && (
            <div className="mt-2 flex flex-wrap gap-2">
              {h.photoIds.map((id, i) => (
                <a key={id} href={`/api/photos/${id}?size=full`} className="block">
                  {/* eslint-disable-next-line @next/next/no-img-element -- our own photo route, already resized */}
                  <img src={`/api/photos/${id}?size=thumb`} alt={`Photo ${i + 1} of the ${HAZARD_KIND_LABELS[h.kind as HazardKind]?.toLowerCase() ?? "hazard"}`} loading="lazy" width={96} height={72} className="h-18 w-24 rounded object-cover" />
                </a>
              ))}
            </div>
          )}
        </li>
      ))}
    </ul>
  );
}
