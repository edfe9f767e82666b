// Ride-log feedback: one change at a time, safety first (common practice, no published source).
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { FEEDBACK_RULES, suggestBaselineChange } from "@/lib/pressure/pure/feedback";

describe("suggestBaselineChange", () => {
  it("documents the priority order: rim strike, burp, squirm, sliding, harsh", () => {
    expect(FEEDBACK_RULES.map((r) => r.symptom)).toEqual(["rim-strike", "burp", "squirm-in-berms", "sliding", "harsh"]);
  });

  it("a rim strike on the rear beats a harsh front; the step is a share of the pressure run", () => {
    const s = suggestBaselineChange({ front: ["harsh"], rear: ["rim-strike"] }, { limits: { front: { currentKpa: 130, maxKpa: 276 }, rear: { currentKpa: 150, maxKpa: 276 } } });
    expect(s).toMatchObject({ wheel: "rear", symptom: "rim-strike" });
    expect(s.deltaKpa).toBeCloseTo(0.07 * 150, 9);
    expect(s.proposedKpa?.rearKpa).toBeCloseTo(150 * 1.07, 9);
    expect(s.reason).toMatch(/^Rear rim strike: \+1\.5 psi rear from what you ran/);
  });

  it("a child and a heavy rider get proportionate steps", () => {
    const step = (currentKpa: number) => suggestBaselineChange({ front: ["rim-strike"], rear: [] }, { limits: { front: { currentKpa, maxKpa: 400 }, rear: { currentKpa, maxKpa: 400 } } }).deltaKpa;
    expect(step(180) / step(70)).toBeCloseTo(180 / 70, 9);
  });

  it("a rim strike on both wheels raises both", () => {
    const s = suggestBaselineChange({ front: ["rim-strike"], rear: ["rim-strike"] }, { limits: { front: { currentKpa: 130, maxKpa: 276 }, rear: { currentKpa: 150, maxKpa: 276 } } });
    expect(s.wheel).toBe("both");
    expect(s.deltas?.frontKpa).toBeGreaterThan(0);
    expect(s.deltas?.rearKpa).toBeGreaterThan(0);
    expect(s.reason).toMatch(/^Both wheels rim strike: \+\d\.\d psi front, \+\d\.\d psi rear/);
  });

  it("sliding on a wet day does not lower a dry baseline; on dry ground it does", () => {
    const wet = suggestBaselineChange({ front: ["sliding"], rear: [] }, { surfaces: ["wet"], referenceSurfaces: ["dry"] });
    expect(wet.deltaKpa).toBe(0);
    expect(wet.reason).toContain("is the ground, not the baseline");
    const dry = suggestBaselineChange({ front: ["sliding"], rear: [] }, { surfaces: ["dry"], referenceSurfaces: ["dry"] });
    expect(dry.deltaKpa).toBeLessThan(0);
    const wetAndHarsh = suggestBaselineChange({ front: ["sliding"], rear: ["harsh"] }, { surfaces: ["wet"], referenceSurfaces: ["dry"] });
    expect(wetAndHarsh).toMatchObject({ wheel: "rear", symptom: "harsh" });
  });

  it("a burp beats squirm; on a tie the front goes first", () => {
    expect(suggestBaselineChange({ front: ["squirm-in-berms"], rear: ["burp"] })).toMatchObject({ wheel: "rear", symptom: "burp" });
    expect(suggestBaselineChange({ front: ["sliding"], rear: ["sliding"] })).toMatchObject({ wheel: "front" });
  });

  it("comfort and grip symptoms lower pressure", () => {
    expect(suggestBaselineChange({ front: ["fine"], rear: ["harsh"] }).deltaKpa).toBeLessThan(0);
  });

  it("all fine: no change", () => {
    expect(suggestBaselineChange({ front: ["fine"], rear: [] })).toEqual({
      wheel: null, symptom: null, deltaKpa: 0, reason: "Both tyres felt fine: keep the baseline as it is.",
    });
  });

  it("never suggests going past the printed maximum or below the floor", () => {
    const atMax = suggestBaselineChange(
      { front: [], rear: ["rim-strike"] },
      { limits: { front: { currentKpa: 130, maxKpa: 276 }, rear: { currentKpa: 276, maxKpa: 276 } } },
    );
    expect(atMax.deltaKpa).toBe(0);
    expect(atMax.reason).toContain("do not add air");
    const nearMax = suggestBaselineChange({ front: ["burp"], rear: [] }, { limits: { front: { currentKpa: 272, maxKpa: 276 }, rear: { currentKpa: 200, maxKpa: 276 } } });
    expect(nearMax.deltaKpa).toBeCloseTo(4, 9);
    const atFloor = suggestBaselineChange({ front: ["harsh"], rear: [] }, { limits: { front: { currentKpa: 100, maxKpa: 276, floorKpa: 100 }, rear: { currentKpa: 150, maxKpa: 276 } } });
    expect(atFloor.deltaKpa).toBe(0);
  });

  it("refuses unknown symptoms with an AppError", () => {
    expect(() => suggestBaselineChange({ front: ["wobbly"], rear: [] })).toThrow(AppError);
  });
});
