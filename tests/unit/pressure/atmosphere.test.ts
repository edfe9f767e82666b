import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { standardPressurePa, TROPOSPHERE_EXPONENT } from "@/lib/pressure/pure/physics/atmosphere";

// ISO 2533:1975 Standard Atmosphere, Table 5 (geopotential height → pressure in hPa).
const TABLE_5_HPA: Array<[number, number]> = [
  [0, 1013.25],
  [500, 954.608],
  [1000, 898.746],
  [1500, 845.56],
  [2000, 794.952],
  [2500, 746.825],
  [3000, 701.085],
];

describe("ISO 2533:1975 troposphere", () => {
  it("exponent g0·M/(R*·L) ≈ 5.255 88", () => {
    expect(TROPOSPHERE_EXPONENT).toBeCloseTo(5.25588, 5);
  });
  it.each(TABLE_5_HPA)("Table 5: %i m → %f hPa (±0.05 hPa)", (height, hPa) => {
    expect(Math.abs(standardPressurePa(height) / 100 - hPa)).toBeLessThanOrEqual(0.05);
  });
  it("pressure falls with height", () => {
    expect(standardPressurePa(1401)).toBeLessThan(standardPressurePa(1400));
  });
  it("refuses heights outside the troposphere with an AppError", () => {
    expect(() => standardPressurePa(12000)).toThrow(AppError);
    expect(() => standardPressurePa(Number.NaN)).toThrow(AppError);
  });
});
