// Sag targets: rear 25–30 % of stroke, fork 15–25 % of travel; below 10 % or above 45 % a reading
// is a misread: measure again — common practice, no published standard.
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { checkSag, SAG_PLAUSIBLE_PERCENT, sagPercent } from "@/lib/pressure/pure/sag";

describe("sag", () => {
  it("sag % = sag ÷ stroke", () => {
    expect(sagPercent(16, 60)).toBeCloseTo(26.667, 3);
    expect(sagPercent(30, 150)).toBe(20);
  });

  it("rear: 16 mm of a 60 mm stroke is in range; 12 mm too little; 20 mm too much", () => {
    expect(checkSag({ end: "rear", sagMm: 16, strokeMm: 60 }).verdict).toBe("in-range");
    expect(checkSag({ end: "rear", sagMm: 12, strokeMm: 60 }).verdict).toBe("too-little");
    const much = checkSag({ end: "rear", sagMm: 20, strokeMm: 60 });
    expect(much.verdict).toBe("too-much");
    expect(much.text).toContain("firm up the shock spring");
    expect(much.cautions.length).toBeGreaterThan(0);
  });

  it("fork: 15–25 % of travel", () => {
    expect(checkSag({ end: "fork", sagMm: 30, strokeMm: 160 }).verdict).toBe("in-range");
    expect(checkSag({ end: "fork", sagMm: 45, strokeMm: 160 }).verdict).toBe("too-much");
    expect(checkSag({ end: "fork", sagMm: 20, strokeMm: 160 }).verdict).toBe("too-little");
  });

  it("refuses sag larger than the stroke", () => {
    expect(() => checkSag({ end: "rear", sagMm: 70, strokeMm: 60 })).toThrow(AppError);
  });

  it("compares the unrounded value and shows one decimal: 24.5 % is below 25–30 %, 25.0 % is inside", () => {
    const below = checkSag({ end: "rear", sagMm: 14.7, strokeMm: 60 });
    expect(below.verdict).toBe("too-little");
    expect(below.text).toMatch(/^Sag 24\.5 % is below the usual 25–30 %/);
    expect(checkSag({ end: "rear", sagMm: 15, strokeMm: 60 }).verdict).toBe("in-range");
    expect(checkSag({ end: "rear", sagMm: 18, strokeMm: 60 }).verdict).toBe("in-range"); // exactly 30 %
    expect(checkSag({ end: "rear", sagMm: 18.03, strokeMm: 60 }).verdict).toBe("too-much"); // 30.05 %
  });

  it(`below ${SAG_PLAUSIBLE_PERCENT.min} % or above ${SAG_PLAUSIBLE_PERCENT.max} % (0 % and 100 % too) says "measure again", with how`, () => {
    for (const sagMm of [0, 5.9, 27.1, 60]) {
      const r = checkSag({ end: "rear", sagMm, strokeMm: 60 });
      expect(r.verdict).toBe("measure-again");
      expect(r.text).toContain("measure again");
      expect(r.text).toContain("O-ring");
    }
    expect(checkSag({ end: "rear", sagMm: 6, strokeMm: 60 }).verdict).toBe("too-little"); // exactly 10 %
    expect(checkSag({ end: "fork", sagMm: 72, strokeMm: 160 }).verdict).toBe("too-much"); // exactly 45 %
  });
});
