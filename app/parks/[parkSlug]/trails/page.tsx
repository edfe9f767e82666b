import Link from "next/link";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { kindLabel } from "@/lib/trails/pure/vocabulary";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { listParkTrails } from "@/lib/trails/queries";
import { distanceSystemFor } from "@/lib/accounts/user-units";
import { formatDistance, formatGrade, formatHeight } from "@/lib/shared/units";
import { trailListQuerySchema, type TrailSortKey } from "@/lib/trails/pure/schemas";
import { requireParkAccess, findParkBySlug } from "@/lib/parks/queries";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ parkSlug: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

/** Kind folds under the name on phones so the figures stay on screen without scrolling. */
const COLUMNS: { key: TrailSortKey; label: string; numeric?: boolean; wideOnly?: boolean }[] = [
  { key: "difficulty", label: "Difficulty" },
  { key: "name", label: "Trail" },
  { key: "kind", label: "Kind", wideOnly: true },
  { key: "length", label: "Length", numeric: true },
  { key: "descent", label: "Descent", numeric: true },
  { key: "grade", label: "Steepest", numeric: true },
];

export async function generateMetadata({ params }: Props) {
  const park = await findParkBySlug((await params).parkSlug);
  return { title: park ? `Trails · ${park.name}` : "Trails" };
}

/** The park's trails as a table sorted by links (works without JavaScript). */
export default async function ParkTrailsPage({ params, searchParams }: Props) {
  const { parkSlug } = await params;
  const park = await requireParkAccess(parkSlug);
  const query = trailListQuerySchema.parse(await searchParams);
  const actor = await getActor();
  const [trails, system] = await Promise.all([listParkTrails(park.id, query.sort, query.dir), distanceSystemFor(actor)]);
  const sortHref = (key: TrailSortKey) => `?sort=${key}&dir=${query.sort === key && query.dir === "asc" ? "desc" : "asc"}`;

  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <div>
          <p className="text-sm font-semibold text-loam-600">
            <Link href={`/parks/${park.slug}`} className="underline-offset-4 hover:underline">{park.name}</Link>
          </p>
          <h1 className="text-2xl font-bold">Trails</h1>
        </div>
        {can(actor, "trail:write", { parkId: park.id }) && (
          <Link href={`/staff/${park.slug}/trails/new`} className="btn-primary">Upload a trail</Link>
        )}
      </div>
      {trails.length === 0 ? (
        <p className="card">No trails have been uploaded for this park yet.</p>
      ) : (
        <div className="card overflow-x-auto p-0">
          <table className="w-full text-left text-sm" data-testid="trail-table">
            <caption className="sr-only">Trails of {park.name}; the column headings sort the table.</caption>
            <thead className="border-b border-loam-200 bg-loam-50">
              <tr>
                {COLUMNS.map((c) => {
                  const active = query.sort === c.key;
                  return (
                    <th
                      key={c.key}
                      scope="col"
                      aria-sort={active ? (query.dir === "asc" ? "ascending" : "descending") : undefined}
                      className={`px-1 py-1 sm:px-3 ${c.numeric ? "text-right" : ""} ${c.wideOnly ? "hidden sm:table-cell" : ""}`}
                    >
                      <Link href={sortHref(c.key)} className="inline-flex min-h-tap items-center gap-0.5 text-xs font-semibold underline-offset-4 hover:underline sm:text-sm">
                        {c.label}
                        <span aria-hidden="true" className="text-loam-500">{active ? (query.dir === "asc" ? "▲" : "▼") : "↕"}</span>
                      </Link>
                    </th>
                  );
                })}
              </tr>
            </thead>
            <tbody className="divide-y divide-loam-100">
              {trails.map((t) => (
                <tr key={t.id}>
                  <td className="px-1 py-2 sm:px-3">
                    <DifficultyBadge difficulty={t.difficulty} wrap className="flex-col items-start gap-0.5 text-xs leading-tight sm:flex-row sm:items-center sm:text-sm" />
                  </td>
                  <td className="px-1 py-2 sm:px-3">
                    <Link href={`/trails/${t.id}`} className="inline-flex min-h-tap items-center font-semibold text-moss-700 underline underline-offset-4">{t.name}</Link>
                    <span className="block text-xs text-loam-600 sm:hidden">{kindLabel(t.kind)}</span>
                  </td>
                  <td className="hidden px-3 py-2 sm:table-cell">{kindLabel(t.kind)}</td>
                  <td className="whitespace-nowrap px-1 py-2 text-right tabular-nums sm:px-3">{formatDistance(t.lengthM, system)}</td>
                  <td className="whitespace-nowrap px-1 py-2 text-right tabular-nums sm:px-3">{t.descentM === null ? "—" : formatHeight(t.descentM, system)}</td>
                  <td className="whitespace-nowrap px-1 py-2 text-right tabular-nums sm:px-3">{t.maxGradePct === null ? "—" : formatGrade(t.maxGradePct, 0)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <p className="text-xs text-loam-600">Figures are measured from the uploaded GPS line; “—” means the file had no elevation. Ride within your ability and follow park signage and staff.</p>
    </section>
  );
}
