// End-to-end checks of computePressureBand. Pump readings: Gay-Lussac in absolute pressure and the
// ISO 2533:1975 atmosphere (references.md); rule sizes are common practice, no published source.
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { gaugeAtConditions } from "@/lib/pressure/pure/physics/gas";
import { STANDARD_CAUTIONS } from "@/lib/pressure/pure/cautions";
import { computePressureBand, PUMP_REASON_PREFIX } from "@/lib/pressure/pure";
import { kpaToPsi, psiToKpa } from "@/lib/shared/units";
import { adult, sum, withBaseline } from "./fixtures";

const targetReasons = (r: ReturnType<typeof computePressureBand>) => r.reasons.filter((x) => !x.id.startsWith(PUMP_REASON_PREFIX));
const pumpReasons = (r: ReturnType<typeof computePressureBand>) => r.reasons.filter((x) => x.id.startsWith(PUMP_REASON_PREFIX));

const day = {
  trails: [
    { name: "Lynx Flow", surfaces: ["wet" as const], features: ["roots" as const, "berm" as const], lastReportAgeHours: 2 },
    { name: "Ridge Hop", surfaces: ["wet" as const, "rocky" as const], features: ["roots" as const, "jump" as const], lastReportAgeHours: 30 },
    { name: "Fern Gully", surfaces: ["wet" as const], features: ["roots" as const], lastReportAgeHours: 3 },
    { name: "Quarry", surfaces: [], features: [], lastReportAgeHours: null },
  ],
  airTemperatureC: 6,
  pumpTemperatureC: 20,
  rideElevationM: 1400,
  pumpElevationM: 800,
};

describe("computePressureBand", () => {
  it("uses the baseline when there is one; reasons add up to the target; delta = target − baseline", () => {
    const r = computePressureBand(withBaseline({ today: day }));
    expect(r.basis).toBe("baseline");
    expect(r.reasons[0].id).toBe("basis-baseline");
    expect(r.front.targetKpa).toBeCloseTo(sum(targetReasons(r).map((x) => x.frontKpa)), 0);
    expect(r.rear.targetKpa).toBeCloseTo(sum(targetReasons(r).map((x) => x.rearKpa)), 0);
    expect(r.front.deltaKpa).toBeCloseTo(r.front.targetKpa - psiToKpa(19), 0);
    expect(r.front.deltaKpa).toBeLessThan(0); // wet roots on 3 of 4 trails
    expect(r.reasons.some((x) => x.text.startsWith("Wet roots on 3 of 4 trails"))).toBe(true);
  });

  it("pumpToKpa follows Gay-Lussac (absolute pressure) and ISO 2533 from the trail back to the pump", () => {
    const r = computePressureBand(withBaseline({ today: day }));
    const expected = gaugeAtConditions(
      r.front.targetKpa,
      { temperatureC: 6, elevationM: 1400 },
      { temperatureC: 20, elevationM: 800 },
    );
    expect(r.front.pumpToKpa).toBeCloseTo(expected, 1);
    expect(r.front.pumpToKpa).toBeCloseTo(r.front.targetKpa + sum(pumpReasons(r).map((x) => x.frontKpa)), 0);
    const temperature = r.reasons.find((x) => x.id === "pump-temperature");
    expect(temperature?.text).toMatch(/^Trail 14 °C colder than where you pump: \+1\.\d psi front, \+1\.\d psi rear to pump now$/);
    expect(r.reasons.find((x) => x.id === "pump-elevation")?.frontKpa).toBeLessThan(0);
  });

  it("without temperatures or elevations, pumpToKpa is the target", () => {
    const r = computePressureBand(withBaseline({ today: { surfaces: ["dry"] } }));
    expect(r.front.pumpToKpa).toBe(r.front.targetKpa);
    expect(pumpReasons(r)).toEqual([]);
  });

  it("the baseline is taken at its own reference temperature: no correction of the target itself", () => {
    const cold = computePressureBand(withBaseline({ today: { surfaces: ["dry"], airTemperatureC: 2, pumpTemperatureC: 2 } }));
    expect(cold.front.targetKpa).toBeCloseTo(psiToKpa(19), 1);
  });

  it("falls back to the estimate, with the estimate caution", () => {
    const r = computePressureBand(adult());
    expect(r.basis).toBe("estimate");
    expect(r.front.deltaKpa).toBe(0);
    expect(r.cautions).toContain("No baseline saved: this is a starting estimate from weight and tyre size. Ride it, then log how it felt to refine it.");
  });

  it("always carries the standard cautions, and flags old or missing reports", () => {
    const r = computePressureBand(withBaseline({ today: day }));
    for (const c of STANDARD_CAUTIONS) expect(r.cautions).toContain(c);
    expect(r.cautions.some((c) => c.includes("older than 24 h for Ridge Hop"))).toBe(true);
    expect(r.cautions.some((c) => c.includes("No report today for Quarry"))).toBe(true);
    expect(computePressureBand(adult()).cautions.some((c) => c.startsWith("No trail conditions for today"))).toBe(true);
  });

  it("writes reasons in the rider's unit", () => {
    const r = computePressureBand(withBaseline({ unit: "bar", today: day }));
    expect(r.reasons[0].text).toMatch(/1\.31 bar front, 1\.59 bar rear$/);
  });

  it("a pump reading above the printed maximum is held there, with a caution", () => {
    const r = computePressureBand(
      withBaseline({ baseline: { frontKpa: 270, rearKpa: 270, surfaces: ["dry"] }, today: { airTemperatureC: -10, pumpTemperatureC: 30 } }),
    );
    expect(r.front.pumpToKpa).toBe(276);
    expect(r.reasons.some((x) => x.id === "pump-limit")).toBe(true);
    expect(r.cautions.some((c) => c.startsWith("Front: do not pump above 40.0 psi"))).toBe(true);
  });

  it("a tyre that gains more on the way up than its target is set at the trailhead (pump reading held at 0)", () => {
    const kid = { bsdMm: 622 as const, widthMm: 56, casing: "light" as const, insert: false, tubeless: false, maxKpa: 240 };
    const r = computePressureBand({
      riderMassKg: 20, bikeMassKg: 9, pace: "easy", front: kid, rear: kid,
      baseline: { frontKpa: 40, rearKpa: 60, surfaces: ["dry"] },
      today: { pumpElevationM: -500, rideElevationM: 5000 },
    });
    expect(r.front.pumpToKpa).toBe(0);
    expect(r.reasons.find((x) => x.id === "pump-limit")?.frontKpa).toBeGreaterThan(0);
    expect(r.cautions.some((c) => c.startsWith("Front: the tyre will gain so much pressure"))).toBe(true);
  });

  it("refuses invalid input with an AppError naming the field", () => {
    try {
      computePressureBand({ ...adult(), front: { ...adult().front, bsdMm: 600 } } as never);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(AppError);
      expect((error as AppError).status).toBe(400);
      expect((error as AppError).field).toBe("front.bsdMm");
      expect((error as AppError).message).toContain("ISO 5775");
    }
  });

  it("rounds to 0.1 kPa and keeps the demo scenario in plausible psi", () => {
    const r = computePressureBand(withBaseline({ today: day }));
    expect(Number.isInteger(r.front.targetKpa * 10)).toBe(true);
    expect(kpaToPsi(r.front.targetKpa)).toBeGreaterThan(17);
    expect(kpaToPsi(r.front.targetKpa)).toBeLessThan(19);
  });
});
