import type { Metadata } from "next";
import Link from "next/link";
import { groundLayerCounts, groundLayerHistory } from "@/lib/parks/ground";
import { GROUND_LAYER_INFO, type GroundLayer } from "@/lib/parks/pure/ground-layers";
import { parkHasTrails, parkSettings, requireParkAccess } from "@/lib/parks/queries";
import { GroundLayersPanel } from "./ground-layers-panel";
import { ParkSettingsForm } from "./settings-form";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Park settings" };

const when = (iso: string, timeZone: string) => new Intl.DateTimeFormat("en-GB", { timeZone, day: "numeric", month: "short", hour: "2-digit", minute: "2-digit", hourCycle: "h23" }).format(new Date(iso));

/** Managers (and admins): the park's settings and its ground layers. */
export default async function ParkSettingsPage({ params }: { params: Promise<{ parkSlug: string }> }) {
  const park = await requireParkAccess((await params).parkSlug, "park:update");
  const [hasTrails, history] = await Promise.all([parkHasTrails(park.id), groundLayerHistory(park.id)]);
  return (
    <section className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-2">
        <h1 className="text-2xl font-bold">{park.name}: settings</h1>
        <nav aria-label="Park pages" className="flex gap-2">
          <Link href={`/staff/${park.slug}`} className="btn-quiet">Staff desk</Link>
          <Link href={`/parks/${park.slug}/map`} className="btn-quiet">Map</Link>
        </nav>
      </header>
      <ParkSettingsForm initial={parkSettings(park)} slugLocked={hasTrails} />
      <GroundLayersPanel parkSlug={park.slug} counts={groundLayerCounts(park)} />
      {history.length > 0 && (
        <section className="card space-y-2" aria-labelledby="ground-history">
          <h2 id="ground-history" className="text-lg font-bold">Previous versions of the ground</h2>
          <ul className="text-sm">
            {history.map((h) => (
              <li key={h.id}>
                {when(h.replacedAt, park.timeZone)}: {GROUND_LAYER_INFO[h.layer as GroundLayer]?.label ?? h.layer} changed; it held {h.features} shape{h.features === 1 ? "" : "s"} before
              </li>
            ))}
          </ul>
        </section>
      )}
    </section>
  );
}
