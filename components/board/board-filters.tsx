import Link from "next/link";
import { filterHref, STATUS_FILTERS, type BoardFilters, type FilterKey } from "@/lib/conditions/pure/board-filters";
import { STATUS_LABELS } from "@/lib/conditions/pure/labels";
import { DIFFICULTIES, TRAIL_KINDS } from "@/lib/trails/pure/vocabulary";
import { difficultyValues, trailKindValues } from "@/lib/trails/pure/schemas";

const statusLabel = (s: string) => (s === "not-inspected" ? "Not inspected" : STATUS_LABELS[s as keyof typeof STATUS_LABELS]);

function Group({ path, filters, name, label, options }: { path: string; filters: BoardFilters; name: FilterKey; label: string; options: [string, string][] }) {
  const chip = (active: boolean) =>
    `inline-flex min-h-tap items-center rounded-full border px-3 text-sm font-semibold ${active ? "border-loam-800 bg-loam-800 text-white" : "border-loam-300 bg-white text-loam-800"}`;
  return (
    <div>
      <p className="label" id={`filter-${name}`}>
        {label}
      </p>
      <ul className="flex flex-wrap gap-1.5" aria-labelledby={`filter-${name}`}>
        {[["", "All"] as [string, string], ...options].map(([value, text]) => {
          const active = (filters[name] ?? "") === value;
          return (
            <li key={value || "all"}>
              <Link href={filterHref(path, filters, name, value || undefined)} className={chip(active)} aria-current={active ? "true" : undefined} scroll={false}>
                {active && <span aria-hidden="true">✓&nbsp;</span>}
                {text}
              </Link>
            </li>
          );
        })}
      </ul>
    </div>
  );
}

/** Filters as plain links: they work without JavaScript and can be shared. */
export function BoardFilterLinks({ path, filters }: { path: string; filters: BoardFilters }) {
  return (
    <details className="card py-1" open={Boolean(filters.status || filters.difficulty || filters.kind)}>
      <summary className="min-h-tap cursor-pointer content-center font-semibold">Filter trails</summary>
      <nav aria-label="Filter trails" className="mt-2 space-y-3">
        <Group path={path} filters={filters} name="status" label="Status" options={STATUS_FILTERS.map((s) => [s, statusLabel(s)])} />
        <Group path={path} filters={filters} name="difficulty" label="Difficulty" options={difficultyValues.map((d) => [d, DIFFICULTIES[d].label])} />
        <Group path={path} filters={filters} name="kind" label="Kind" options={trailKindValues.map((k) => [k, TRAIL_KINDS[k].label])} />
      </nav>
    </details>
  );
}
