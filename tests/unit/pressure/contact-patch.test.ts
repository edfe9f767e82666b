import { describe, expect, it } from "vitest";
import { contactPatchAreaM2, patchAreaAtDropM2, pressureForPatchKpa, weightN } from "@/lib/pressure/pure/physics/contact-patch";

describe("contact patch A ≈ F/p (Wilson & Papadopoulos, Bicycling Science 3rd ed. — from memory; Renart & Roura-Grabulosa, Am. J. Phys. 87, 2019)", () => {
  it("computed: 400 N at 150 kPa → 26.7 cm²", () => {
    expect(contactPatchAreaM2(400, 150) * 1e4).toBeCloseTo(26.7, 1);
  });
  it("p = F/A inverts it", () => {
    expect(pressureForPatchKpa(400, contactPatchAreaM2(400, 150))).toBeCloseTo(150, 9);
  });
  it("weight uses standard gravity 9.806 65 m/s² (ISO 2533 / CGPM)", () => {
    expect(weightN(100)).toBeCloseTo(980.665, 9);
  });
});

describe("target patch geometry (our own model, see docs/pressure-rules.md)", () => {
  it("A = π·√(D·W)·δ with D = BSD + 2W and δ = drop × W", () => {
    // 61-622 tyre at 15 % drop: D = 0.744 m, W = 0.061 m, δ = 9.15 mm.
    const expected = Math.PI * Math.sqrt(0.744 * 0.061) * 0.15 * 0.061;
    expect(patchAreaAtDropM2(622, 61, 0.15)).toBeCloseTo(expected, 12);
  });
  it("grows with width, diameter and drop", () => {
    expect(patchAreaAtDropM2(622, 66, 0.15)).toBeGreaterThan(patchAreaAtDropM2(622, 61, 0.15));
    expect(patchAreaAtDropM2(622, 61, 0.15)).toBeGreaterThan(patchAreaAtDropM2(584, 61, 0.15));
    expect(patchAreaAtDropM2(622, 61, 0.2)).toBeGreaterThan(patchAreaAtDropM2(622, 61, 0.15));
  });
});
