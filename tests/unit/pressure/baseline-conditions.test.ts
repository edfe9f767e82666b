// The baseline's conditions count: its check reading is carried to where it was ridden
// (Gay-Lussac's law in absolute pressure; ISO 2533:1975 ambient pressure, Table 5: 954.608 hPa at
// 500 m), and today's pump reading carries it back. Worked check from issue #14, computed here.
import { describe, expect, it } from "vitest";
import { computePressureBand } from "@/lib/pressure/pure";
import { baselineOnTrail } from "@/lib/pressure/pure/baseline";
import { standardPressureKpa } from "@/lib/pressure/pure/physics/atmosphere";
import { kpaToPsi, psiToKpa } from "@/lib/shared/units";
import { adult, sum } from "./fixtures";

const checkedAt20C500m = { frontKpa: psiToKpa(25), rearKpa: psiToKpa(25), surfaces: ["dry" as const], temperatureC: 20, elevationM: 500 };

describe("baseline conditions (Gay-Lussac; ISO 2533)", () => {
  it("ISO 2533 gives 95.46 kPa ambient at 500 m (Table 5: 954.608 hPa)", () => {
    expect(standardPressureKpa(500)).toBeCloseTo(95.4608, 3);
  });

  it("worked check: 25.0 psi checked at 20 °C and 500 m, ridden at 5 °C and 500 m → 23.01 psi on the trail", () => {
    const trail = baselineOnTrail({ ...checkedAt20C500m, rideTemperatureC: 5 });
    // (172.369 + 95.461) kPa × 278.15 / 293.15 − 95.461 kPa = 158.66 kPa = 23.01 psi
    expect(kpaToPsi(trail.frontKpa)).toBeCloseTo(23.01, 2);
    expect(trail.how).toContain("checked at 20 °C, ridden at 5 °C");
  });

  it("with no tweak, today's pump-to at 5 °C and 500 m is 23.01 psi too", () => {
    const r = computePressureBand(adult({ baseline: { ...checkedAt20C500m, rideTemperatureC: 5 }, today: { airTemperatureC: 5, pumpTemperatureC: 5, rideElevationM: 500, pumpElevationM: 500 } }));
    expect(kpaToPsi(r.front.targetKpa)).toBeCloseTo(23.01, 1);
    expect(kpaToPsi(r.front.pumpToKpa)).toBeCloseTo(23.01, 1);
    const step = r.reasons.find((x) => x.id === "basis-ride-conditions");
    expect(kpaToPsi(step?.frontKpa ?? 0)).toBeCloseTo(-1.99, 1);
  });

  it("pumped today in a 20 °C garage at 500 m for a 5 °C trail: pump back to the checked 25.0 psi", () => {
    const r = computePressureBand(adult({ baseline: { ...checkedAt20C500m, rideTemperatureC: 5 }, today: { airTemperatureC: 5, pumpTemperatureC: 20, rideElevationM: 500, pumpElevationM: 500 } }));
    expect(kpaToPsi(r.front.pumpToKpa)).toBeCloseTo(25, 1);
  });

  it("ride conditions default to where it was checked: no change and no reason", () => {
    const r = computePressureBand(adult({ baseline: checkedAt20C500m }));
    expect(r.front.targetKpa).toBeCloseTo(psiToKpa(25), 1);
    expect(r.reasons.some((x) => x.id === "basis-ride-conditions")).toBe(false);
  });

  it("ridden higher than checked: the rigid tyre reads more on the trail (ISO 2533)", () => {
    const trail = baselineOnTrail({ ...checkedAt20C500m, rideElevationM: 2000 });
    expect(kpaToPsi(trail.frontKpa)).toBeCloseTo(27.32, 2); // references.md: 25 psi at 500 m → 27.32 psi at 2000 m
  });

  it("reasons still add up to the target", () => {
    const r = computePressureBand(adult({ baseline: { ...checkedAt20C500m, rideTemperatureC: 5 } }));
    const toTarget = r.reasons.filter((x) => !x.id.startsWith("pump-"));
    expect(sum(toTarget.map((x) => x.frontKpa))).toBeCloseTo(r.front.targetKpa, 0);
  });

  it("a baseline saved before ride conditions existed is still read (old setups stay readable)", () => {
    const old = { frontKpa: 130, rearKpa: 155, surfaces: ["dry" as const], temperatureC: 18 };
    expect(() => computePressureBand(adult({ baseline: old }))).not.toThrow();
  });
});

describe("limits at the top of the day and on the same tyres", () => {
  it("the printed maximum is checked at the highest planned point: the gauge there stays at or under it", () => {
    const wheel = { ...adult().front!, maxKpa: 160 } as const;
    const r = computePressureBand(adult({ front: wheel, rear: wheel, baseline: { frontKpa: 158, rearKpa: 160, surfaces: ["dry"] }, today: { rideElevationM: 1000, highestElevationM: 1800, pumpElevationM: 600 } }));
    const atSummit = r.rear.targetKpa + standardPressureKpa(1000) - standardPressureKpa(1800);
    expect(atSummit).toBeLessThanOrEqual(160 + 0.1);
    expect(r.rear.highKpa + standardPressureKpa(1000) - standardPressureKpa(1800)).toBeLessThanOrEqual(160 + 0.1);
    expect(r.rear.pumpToKpa).toBeLessThanOrEqual(160);
    expect(r.reasons.find((x) => x.id === "limit-max")?.text).toContain("at the top of the day (1800 m)");
  });

  it("rear below front on the same tyres is flagged in the cautions", () => {
    const low = computePressureBand(adult({ baseline: { frontKpa: 150, rearKpa: 140, surfaces: ["dry"] } }));
    expect(low.cautions.some((c) => c.startsWith("The rear is below the front"))).toBe(true);
    const usual = computePressureBand(adult({ baseline: { frontKpa: 130, rearKpa: 150, surfaces: ["dry"] } }));
    expect(usual.cautions.some((c) => c.startsWith("The rear is below the front"))).toBe(false);
  });
});
