import Link from "next/link";
import { notFound } from "next/navigation";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { directionLabel, kindLabel } from "@/lib/trails/pure/vocabulary";
import { ElevationProfile } from "@/components/elevation-profile";
import { TrailCard } from "@/components/board/trail-card";
import { TrailSketch } from "@/components/trail-sketch";
import { boardForPark } from "@/lib/conditions/board";
import { TrailFiguresList } from "@/components/trail-figures";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { getParkBySlug } from "@/lib/parks/queries";
import { absoluteUrl } from "@/lib/reach/links";
import { previewMetadata } from "@/lib/reach/preview-image";
import { getTrailDetail, type TrailDetail } from "@/lib/trails/queries";
import { distanceSystemFor } from "@/lib/accounts/user-units";
import { AppError } from "@/lib/shared/errors";
import { formatDistance } from "@/lib/shared/units";
import { formatParkDay } from "@/lib/shared/park-clock";
import { WeatherPanel } from "@/components/weather/weather-panel";
import { parkWeather } from "@/lib/weather/park-weather";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ id: string }> };

async function loadTrail(id: string, actor: Awaited<ReturnType<typeof getActor>>): Promise<TrailDetail> {
  try {
    return await getTrailDetail(id, actor);
  } catch (error) {
    if (error instanceof AppError && error.status === 404) notFound();
    throw error;
  }
}

export async function generateMetadata({ params }: Props) {
  const trail = await getTrailDetail((await params).id, null).catch(() => null);
  if (!trail || trail.archivedAt) return { title: trail ? trail.name : "Trail" };
  const description = `${trail.name} at ${trail.park.name}: today's status, surface and hazards.`;
  return {
    title: trail.name,
    description,
    ...previewMetadata({ title: `${trail.name} · ${trail.park.name}`, description, url: absoluteUrl(`/trails/${trail.id}`), imageUrl: absoluteUrl(`/api/parks/${trail.park.slug}/preview.png?trail=${trail.id}`) }),
  };
}

const dateOf = (iso: string, timeZone: string) => formatParkDay(new Date(iso), timeZone);

