// Ride-log feedback: one change at a time, safety first (common practice, no published source).
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { FEEDBACK_RULES, suggestBaselineChange } from "@/lib/pressure/pure/feedback";

describe("suggestBaselineChange", () => {
  it("documents the priority order: rim strike, burp, squirm, sliding, harsh", () => {
    expect(FEEDBACK_RULES.map((r) => r.symptom)).toEqual(["rim-strike", "burp", "squirm-in-berms", "sliding", "harsh"]);
  });

  it("a rim strike on the rear beats a harsh front", () => {
    const s = suggestBaselineChange({ front: ["harsh"], rear: ["rim-strike"] });
    expect(s).toMatchObject({ wheel: "rear", symptom: "rim-strike", deltaKpa: 10 });
    expect(s.reason).toMatch(/^Rear rim strike: \+1\.5 psi rear/);
  });

  it("a burp beats squirm; on a tie the front goes first", () => {
    expect(suggestBaselineChange({ front: ["squirm-in-berms"], rear: ["burp"] })).toMatchObject({ wheel: "rear", symptom: "burp" });
    expect(suggestBaselineChange({ front: ["sliding"], rear: ["sliding"] })).toMatchObject({ wheel: "front", deltaKpa: -5 });
  });

  it("comfort and grip symptoms lower pressure", () => {
    expect(suggestBaselineChange({ front: ["fine"], rear: ["harsh"] })).toMatchObject({ wheel: "rear", deltaKpa: -5 });
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
    expect(nearMax.deltaKpa).toBe(4);
    const atFloor = suggestBaselineChange({ front: ["harsh"], rear: [] }, { limits: { front: { currentKpa: 100, maxKpa: 276, floorKpa: 100 }, rear: { currentKpa: 150, maxKpa: 276 } } });
    expect(atFloor.deltaKpa).toBe(0);
  });

  it("refuses unknown symptoms with an AppError", () => {
    expect(() => suggestBaselineChange({ front: ["wobbly"], rear: [] })).toThrow(AppError);
  });
});
