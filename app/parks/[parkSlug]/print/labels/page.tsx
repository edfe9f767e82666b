import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { PrintButton } from "@/components/print/print-button";
import { boardForPark } from "@/lib/conditions/board";
import { absoluteUrl } from "@/lib/reach/links";
import { qrSvgDataUri } from "@/lib/reach/pure/qr";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ parkSlug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  return { title: `Trailhead labels · ${(await params).parkSlug}`, robots: { index: false } };
}

/** One QR label per trail, linking to its page, laid out to cut from A4 or Letter. */
export default async function TrailLabelsPage({ params }: Props) {
  const board = await boardForPark((await params).parkSlug);
  if (!board) notFound();
  const labels = await Promise.all(
    board.trails.map(async (trail) => {
      const url = absoluteUrl(`/trails/${trail.id}`);
      return { trail, url, qr: await qrSvgDataUri(url) };
    }),
  );
  return (
    <section className="space-y-4">
      <div className="space-y-2 print:hidden">
        <h1 className="text-2xl font-bold">{board.park.name}: trailhead QR labels</h1>
        <p className="text-loam-700">Each code opens that trail&apos;s page with today&apos;s status. Print, cut along the lines and fix one at each trailhead.</p>
        <div className="flex flex-wrap gap-2">
          <PrintButton label="Print labels" />
          <Link href={`/parks/${board.park.slug}/print`} className="btn-quiet">Daily sheet</Link>
        </div>
      </div>
      <ul className="grid grid-cols-2 gap-0 sm:grid-cols-3 print:grid-cols-3">
        {labels.map(({ trail, url, qr }) => (
          <li key={trail.id} className="break-inside-avoid border border-dashed border-loam-400 p-3 text-center" data-testid="qr-label">
            {/* eslint-disable-next-line @next/next/no-img-element -- an inline SVG data URI drawn on the server */}
            <img src={qr} alt={`QR code for ${trail.name}: ${url}`} width={160} height={160} className="mx-auto" />
            <p className="mt-1 text-lg font-bold leading-tight">{trail.name}</p>
            <div className="flex justify-center text-sm">
              <DifficultyBadge difficulty={trail.difficulty} />
            </div>
            <p className="text-xs">Scan for today&apos;s status · {board.park.name}</p>
          </li>
        ))}
      </ul>
    </section>
  );
}