export default async function TrailPage({ params }: Props) {
  const { id } = await params;
  const actor = await getActor();
  const [trail, system] = await Promise.all([loadTrail(id, actor), distanceSystemFor(actor)]);
  const download = `/api/trails/${trail.id}/download`;
  const today = trail.archivedAt ? null : (await boardForPark(trail.park.slug))?.trails.find((t) => t.id === trail.id);
  const park = await getParkBySlug(trail.park.slug);
  const canEdit = !trail.archivedAt && actor !== null && can(actor, "trail:write", { parkId: park.id });
  const weather = trail.archivedAt ? null : await parkWeather(park);

  return (
    <article className="space-y-4">
      <header className="space-y-1">
        <p className="text-sm font-semibold text-loam-600">
          <Link href={`/parks/${trail.park.slug}/trails`} className="underline-offset-4 hover:underline">{trail.park.name} · trails</Link>
        </p>
        <h1 className="text-2xl font-bold">{trail.name}</h1>
        <p className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <DifficultyBadge difficulty={trail.difficulty} className="font-semibold" />
          <span>
            <span className="sr-only">Kind: </span>
            {kindLabel(trail.kind)}
          </span>
          <span>{directionLabel(trail.direction)}</span>
        </p>
        {trail.archivedAt && <p className="rounded-lg bg-flare-100 p-2 font-semibold">Archived on {dateOf(trail.archivedAt, trail.park.timeZone)}: hidden from riders; kept for the record.</p>}
        {canEdit && (
          <p>
            <Link href={`/staff/${trail.park.slug}/trails/${trail.id}/edit`} className="btn-quiet">Edit trail</Link>
          </p>
        )}
      </header>

      {today && (
        <section aria-labelledby="today-heading" className="space-y-2">
          <h2 id="today-heading" className="text-lg font-bold">Today</h2>
          <WeatherPanel weather={weather} timeZone={trail.park.timeZone} variant="board" />
          <ul>
            <TrailCard trail={today} timeZone={trail.park.timeZone} />
          </ul>
        </section>
      )}

      <section className="card space-y-2" aria-labelledby="line-heading">
        <h2 id="line-heading" className="text-lg font-bold">The line</h2>
        <TrailSketch line={trail.line} name={trail.name} />
        <p className="text-sm">
          <Link href={`/parks/${trail.park.slug}/map`} className="inline-flex min-h-tap items-center font-semibold text-moss-700 underline">
            Open the park map
          </Link>
        </p>
      </section>

      <section className="card space-y-3" aria-labelledby="figures-heading">
        <h2 id="figures-heading" className="text-lg font-bold">Measured from the GPS line</h2>
        <TrailFiguresList figures={trail} system={system} />
        {trail.suggestedDifficulty && trail.suggestedDifficulty !== trail.difficulty && (
          <p className="text-sm text-loam-600">The grades alone suggest a different rating; staff set the rating, which also weighs tread width and obstacles.</p>
        )}
      </section>

      <section className="card space-y-2" aria-labelledby="profile-heading">
        <h2 id="profile-heading" className="text-lg font-bold">Elevation profile</h2>
        <ElevationProfile profile={trail.profile} system={system} marks={trail.features.map((f, i) => ({ dM: f.distanceAlongM, label: String(i + 1) }))} />
      </section>

      <section className="card space-y-2" aria-labelledby="features-heading">
        <h2 id="features-heading" className="text-lg font-bold">Features along the trail</h2>
        {trail.features.length === 0 ? (
          <p className="text-sm text-loam-600">No features recorded.</p>
        ) : (
          <ol className="divide-y divide-loam-100" data-testid="feature-list">
            {trail.features.map((f, i) => (
              <li key={f.id} className="flex justify-between gap-2 py-2">
                <span>
                  <span className="mr-2 inline-flex h-6 w-6 items-center justify-center rounded-full border-2 border-loam-900 text-xs font-bold" aria-hidden="true">{i + 1}</span>
                  <span className="sr-only">Mark {i + 1} on the profile: </span>
                  <span className="font-semibold">{f.kind.replace("-", " ")}</span>
                  {f.size && <span className="text-loam-600"> · {f.size}</span>}
                  {f.name && <span className="text-loam-600"> · {f.name}</span>}
                </span>
                <span className="tabular-nums">{formatDistance(f.distanceAlongM, system)}</span>
              </li>
            ))}
          </ol>
        )}
      </section>

      <section className="card space-y-2" aria-labelledby="files-heading">
        <h2 id="files-heading" className="text-lg font-bold">Files</h2>
        <p className="flex flex-wrap gap-2">
          <a href={`${download}?format=gpx`} className="btn-quiet" download>Download GPX</a>
          <a href={`${download}?format=geojson`} className="btn-quiet" download>Download GeoJSON</a>
        </p>
        <h3 className="pt-2 font-semibold">Versions</h3>
        <ol className="divide-y divide-loam-100 text-sm">
          {trail.versions.map((v) => (
            <li key={v.versionNo} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span>
                <span className="font-semibold">Version {v.versionNo}</span>
                {v.versionNo === trail.currentVersion && <span className="ml-1 rounded bg-moss-100 px-1 text-moss-700">current</span>}
                <span className="text-loam-600"> · {dateOf(v.uploadedAt, trail.park.timeZone)} · {v.sourceFormat.toUpperCase()}{v.lengthM !== null && ` · ${formatDistance(v.lengthM, system)}`}</span>
              </span>
              <a href={`${download}?version=${v.versionNo}`} className="font-semibold text-moss-700 underline underline-offset-4" download>
                Original file
              </a>
            </li>
          ))}
        </ol>
      </section>
    </article>
  );
}
