import { describe, expect, it } from "vitest";
import { computeTrailStats, DIFFICULTIES, suggestedDifficulty } from "@/lib/trails/pure";
import { difficultyValues, trailKindValues } from "@/lib/trails/pure/schemas";
import { difficultyLabel, directionLabel, kindLabel, TRAIL_KINDS } from "@/lib/trails/pure/vocabulary";
import { meridianLine } from "./helpers";

// Source: IMBA Trail Difficulty Rating System (IMBA, Trail Solutions, 2004), as summarised in
// shared/notes/references.md: average grade white < 5 %, green ≤ 5 %, blue ≤ 10 %, black ≤ 15 %;
// maximum grade white 10 %, green 15 %, blue and black ≥ 15 %.
const rate = (avgGradePct: number | null, maxGradePct: number | null) => suggestedDifficulty({ avgGradePct, maxGradePct });

describe("suggested difficulty from IMBA grade thresholds", () => {
  it.each([
    [4.9, 10, "easiest"], // white: average under 5 %, maximum 10 %
    [5, 10, "easy"], // green: average ≤ 5 % (white needs < 5 %)
    [3, 10.1, "easy"], // green: maximum up to 15 %
    [5, 15, "easy"],
    [4, 15.1, "intermediate"], // a gentle average with a pitch above 15 % is not green
    [10, 25, "intermediate"], // blue: average ≤ 10 %
    [10.01, 20, "difficult"], // black: average ≤ 15 %
    [15, 30, "difficult"],
    [15.01, 30, "extreme"], // above the black diamond's average limit
  ] as const)("average %s %% and maximum %s %% → %s", (avg, max, expected) => {
    expect(rate(avg, max)).toBe(expected);
  });

  it("gives no suggestion without elevation", () => {
    expect(rate(null, null)).toBeNull();
    expect(suggestedDifficulty(computeTrailStats([meridianLine(5, 10)]))).toBeNull();
  });

  it("rates IMBA's sustainable-grade example (1000 ft over 2 miles, 9.4 %) as a blue square", () => {
    const run = 3218.688;
    const stats = computeTrailStats([meridianLine(322, run / 321, (_, d) => 1000 + (304.8 * d) / run)]);
    expect(suggestedDifficulty(stats)).toBe("intermediate");
  });
});

describe("the trade's difficulty symbols", () => {
  it("has one entry per difficulty, in order, with the circle/square/diamond symbols", () => {
    expect(Object.keys(DIFFICULTIES)).toEqual([...difficultyValues]);
    expect(Object.values(DIFFICULTIES).map((d) => d.symbol)).toEqual(["circle", "circle", "square", "diamond", "double-diamond"]);
    expect(Object.values(DIFFICULTIES).map((d) => d.colourName)).toEqual(["white", "green", "blue", "black", "black"]);
    for (const d of Object.values(DIFFICULTIES)) expect(d.colour).toMatch(/^#[0-9a-f]{6}$/);
    expect(DIFFICULTIES.easiest.outline).not.toBeNull(); // a white line needs an outline on a light map
  });
});

describe("one vocabulary for difficulty and kind", () => {
  // IMBA Trail Difficulty Rating System (Trail Solutions, 2004): the five signs and their words.
  it("names every grade and sign apart, the two black grades included", () => {
    expect(Object.values(DIFFICULTIES).map((d) => d.label)).toEqual(["Easiest", "Easy", "More difficult", "Very difficult", "Extremely difficult"]);
    expect(Object.values(DIFFICULTIES).map((d) => d.signName)).toEqual(["white circle", "green circle", "blue square", "black diamond", "double black diamond"]);
    expect(difficultyLabel("extreme")).toBe("Extremely difficult");
    expect(difficultyLabel("mystery")).toBe("mystery");
  });

  it("has one label for every trail kind, and words the direction apart from the kind", () => {
    expect(Object.keys(TRAIL_KINDS)).toEqual([...trailKindValues]);
    expect(new Set(Object.values(TRAIL_KINDS).map((k) => k.label)).size).toBe(trailKindValues.length);
    expect(kindLabel("downhill")).toBe("Downhill");
    expect(directionLabel("downhill")).toBe("Ridden downhill");
  });
});
