/** Filtering the board's trails; free of zod so the board's client code stays small. */
import type { BoardFilters } from "./board-filters";

type Filterable = { difficulty: string; kind: string; effectiveStatus: string | null };

export function filterTrails<T extends Filterable>(trails: T[], filters: BoardFilters): T[] {
  return trails.filter(
    (t) =>
      (!filters.status || (filters.status === "not-inspected" ? t.effectiveStatus === null : t.effectiveStatus === filters.status)) &&
      (!filters.difficulty || t.difficulty === filters.difficulty) &&
      (!filters.kind || t.kind === filters.kind),
  );
}
