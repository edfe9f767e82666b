// The starting estimate against the common-practice anchor points (common practice, no published
// source: lib/pressure/pure/anchors.ts), across riders of 20–130 kg, every wheel size and casing.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { ANCHORS, calibrationGrid, rangeFor } from "@/lib/pressure/pure/anchors";
import { gridLine, gridMarkdown, gridResults } from "@/lib/pressure/pure/grid-report";
import { computePressureBand } from "@/lib/pressure/pure";
import { kpaToPsi, psiToKpa } from "@/lib/shared/units";
import { adult, trailWheel29 } from "./fixtures";

const psi = (input: Parameters<typeof adult>[0]) => {
  const r = computePressureBand(adult(input));
  return { front: kpaToPsi(r.front.targetKpa), rear: kpaToPsi(r.rear.targetKpa) };
};
const within = (value: number, [lo, hi]: readonly [number, number]) => {
  expect(value).toBeGreaterThanOrEqual(lo);
  expect(value).toBeLessThanOrEqual(hi);
};

describe("anchor points (common practice, no published source)", () => {
  it("~70 kg rider, 29 × 2.4 front / 2.3 rear tubeless trail tyres: 17–20 psi front, 21–25 psi rear", () => {
    const r = psi({ riderMassKg: 70, bikeMassKg: 15, rear: { ...trailWheel29, widthMm: 58 } });
    within(r.front, ANCHORS[1].front);
    within(r.rear, ANCHORS[1].rear);
  });

  it("~100 kg rider on heavy casings with inserts: 22–24 psi front, 25–27 psi rear", () => {
    for (const casing of ["downhill", "reinforced"] as const) {
      const heavy = { ...trailWheel29, casing, insert: true };
      const r = psi({ riderMassKg: 100, bikeMassKg: 17, front: heavy, rear: heavy });
      within(r.front, ANCHORS[2].front);
      within(r.rear, ANCHORS[2].rear);
    }
  });

  it("~20 kg child on 20″ and 24″ × 2.4 tubeless: around 10 psi; on 20 × 2.0 with tubes a few psi above", () => {
    for (const bsdMm of [406, 507] as const) {
      const kid = { ...trailWheel29, bsdMm, maxKpa: 240 };
      const r = psi({ riderMassKg: 20, bikeMassKg: 9, front: kid, rear: kid });
      within(r.front, [8, 12]);
      within(r.rear, [8, 12.5]);
    }
    const tubes = { ...trailWheel29, bsdMm: 406 as const, widthMm: 51, tubeless: false, maxKpa: 240 };
    const t = psi({ riderMassKg: 20, bikeMassKg: 9, front: tubes, rear: tubes });
    within(t.front, [8, 15]);
    within(t.rear, [8, 15.5]);
  });

  it("rear above front on equal tyres by about 2–4 psi for adults of 70 kg and up; less, but above, for lighter riders", () => {
    for (const riderMassKg of [70, 85, 100, 115]) within(psi({ riderMassKg }).rear - psi({ riderMassKg }).front, [2, 4]);
    for (const riderMassKg of [20, 40, 55]) within(psi({ riderMassKg }).rear - psi({ riderMassKg }).front, [0.3, 2.5]);
  });

  it("the interpolated range passes through every anchor", () => {
    for (const a of ANCHORS) {
      expect(rangeFor(a.riderKg, "front")[0]).toBeCloseTo(a.front[0], 9);
      expect(rangeFor(a.riderKg, "rear")[1]).toBeCloseTo(a.rear[1], 9);
    }
  });
});

describe("the grid: riders of 20–130 kg, every wheel size and casing", () => {
  const results = gridResults();

  it("covers 20–130 kg, every wheel size and every casing", () => {
    const rows = calibrationGrid();
    const masses = rows.map((r) => r.input.riderMassKg as number);
    expect(Math.min(...masses)).toBe(20);
    expect(Math.max(...masses)).toBe(130);
    expect(new Set(rows.map((r) => (r.input.front as { bsdMm: number }).bsdMm))).toEqual(new Set([406, 507, 559, 584, 622]));
    expect(new Set(rows.map((r) => (r.input.front as { casing: string }).casing)).size).toBe(4);
  });

  it("every grid rider lands inside the common-practice range", () => {
    const outside = results.filter((r) => !r.inside).map(gridLine);
    expect(outside).toEqual([]);
  });

  it("docs/pressure-grid.md is the script's current output (npm run docs:pressure-grid)", () => {
    expect(readFileSync("docs/pressure-grid.md", "utf8")).toBe(gridMarkdown(results));
  });
});

describe("first-order check: contact patch ≈ load / pressure", () => {
  it("the estimate's static patch is the static wheel load over the pressure, in a plausible size", () => {
    const r = computePressureBand(adult());
    const loadN = 85 * 9.80665 * 0.4;
    const areaCm2 = (loadN / (r.front.targetKpa * 1000)) * 1e4;
    // A 2.4″ front tyre at about 18 psi carries ~330 N on roughly 25 cm² (≈ 8 × 4 cm).
    expect(areaCm2).toBeGreaterThan(15);
    expect(areaCm2).toBeLessThan(35);
    expect(r.front.targetKpa).toBeGreaterThan(psiToKpa(15));
  });
});
