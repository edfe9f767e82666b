import { describe, expect, it } from "vitest";
import { designLoadN, estimatePressures, estimateWheel } from "@/lib/pressure/pure/estimate";
import { FRONT_STATIC_SHARE, TARGET_DROP } from "@/lib/pressure/pure/settings";
import { kpaToPsi } from "@/lib/shared/units";
import { parsePressureInput } from "@/lib/pressure/pure";
import { adult, sum, trailWheel29 } from "./fixtures";

const psi = (input: Parameters<typeof adult>[0] = {}) => {
  const e = estimatePressures(parsePressureInput(adult(input)));
  return { front: kpaToPsi(e.frontKpa), rear: kpaToPsi(e.rearKpa) };
};

describe("estimate: calibration (common practice, no published source)", () => {
  it("~70 kg rider + ~15 kg bike, 29 × 2.4\" tubeless trail casing: front high-teens (17–20 psi), rear low-20s (20–24 psi)", () => {
    const { front, rear } = psi();
    expect(front).toBeGreaterThanOrEqual(17);
    expect(front).toBeLessThanOrEqual(20);
    expect(rear).toBeGreaterThanOrEqual(20);
    expect(rear).toBeLessThanOrEqual(24);
  });

  it("same rider on 27.5 × 2.3\" (58-584) still lands high-teens front, low-20s rear", () => {
    const wheel = { ...trailWheel29, bsdMm: 584 as const, widthMm: 58 };
    const { front, rear } = psi({ front: wheel, rear: wheel });
    expect(front).toBeGreaterThanOrEqual(17);
    expect(front).toBeLessThanOrEqual(20.5);
    expect(rear).toBeGreaterThanOrEqual(20);
    expect(rear).toBeLessThanOrEqual(24.5);
  });

  it.each([
    [406, "20\""],
    [507, "24\""],
  ] as const)("~20 kg child + ~9 kg bike on %i (%s) × 2.2\" tubeless, light casing ≈ 10 psi (8–13)", (bsdMm, _label) => {
    const wheel = { bsdMm, widthMm: 56, casing: "light" as const, insert: false, tubeless: true, maxKpa: 240 };
    for (const pace of ["easy", "steady"] as const) {
      const { front, rear } = psi({ riderMassKg: 20, bikeMassKg: 9, pace, front: wheel, rear: wheel });
      for (const value of [front, rear]) {
        expect(value).toBeGreaterThanOrEqual(8);
        expect(value).toBeLessThanOrEqual(13);
      }
    }
  });

  it("heavier riders, tubes, light casings and a hard pace push it up; inserts allow a little less (common practice)", () => {
    const base = psi().front;
    expect(psi({ riderMassKg: 95 }).front).toBeGreaterThan(base);
    expect(psi({ front: { ...trailWheel29, tubeless: false } }).front).toBeGreaterThan(base);
    expect(psi({ front: { ...trailWheel29, casing: "light" } }).front).toBeGreaterThan(base);
    expect(psi({ pace: "hard" }).front).toBeGreaterThan(base);
    const withInsert = psi({ front: { ...trailWheel29, insert: true } }).front;
    expect(withInsert).toBeLessThan(base);
    expect(base - withInsert).toBeLessThan(2); // "a little": under 2 psi
  });
});

describe("estimate: the physical model", () => {
  it("design loads: 40/60 static split (common practice) plus an equal allowance for riding loads", () => {
    expect(FRONT_STATIC_SHARE).toBe(0.4);
    expect(designLoadN(85, "rear") - designLoadN(85, "front")).toBeCloseTo(85 * 9.80665 * 0.2, 9);
    expect(designLoadN(85, "front") + designLoadN(85, "rear")).toBeGreaterThan(85 * 9.80665);
  });

  it("the load part is p = F/A at the target drop: doubling the mass doubles it; the shape part stays", () => {
    const one = estimateWheel(40, "rear", trailWheel29, "steady");
    const two = estimateWheel(80, "rear", trailWheel29, "steady");
    expect(two.loadKpa / one.loadKpa).toBeCloseTo(2, 12);
    expect(two.shapeKpa).toBe(one.shapeKpa);
  });

  it("first-order check (A ≈ F/p): the static drop at the estimate is below the design drop", () => {
    const e = estimateWheel(85, "front", trailWheel29, "steady");
    expect(e.staticDrop).toBeGreaterThan(0.03);
    expect(e.staticDrop).toBeLessThan(TARGET_DROP);
  });

  it("the terms add up to the estimate and each non-zero term has its own reason, in plain tyre sizes", () => {
    const input = parsePressureInput(adult({ pace: "hard", front: { ...trailWheel29, casing: "light", tubeless: false, insert: true } }));
    const e = estimatePressures(input);
    expect(sum(e.reasons.map((r) => r.frontKpa))).toBeCloseTo(e.frontKpa, 9);
    expect(sum(e.reasons.map((r) => r.rearKpa))).toBeCloseTo(e.rearKpa, 9);
    expect(e.reasons.map((r) => r.id)).toEqual(["estimate-load", "estimate-casing", "estimate-pace", "estimate-tubes", "estimate-insert"]);
    expect(e.reasons[0].text).toContain("29 × 2.4 in tyres");
    expect(e.reasons[0].text).not.toMatch(/61-622|Berto/);
    expect(e.reasons[3].rearKpa).toBe(0); // rear is tubeless
  });
});
