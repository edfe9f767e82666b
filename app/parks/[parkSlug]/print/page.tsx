import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { StatusLabel } from "@/components/board/status-label";
import { PrintButton } from "@/components/print/print-button";
import { boardForPark } from "@/lib/conditions/board";
import { HAZARD_KIND_LABELS, PARK_STATE_LABELS } from "@/lib/conditions/pure/labels";
import type { HazardKind } from "@/lib/hazards/pure/schemas";
import { statusCounts } from "@/lib/reach/pure/status-feed";
import { absoluteUrl } from "@/lib/reach/links";
import { qrSvgDataUri } from "@/lib/reach/pure/qr";
import { longDate, parkLocalTime } from "@/lib/shared/park-clock";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ parkSlug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  return { title: `Daily sheet · ${(await params).parkSlug}`, robots: { index: false } };
}

const hazardLabel = (kind: string) => HAZARD_KIND_LABELS[kind as HazardKind] ?? kind;

/** Today's board on one printed page for the lift station and trailhead boards (A4 or Letter). */
export default async function PrintSheetPage({ params }: Props) {
  const board = await boardForPark((await params).parkSlug);
  if (!board) notFound();
  const { park } = board;
  const boardUrl = absoluteUrl(`/parks/${park.slug}`);
  const counts = statusCounts(board.trails);
  const printedAt = new Date(board.generatedAt);
  return (
    <article className="print-sheet space-y-4 text-lg" data-testid="print-sheet">
      <div className="flex flex-wrap gap-2 print:hidden">
        <PrintButton label="Print this sheet" />
        <Link href={`/parks/${park.slug}/print/labels`} className="btn-quiet">Trailhead QR labels</Link>
        <Link href={`/parks/${park.slug}`} className="btn-quiet">Back to the board</Link>
      </div>
      <header className="flex items-start justify-between gap-4 border-b-4 border-loam-900 pb-3">
        <div>
          <h1 className="text-4xl font-bold leading-tight">{park.name}</h1>
          <p className="text-2xl">Trail status · {longDate(board.date)}</p>
          <p className="mt-1 text-xl font-semibold">
            {counts.open} open · {counts.caution} caution · {counts.closed} closed
            {counts.notInspected > 0 && ` · ${counts.notInspected} not inspected yet`}
          </p>
        </div>
        {/* eslint-disable-next-line @next/next/no-img-element -- an inline SVG data URI drawn on the server */}
        <img src={await qrSvgDataUri(boardUrl)} alt={`QR code for the live board: ${boardUrl}`} width={112} height={112} className="shrink-0" />
      </header>
      {board.parkState && (
        <p className="rounded-lg border-4 border-loam-900 p-3 text-2xl font-bold" data-testid="print-park-notice">
          {PARK_STATE_LABELS[board.parkState.state]}: {board.parkState.message}
        </p>
      )}
      <table className="w-full border-collapse">
        <thead>
          <tr className="border-b-2 border-loam-900 text-left text-base">
            <th className="py-1 pr-2">Trail</th>
            <th className="py-1 pr-2">Status</th>
            <th className="py-1">Notes and hazards</th>
          </tr>
        </thead>
        <tbody>
          {board.trails.map((trail) => (
            <tr key={trail.id} className="break-inside-avoid border-b border-loam-300 align-top" data-testid="print-trail">
              <td className="py-2 pr-2">
                <span className="block text-xl font-bold">{trail.name}</span>
                <DifficultyBadge difficulty={trail.difficulty} />
              </td>
              <td className="py-2 pr-2">
                <StatusLabel status={trail.effectiveStatus} />
              </td>
              <td className="py-2">
                {trail.reason && <span className="block font-semibold">{trail.reason}</span>}
                {trail.inspectedToday && trail.surfaces.length > 0 && <span className="block">{trail.surfaces.join(", ")}</span>}
                {trail.hazards.map((h) => (
                  <span key={h.id} className="block">
                    ⚠ {hazardLabel(h.kind)}
                    {h.note && `: ${h.note}`}
                  </span>
                ))}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {board.parkHazards.length > 0 && (
        <section>
          <h2 className="text-2xl font-bold">Hazards off the trails</h2>
          <ul>
            {board.parkHazards.map((h) => (
              <li key={h.id}>
                ⚠ {hazardLabel(h.kind)}
                {h.note && `: ${h.note}`}
              </li>
            ))}
          </ul>
        </section>
      )}
      <footer className="border-t-2 border-loam-900 pt-2 text-base">
        Printed {longDate(board.date)} at {parkLocalTime(printedAt, park.timeZone)} park time. Conditions change during the day: the live board is at {boardUrl}. Follow signs and staff on the day.
      </footer>
    </article>
  );
}
