/**
 * The board's filters live in the URL (?status=&difficulty=&kind=), so they work as plain
 * links without JavaScript. Unknown values are ignored rather than refused: a stale link
 * still shows the board.
 */
import { difficultyValues, trailKindValues } from "@/lib/trails/pure/schemas";
import { STATUSES } from "@/lib/conditions/pure/schemas";

export const STATUS_FILTERS = [...STATUSES, "not-inspected"] as const;
export type BoardFilters = {
  status?: (typeof STATUS_FILTERS)[number];
  difficulty?: (typeof difficultyValues)[number];
  kind?: (typeof trailKindValues)[number];
};
export type FilterKey = keyof BoardFilters;

type SearchParams = Record<string, string | string[] | undefined>;
const pick = <T extends string>(allowed: readonly T[], raw: string | string[] | undefined): T | undefined => {
  const value = Array.isArray(raw) ? raw[0] : raw;
  return allowed.includes(value as T) ? (value as T) : undefined;
};

export function parseBoardFilters(params: SearchParams): BoardFilters {
  return {
    status: pick(STATUS_FILTERS, params.status),
    difficulty: pick(difficultyValues, params.difficulty),
    kind: pick(trailKindValues, params.kind),
  };
}

/** The link that sets one filter (or clears it with undefined) and keeps the others. */
export function filterHref(path: string, current: BoardFilters, key: FilterKey, value: string | undefined): string {
  const next = new URLSearchParams();
  for (const k of ["status", "difficulty", "kind"] as const) {
    const v = k === key ? value : current[k];
    if (v) next.set(k, v);
  }
  const query = next.toString();
  return query ? `${path}?${query}` : path;
}
