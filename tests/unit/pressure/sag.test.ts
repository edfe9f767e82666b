// Sag targets: rear 25–30 % of stroke, fork 15–25 % of travel — common practice, no published
// standard (fork band from memory).
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { checkSag, sagPercent } from "@/lib/pressure/pure/sag";

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
});
