import type { Metadata } from "next";
import Link from "next/link";
import { MapLegend } from "@/components/map/map-legend";
import { OfflineNote } from "@/components/offline/offline-note";
import { ParkMapLoader } from "@/components/map/park-map-loader";
import { TrailTextList } from "@/components/map/trail-text-list";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { parkBaseLayersGeoJson, parkHazardsGeoJson, parkTrailsGeoJson } from "@/lib/map/map-queries";
import { boundsAround, collectionBounds, trailBounds, unionBounds } from "@/lib/map/pure/bounds";
import { GROUND_LAYER_INFO, missingGroundLayers } from "@/lib/parks/pure/ground-layers";
import { parkDataUrls } from "@/lib/map/pure/sources";
import { requireParkAccess, findParkBySlug } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ parkSlug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const park = await findParkBySlug((await params).parkSlug);
  return { title: park ? `${park.name}: map` : "Map" };
}

export default async function ParkMapPage({ params }: Props) {
  const { parkSlug } = await params;
  const park = await requireParkAccess(parkSlug);
  const [{ trails, collection }, hazards, actor] = await Promise.all([parkTrailsGeoJson(park), parkHazardsGeoJson(park.id), getActor()]);
  const staff = can(actor, "trail:write", { parkId: park.id }) || can(actor, "hazard:write", { parkId: park.id });
  const properties = collection.features.map((f) => f.properties);
  // The trails and the park's boundary; a park with neither opens on its other ground, else around its location.
  const boundary = park.mapLayers?.boundary ? collectionBounds(park.mapLayers.boundary) : null;
  const bounds = unionBounds(trailBounds(trails), boundary) ?? collectionBounds(parkBaseLayersGeoJson(park)) ?? boundsAround(park.centerLon, park.centerLat);
  const missing = can(actor, "park:update", { parkId: park.id }) ? missingGroundLayers(park.mapLayers ?? {}) : [];

  return (
    <section className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-2">
        <div>
          <h1 className="text-2xl font-bold">{park.name}: map</h1>
          {park.fictional && <p className="text-xs font-semibold uppercase tracking-wide text-flare-700">Fictional demo park</p>}
        </div>
        <nav aria-label="Park pages" className="flex gap-2">
          <Link href={`/parks/${park.slug}`} className="btn-quiet">Conditions board</Link>
          <a href="#trail-list" className="btn-quiet">Trail list</a>
          {staff && <Link href={`/staff/${park.slug}/map`} className="btn-quiet">Move pins</Link>}
        </nav>
      </header>
      {missing.length > 0 && (
        <p className="rounded-lg bg-flare-100 p-3 text-sm" data-testid="missing-ground">
          For staff: the map has no {missing.map((layer) => GROUND_LAYER_INFO[layer].label.toLowerCase()).join(", ")} yet.{" "}
          <Link href={`/staff/${park.slug}/settings#ground-heading`} className="font-semibold underline">Upload them in the park settings</Link>.
        </p>
      )}
      <OfflineNote asOf={new Date().toISOString()} timeZone={park.timeZone} />
      <a href="#trail-list" className="sr-only focus:not-sr-only">Skip the map: go to the list of trails and hazards</a>
      <ParkMapLoader styleUrl={parkDataUrls(park.slug).style} bounds={bounds} timeZone={park.timeZone} trails={properties} hazards={hazards.features.map((f) => f.properties)} />
      <MapLegend />
      <TrailTextList trails={properties} hazards={hazards.features.map((f) => f.properties)} timeZone={park.timeZone} trailNames={new Map(properties.map((t) => [t.id, t.name]))} />
    </section>
  );
}
