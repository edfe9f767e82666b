import { describe, expect, it } from "vitest";
import { sortTrails, type SortableTrail } from "@/lib/trails/pure/sort";
import { trailListQuerySchema } from "@/lib/trails/pure/schemas";

const trail = (name: string, difficulty: string, lengthM: number, descentM: number | null, maxGradePct: number | null, kind = "flow"): SortableTrail => ({
  name,
  difficulty,
  kind,
  lengthM,
  descentM,
  maxGradePct,
});

const list = [
  trail("Plumbline", "extreme", 900, 320, 41),
  trail("Cedar Skip", "easy", 2400, 180, 11, "jump"),
  trail("Flatland", "easiest", 1200, null, null),
  trail("Tumblewire", "intermediate", 1800, 260, 18),
  trail("Basalt Chute", "difficult", 1100, 300, 30, "downhill"),
];
const names = (rows: SortableTrail[]) => rows.map((t) => t.name);

describe("sortTrails", () => {
  it("sorts by difficulty on the trade's scale, easiest first, and reverses", () => {
    expect(names(sortTrails(list, "difficulty"))).toEqual(["Flatland", "Cedar Skip", "Tumblewire", "Basalt Chute", "Plumbline"]);
    expect(names(sortTrails(list, "difficulty", "desc"))).toEqual(["Plumbline", "Basalt Chute", "Tumblewire", "Cedar Skip", "Flatland"]);
  });

  it("sorts numbers numerically and puts trails without elevation last in both directions", () => {
    expect(names(sortTrails(list, "length"))).toEqual(["Plumbline", "Basalt Chute", "Flatland", "Tumblewire", "Cedar Skip"]);
    expect(names(sortTrails(list, "descent", "desc"))).toEqual(["Plumbline", "Basalt Chute", "Tumblewire", "Cedar Skip", "Flatland"]);
    expect(names(sortTrails(list, "grade", "asc")).at(-1)).toBe("Flatland");
  });

  it("sorts text without regard to case and breaks ties by name", () => {
    const rows = [trail("b", "easy", 1, 1, 1), trail("A", "easy", 1, 1, 1), trail("c", "easy", 1, 1, 1, "climb")];
    expect(names(sortTrails(rows, "name"))).toEqual(["A", "b", "c"]);
    expect(names(sortTrails(rows, "kind"))).toEqual(["c", "A", "b"]);
    expect(names(sortTrails(rows, "difficulty", "desc"))).toEqual(["A", "b", "c"]);
  });

  it("leaves its input untouched", () => {
    const before = names(list);
    sortTrails(list, "name");
    expect(names(list)).toEqual(before);
  });
});

describe("trail list query", () => {
  it("falls back to difficulty, ascending, for anything unknown", () => {
    expect(trailListQuerySchema.parse({})).toEqual({ sort: "difficulty", dir: "asc" });
    expect(trailListQuerySchema.parse({ sort: "'; drop table", dir: "sideways" })).toEqual({ sort: "difficulty", dir: "asc" });
    expect(trailListQuerySchema.parse({ sort: "grade", dir: "desc" })).toEqual({ sort: "grade", dir: "desc" });
  });
});
