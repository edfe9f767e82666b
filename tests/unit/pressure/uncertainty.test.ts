// The band's ± from its parts, added in quadrature (root-sum-square of independent errors, as in
// the GUM, JCGM 100:2008 §5.1 — from memory). The fractions are common practice, no published source.
import { describe, expect, it } from "vitest";
import { computePressureBand } from "@/lib/pressure/pure";
import { standardPressureKpa } from "@/lib/pressure/pure/physics/atmosphere";
import { GAUGE_ACCURACY_KPA, GAUGE_REPEATABILITY_KPA } from "@/lib/pressure/pure/settings";
import { halfWidthKpa, uncertaintyParts } from "@/lib/pressure/pure/uncertainty";
import { formatBandPressure, psiToKpa } from "@/lib/shared/units";
import { adult, withBaseline } from "./fixtures";

const still = { lowestElevationM: 500, highestElevationM: 500, rideTemperatureC: 15, rideElevationM: 500 };

describe("band half-width from its parts", () => {
  it("is the root-sum-square of the parts", () => {
    const parts = uncertaintyParts(130, "estimate", still);
    expect(halfWidthKpa(parts)).toBeCloseTo(Math.sqrt(parts.basisKpa ** 2 + parts.gaugeKpa ** 2 + parts.temperatureKpa ** 2), 12);
    expect(parts.gaugeKpa).toBe(GAUGE_ACCURACY_KPA);
    expect(uncertaintyParts(130, "baseline", still).gaugeKpa).toBe(GAUGE_REPEATABILITY_KPA);
  });

  it("an estimate is wider than a baseline", () => {
    expect(halfWidthKpa(uncertaintyParts(130, "estimate", still))).toBeGreaterThan(halfWidthKpa(uncertaintyParts(130, "baseline", still)));
  });

  it("the park's elevation span adds half the gauge change between lowest and highest trail (ISO 2533)", () => {
    const span = uncertaintyParts(130, "baseline", { ...still, lowestElevationM: 800, highestElevationM: 1800 });
    expect(span.elevationKpa).toBeCloseTo((standardPressureKpa(800) - standardPressureKpa(1800)) / 2, 9);
  });

  it("the engine reports the parts and builds the band from them", () => {
    const r = computePressureBand(withBaseline({ today: { rideElevationM: 1200, lowestElevationM: 800, highestElevationM: 1600 } }));
    expect(r.uncertainty.front.elevationKpa).toBeGreaterThan(0);
    const half = halfWidthKpa(r.uncertainty.front);
    expect(r.front.highKpa - r.front.targetKpa).toBeCloseTo(half, 0);
  });
});

describe("screen rounding: 0.5 psi, 0.05 bar, 5 kPa", () => {
  it("rounds to the step a gauge and the estimate can stand behind", () => {
    expect(formatBandPressure(psiToKpa(18.26), "psi")).toBe("18.5 psi");
    expect(formatBandPressure(psiToKpa(18.24), "psi")).toBe("18.0 psi");
    expect(formatBandPressure(131, "bar")).toBe("1.30 bar");
    expect(formatBandPressure(128, "kPa")).toBe("130 kPa");
  });
});

describe("reasons in plain numbers", () => {
  it("no reason says ±0.0, and tiny contributions are folded into one 'small adjustments' line", () => {
    const r = computePressureBand(adult({ today: { trails: [
      { name: "Fern Gully", surfaces: ["damp"], features: ["wooden-feature"] },
      ...["A", "B", "C", "D", "E", "F", "G", "H", "I"].map((name) => ({ name, surfaces: ["dry" as const], features: [] })),
    ] } }));
    for (const reason of r.reasons) expect(reason.text).not.toContain("±0.0");
    const tiny = r.reasons.filter((x) => !/^(basis-|estimate-)/.test(x.id) && Math.abs(x.frontKpa) < psiToKpa(0.2) && Math.abs(x.rearKpa) < psiToKpa(0.2));
    expect(tiny.every((x) => x.id === "small-adjustments" || x.id === "pump-small")).toBe(true);
  });
});
