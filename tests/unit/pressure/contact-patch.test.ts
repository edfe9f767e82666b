import { describe, expect, it } from "vitest";
import { contactPatchAreaM2, dropAtPressure, PATCH_SPREAD, patchAreaAtDropM2, pressureForPatchKpa, weightN } from "@/lib/pressure/pure/physics/contact-patch";

describe("contact patch A ≈ F/p, first order (Renart & Roura-Grabulosa, Am. J. Phys. 87:102–109, 2019)", () => {
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

describe("footprint F ∝ p·d^(3/2) (power law of Renart & Roura-Grabulosa 2019; spread factor our calibration)", () => {
  it("A = (4/3)·PATCH_SPREAD·√D·d^(3/2) with D = BSD + 2W and d = drop × W", () => {
    // 61-622 tyre at 15 % drop: D = 0.744 m, d = 9.15 mm.
    const expected = (4 / 3) * PATCH_SPREAD * Math.sqrt(0.744) * (0.15 * 0.061) ** 1.5;
    expect(patchAreaAtDropM2(622, 61, 0.15)).toBeCloseTo(expected, 12);
  });
  it("doubling the deflection multiplies the load carried at one pressure by 2^(3/2)", () => {
    expect(patchAreaAtDropM2(622, 61, 0.2) / patchAreaAtDropM2(622, 61, 0.1)).toBeCloseTo(2 ** 1.5, 12);
  });
  it("dropAtPressure inverts it: the load at that drop and pressure balances", () => {
    const area = patchAreaAtDropM2(584, 58, 0.12);
    expect(dropAtPressure(584, 58, area * 150 * 1000, 150)).toBeCloseTo(0.12, 12);
  });
  it("grows with width, diameter and drop", () => {
    expect(patchAreaAtDropM2(622, 66, 0.15)).toBeGreaterThan(patchAreaAtDropM2(622, 61, 0.15));
    expect(patchAreaAtDropM2(622, 61, 0.15)).toBeGreaterThan(patchAreaAtDropM2(584, 61, 0.15));
    expect(patchAreaAtDropM2(622, 61, 0.2)).toBeGreaterThan(patchAreaAtDropM2(622, 61, 0.15));
  });
});
