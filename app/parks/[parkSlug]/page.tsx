import type { Metadata } from "next";
import { formatCalendarDate, longDate } from "@/lib/shared/park-clock";
import Link from "next/link";
import { cache } from "react";
import { notFound } from "next/navigation";
import { BoardFilterLinks } from "@/components/board/board-filters";
import { BoardLive } from "@/components/board/board-live";
import { OfflineNote } from "@/components/offline/offline-note";
import { parseBoardFilters } from "@/lib/conditions/pure/board-filters";
import { boardForPark } from "@/lib/conditions/board";
import { absoluteUrl, webcalUrl } from "@/lib/reach/links";
import { statusCounts } from "@/lib/reach/pure/status-feed";
import { previewMetadata } from "@/lib/reach/preview-image";
import { WeatherPanel } from "@/components/weather/weather-panel";
import { findParkBySlug } from "@/lib/parks/queries";
import { parkWeather } from "@/lib/weather/park-weather";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ parkSlug: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

// One board query per request, shared by the metadata and the page.
const boardOnce = cache((slug: string) => boardForPark(slug));

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { parkSlug } = await params;
  const board = await boardOnce(parkSlug);
  if (!board) return { title: "Park not found" };
  const counts = statusCounts(board.trails);
  const description = `${counts.open} open, ${counts.caution} caution, ${counts.closed} closed on ${longDate(board.date)}.`;
  return {
    title: `Today's conditions · ${board.park.name}`,
    description,
    ...previewMetadata({ title: `${board.park.name}: today's trail conditions`, description, url: absoluteUrl(`/parks/${parkSlug}`), imageUrl: absoluteUrl(`/api/parks/${parkSlug}/preview.png`) }),
  };
}

/** The public conditions board: rendered on the server for a fast first paint, refreshed by a small client part. */
export default async function ParkBoardPage({ params, searchParams }: Props) {
  const { parkSlug } = await params;
  const [board, query] = await Promise.all([boardOnce(parkSlug), searchParams]);
  if (!board) notFound();
  // Stored by the worker; read beside the cached board, so a weather update never drops the board's cache.
  const park = await findParkBySlug(parkSlug);
  const weather = park ? await parkWeather(park) : null;
  const filters = parseBoardFilters(query);
  const path = `/parks/${board.park.slug}`;
  return (
    <section className="space-y-4">
      <header className="space-y-1">
        {board.park.fictional && <p className="text-xs font-semibold uppercase tracking-wide text-flare-700">Fictional demo park</p>}
        <h1 className="text-2xl font-bold">{board.park.name}</h1>
        <p className="text-loam-700">
          Conditions for <strong>{longDate(board.date)}</strong> (park time)
        </p>
        <p className="-mx-4 flex gap-2 overflow-x-auto px-4 pb-1">
          <Link href={`${path}/map`} className="btn-quiet shrink-0">
            Map
          </Link>
          <Link href={`${path}/trails`} className="btn-quiet shrink-0">
            All trails
          </Link>
          <Link href={`/pressure?park=${board.park.slug}`} className="btn-quiet shrink-0">
            Today&apos;s tyre pressure
          </Link>
          <Link href={`/me/subscriptions?park=${board.park.slug}`} className="btn-quiet shrink-0">
            Get trail notices
          </Link>
          {/* webcal:// asks the rider's calendar app to subscribe, so later changes arrive by themselves. */}
          <a href={webcalUrl(`/api/parks/${board.park.slug}/closures.ics`)} className="btn-quiet">
            Subscribe in your calendar
          </a>
        </p>
      </header>
      <WeatherPanel weather={weather} timeZone={board.park.timeZone} variant="board" />
      <OfflineNote asOf={board.generatedAt} timeZone={board.park.timeZone} />
      <BoardLive initial={board} filters={filters} filterLinks={<BoardFilterLinks path={path} filters={filters} />} />
    </section>
  );
}
