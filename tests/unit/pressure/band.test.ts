// Band and limits. Floor drops and band widths are common practice, no published source.
import { describe, expect, it } from "vitest";
import { bandEdges, ceilingKpa, floorKpa, limitTarget } from "@/lib/pressure/pure/band";
import { estimateWheel } from "@/lib/pressure/pure/estimate";
import { WHEEL_FLOOR_KPA } from "@/lib/pressure/pure/settings";
import { computePressureBand } from "@/lib/pressure/pure";
import { kpaToPsi, psiToKpa } from "@/lib/shared/units";
import { adult, trailWheel29, withBaseline } from "./fixtures";

describe("limits", () => {
  it("the ceiling is the lower of the tyre's and the rim's printed maximum", () => {
    expect(ceilingKpa({ ...trailWheel29, maxKpa: 276 })).toBe(276);
    expect(ceilingKpa({ ...trailWheel29, maxKpa: 276, rimMaxKpa: 207 })).toBe(207);
    expect(ceilingKpa({ ...trailWheel29, maxKpa: 200, rimMaxKpa: 300 })).toBe(200);
  });

  it("the floor sits below the estimate, higher with tubes, lower with an insert (common practice)", () => {
    const estimate = estimateWheel(85, "front", trailWheel29, "steady").totalKpa;
    const tubeless = floorKpa(85, "front", trailWheel29);
    expect(tubeless).toBeLessThan(estimate);
    expect(kpaToPsi(tubeless)).toBeGreaterThan(12); // a 70 kg rider at 12 psi on 2.4" would strike rims
    expect(floorKpa(85, "front", { ...trailWheel29, tubeless: false })).toBeGreaterThan(tubeless);
    expect(floorKpa(85, "front", { ...trailWheel29, insert: true })).toBeLessThan(tubeless);
    expect(floorKpa(3, "front", trailWheel29)).toBe(WHEEL_FLOOR_KPA[622]);
  });

  it("the floor by wheel size rises for small wheels (trade judgement), and a printed minimum lifts it", () => {
    const small = { ...trailWheel29, bsdMm: 406 as const };
    expect(floorKpa(3, "front", small)).toBeGreaterThan(floorKpa(3, "front", trailWheel29));
    expect(floorKpa(3, "front", { ...trailWheel29, minKpa: 150 })).toBe(150);
  });

  it("the floor takes the worst planned trail: a rock garden lifts it, and flow trails beside it do not lower it", () => {
    const low = { frontKpa: psiToKpa(6), rearKpa: psiToKpa(23), surfaces: ["dry" as const] };
    const flow = ["A", "B", "C", "D", "E"].map((name) => ({ name, surfaces: ["dry" as const], features: [] }));
    const rock = { name: "Basalt Chute", surfaces: ["dry" as const], features: ["rock-garden" as const] };
    const plain = computePressureBand(withBaseline({ baseline: low, today: { trails: flow } }));
    const alone = computePressureBand(withBaseline({ baseline: low, today: { trails: [rock] } }));
    const mixed = computePressureBand(withBaseline({ baseline: low, today: { trails: [rock, ...flow] } }));
    expect(alone.front.targetKpa).toBeGreaterThan(plain.front.targetKpa);
    expect(mixed.front.targetKpa).toBeCloseTo(alone.front.targetKpa, 6);
    expect(mixed.reasons.find((r) => r.id === "limit-floor")?.text).toContain("(higher for the rock garden on Basalt Chute)");
    expect(floorKpa(85, "front", trailWheel29, true)).toBeGreaterThan(floorKpa(85, "front", trailWheel29));
  });

  it("limitTarget reports which limit binds, and the max always wins", () => {
    expect(limitTarget(150, { floorKpa: 100, maxKpa: 200 })).toEqual({ targetKpa: 150, adjustmentKpa: 0, binding: "none" });
    expect(limitTarget(90, { floorKpa: 100, maxKpa: 200 })).toMatchObject({ targetKpa: 100, adjustmentKpa: 10, binding: "floor" });
    expect(limitTarget(230, { floorKpa: 100, maxKpa: 200 })).toMatchObject({ targetKpa: 200, adjustmentKpa: -30, binding: "max" });
    expect(limitTarget(150, { floorKpa: 250, maxKpa: 200 })).toMatchObject({ targetKpa: 200, binding: "floor-above-max" });
  });

  it("band edges stay ordered and inside the limits", () => {
    const edges = bandEdges(198, { floorKpa: 100, maxKpa: 200 }, 5);
    expect(edges.highKpa).toBe(200);
    expect(edges.highAtMax).toBe(true);
    const low = bandEdges(101, { floorKpa: 100, maxKpa: 200 }, 8);
    expect(low.lowKpa).toBe(100);
    expect(low.lowAtFloor).toBe(true);
    expect(bandEdges(150, { floorKpa: 100, maxKpa: 200 }, 8)).toMatchObject({ lowKpa: 142, highKpa: 158 });
  });
});

describe("limits in the engine, with cautions", () => {
  it("a baseline above the printed maximum is held at the maximum, with a reason and a caution", () => {
    const r = computePressureBand(withBaseline({ baseline: { frontKpa: 250, rearKpa: 290, surfaces: ["dry"] } }));
    expect(r.rear.targetKpa).toBe(276);
    expect(r.rear.highKpa).toBe(276);
    expect(r.reasons.find((x) => x.id === "limit-max")?.rearKpa).toBeCloseTo(-14, 1);
    expect(r.cautions.some((c) => c.startsWith("Rear: the band is capped at the printed maximum of 40.0 psi"))).toBe(true);
  });

  it("a baseline below the floor is lifted to it, with a reason and a caution", () => {
    const r = computePressureBand(withBaseline({ baseline: { frontKpa: psiToKpa(8), rearKpa: psiToKpa(23), surfaces: ["dry"] } }));
    const floor = floorKpa(85, "front", trailWheel29);
    expect(r.front.targetKpa).toBeCloseTo(floor, 1);
    expect(r.front.lowKpa).toBeCloseTo(floor, 1);
    expect(r.reasons.find((x) => x.id === "limit-floor")?.frontKpa).toBeGreaterThan(0);
    expect(r.cautions.some((c) => c.startsWith("Front: the target was held at"))).toBe(true);
  });

  it("when the load needs more than the maximum allows, everything sits at the maximum with a caution", () => {
    const weak = { ...trailWheel29, maxKpa: 110 };
    const r = computePressureBand(adult({ riderMassKg: 150, bikeMassKg: 30, front: weak, rear: weak }));
    for (const w of [r.front, r.rear]) {
      expect([w.lowKpa, w.targetKpa, w.highKpa]).toEqual([110, 110, 110]);
    }
    expect(r.cautions.filter((c) => c.includes("above the printed maximum")).length).toBe(2);
  });
});
