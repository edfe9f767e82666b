import { describe, expect, it } from "vitest";
import {
  absoluteToGauge,
  gaugeAfterElevationChange,
  gaugeAfterTemperatureChange,
  gaugeAtConditions,
  gaugeToAbsolute,
} from "@/lib/pressure/pure/physics/gas";
import { standardPressureKpa } from "@/lib/pressure/pure/physics/atmosphere";
import { celsiusToKelvin, KPA_PER_ATM, kpaToPsi, psiToKpa } from "@/lib/shared/units";

describe("gauge vs absolute pressure", () => {
  it("absolute = gauge + ambient, and back", () => {
    expect(gaugeToAbsolute(150, 101.325)).toBeCloseTo(251.325, 9);
    expect(absoluteToGauge(251.325, 101.325)).toBeCloseTo(150, 9);
  });
});

describe("Gay-Lussac's law at fixed volume, in absolute pressure", () => {
  // Computed from p2 = (pg1 + patm)·T2/T1 − patm with patm = 1 atm (references.md).
  it("worked example: 25.000 psi gauge at 20 °C → 22.969 psi at 5 °C", () => {
    const result = kpaToPsi(gaugeAfterTemperatureChange(psiToKpa(25), 20, 5, KPA_PER_ATM));
    expect(result).toBeCloseTo(22.969, 3);
  });
  it("a gauge-only ratio (23.72 psi) is wrong and is not what we compute", () => {
    const gaugeOnly = (25 * celsiusToKelvin(5)) / celsiusToKelvin(20);
    expect(gaugeOnly).toBeCloseTo(23.72, 2);
    const result = kpaToPsi(gaugeAfterTemperatureChange(psiToKpa(25), 20, 5));
    expect(Math.abs(result - gaugeOnly)).toBeGreaterThan(0.7);
  });
  it("absolute pressure scales exactly with kelvin temperature", () => {
    const ambient = 90;
    const after = gaugeAfterTemperatureChange(200, 30, -10, ambient);
    expect((after + ambient) / (200 + ambient)).toBeCloseTo(celsiusToKelvin(-10) / celsiusToKelvin(30), 12);
  });
});

describe("a rigid tyre carried between elevations (ISO 2533 ambient)", () => {
  it("computed: 25 psi set at 500 m reads ≈ 27.32 psi at 2000 m", () => {
    expect(kpaToPsi(gaugeAfterElevationChange(psiToKpa(25), 500, 2000))).toBeCloseTo(27.32, 2);
  });
  it("temperature and elevation together = Gay-Lussac at the start, then the carry uphill", () => {
    const from = { temperatureC: 20, elevationM: 800 };
    const to = { temperatureC: 6, elevationM: 1400 };
    const both = gaugeAtConditions(150, from, to);
    const cooled = gaugeAfterTemperatureChange(150, 20, 6, standardPressureKpa(800));
    expect(both).toBeCloseTo(gaugeAfterElevationChange(cooled, 800, 1400), 9);
    expect(gaugeAtConditions(both, to, from)).toBeCloseTo(150, 9);
  });
});
