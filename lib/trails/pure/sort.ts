import { difficultyValues, type TrailSortKey } from "@/lib/trails/pure/schemas";

export type SortableTrail = {
  name: string;
  difficulty: string;
  kind: string;
  lengthM: number;
  descentM: number | null;
  maxGradePct: number | null;
};

const rank = (difficulty: string) => {
  const i = (difficultyValues as readonly string[]).indexOf(difficulty);
  return i < 0 ? difficultyValues.length : i;
};
const byName = (a: SortableTrail, b: SortableTrail) => a.name.localeCompare(b.name, "en", { sensitivity: "base", numeric: true });

/** The value each column sorts by; null (no elevation in the file) always sorts last. */
const KEYS: Record<TrailSortKey, (t: SortableTrail) => number | string | null> = {
  difficulty: (t) => rank(t.difficulty),
  name: (t) => t.name,
  kind: (t) => t.kind,
  length: (t) => t.lengthM,
  descent: (t) => t.descentM,
  grade: (t) => t.maxGradePct,
};

/** The park's trail list in the order a visitor asked for; ties are broken by name. Returns a new array. */
export function sortTrails<T extends SortableTrail>(trails: readonly T[], key: TrailSortKey, dir: "asc" | "desc" = "asc"): T[] {
  const value = KEYS[key];
  const sign = dir === "desc" ? -1 : 1;
  return [...trails].sort((a, b) => {
    const [x, y] = [value(a), value(b)];
    if (x === null || y === null) return x === y ? byName(a, b) : x === null ? 1 : -1;
    const order = typeof x === "string" ? x.localeCompare(y as string, "en", { sensitivity: "base", numeric: true }) : x - (y as number);
    return order !== 0 ? sign * order : byName(a, b);
  });
}
