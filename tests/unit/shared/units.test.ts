import { describe, expect, it } from "vitest";
import {
  barToKpa,
  distanceSystemOf,
  formatDistance,
  formatGrade,
  formatHeight,
  formatLength,
  formatMass,
  formatPressure,
  formatTemperature,
  ftToM,
  inToMm,
  kgToLb,
  kpaFrom,
  kpaTo,
  kpaToBar,
  kpaToPsi,
  lbToKg,
  lengthUnitOf,
  miToM,
  mToFt,
  mToMi,
  mmToIn,
  psiToKpa,
} from "@/lib/shared/units";

const relClose = (actual: number, expected: number, rel = 1e-9) =>
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThan(rel);

describe("NIST SP 811 (2008) Appendix B.8 conversion factors", () => {
  it("psi = 6 894.757 293 168 Pa (exact from the definitions)", () => {
    relClose(psiToKpa(1) * 1000, 6894.757293168);
  });
  it("bar = 100 000 Pa", () => {
    relClose(barToKpa(1), 100);
  });
  it("computed: 2.000 bar = 29.0075 psi", () => {
    expect(kpaToPsi(barToKpa(2))).toBeCloseTo(29.0075, 4);
  });
  it("computed: 29 psi = 199.948 kPa", () => {
    expect(psiToKpa(29)).toBeCloseTo(199.948, 3);
  });
  it("lb = 0.453 592 37 kg exactly (1e-9 relative)", () => {
    relClose(lbToKg(1), 0.45359237);
    relClose(kgToLb(0.45359237), 1);
  });
  it("ft = 0.3048 m and in = 25.4 mm (exact)", () => {
    relClose(ftToM(1), 0.3048);
    relClose(mToFt(1000), 3280.839895013123);
    relClose(inToMm(1), 25.4);
  });
  it("round trips are the identity (kPa ↔ psi ↔ bar)", () => {
    for (const kPa of [0.5, 131, 276, 1000]) {
      relClose(psiToKpa(kpaToPsi(kPa)), kPa);
      relClose(barToKpa(kpaToBar(kPa)), kPa);
      relClose(kpaFrom(kpaTo(kPa, "psi"), "psi"), kPa);
    }
  });
});

describe("ISO 5775 tyre sizes: width in mm ≈ inches × 25.4", () => {
  it("2.4 in ≈ 61 mm, 2.2 in ≈ 56 mm", () => {
    expect(Math.round(inToMm(2.4))).toBe(61);
    expect(Math.round(inToMm(2.2))).toBe(56);
    expect(mmToIn(61)).toBeCloseTo(2.4, 1);
  });
});

describe("formatting helpers", () => {
  it("formats pressure at gauge resolution in each unit", () => {
    expect(formatPressure(psiToKpa(19), "psi")).toBe("19.0 psi");
    expect(formatPressure(131, "bar")).toBe("1.31 bar");
    expect(formatPressure(131.4, "kPa")).toBe("131 kPa");
  });
  it("signs changes with a true minus sign", () => {
    expect(formatPressure(psiToKpa(-1.5), "psi", { signed: true })).toBe("\u22121.5 psi");
    expect(formatPressure(psiToKpa(0.9), "psi", { signed: true })).toBe("+0.9 psi");
  });
  it("formats mass, length and temperature", () => {
    expect(formatMass(72, "kg")).toBe("72.0 kg");
    expect(formatMass(lbToKg(160), "lb")).toBe("160.0 lb");
    expect(formatLength(1400, "m")).toBe("1400 m");
    expect(formatLength(ftToM(4593), "ft")).toBe("4593 ft");
    expect(formatTemperature(6)).toBe("6 °C");
    expect(formatTemperature(-4.5)).toBe("\u22124.5 °C");
  });
});

describe("distances for trails (NIST SP 811 B.8: mile = 1 609.344 m, ft = 0.3048 m, exact)", () => {
  it("mile and foot factors", () => {
    relClose(miToM(1), 1609.344);
    relClose(mToMi(1609.344 * 2.5), 2.5);
    relClose(mToFt(1609.344), 5280); // 1 mile = 5280 ft, both exact
  });
  it("metric lengths stay in metres below a kilometre", () => {
    expect(formatDistance(740.4, "metric")).toBe("740 m");
    expect(formatDistance(999.4, "metric")).toBe("999 m");
    expect(formatDistance(999.6, "metric")).toBe("1.00 km");
    expect(formatDistance(2413, "metric")).toBe("2.41 km");
    expect(formatDistance(12_345, "metric")).toBe("12.3 km");
  });
  it("imperial lengths in feet below 1000 ft, then miles", () => {
    expect(formatDistance(250, "imperial")).toBe("820 ft"); // 250 / 0.3048 = 820.2
    expect(formatDistance(2000, "imperial")).toBe("1.24 mi"); // 2000 / 1609.344 = 1.2427
    expect(formatDistance(miToM(12.34), "imperial")).toBe("12.3 mi");
  });
  it("heights and grades", () => {
    expect(formatHeight(412.3, "metric")).toBe("412 m");
    expect(formatHeight(412.3, "imperial")).toBe("1353 ft"); // 412.3 / 0.3048 = 1352.7
    expect(formatGrade(8.44)).toBe("8.4 %");
  });
  it("reads a missing or unknown preference as metric", () => {
    expect(distanceSystemOf(undefined)).toBe("metric");
    expect(distanceSystemOf("furlongs")).toBe("metric");
    expect(distanceSystemOf("imperial")).toBe("imperial");
    expect(lengthUnitOf("imperial")).toBe("ft");
  });
});
