/**
 * The band's half-width from its parts, each an independent ± in kPa, added in quadrature
 * (root-sum-square, as for independent errors): the basis (the estimate's model error, a
 * baseline's feel, or what the rides leave open), the gauge, half the gauge change between the
 * lowest and highest planned trail (ISO 2533), and half the day's temperature swing (Gay-Lussac).
 */
import { standardPressureKpa } from "@/lib/pressure/pure/physics/atmosphere";
import { celsiusToKelvin } from "@/lib/shared/units";
import { BASELINE_UNCERTAINTY, DAY_TEMPERATURE_SWING_C, ESTIMATE_UNCERTAINTY, GAUGE_ACCURACY_KPA, GAUGE_REPEATABILITY_KPA } from "./settings";

export type BasisKind = "baseline" | "estimate" | "rides";
export type UncertaintyParts = { basisKpa: number; gaugeKpa: number; elevationKpa: number; temperatureKpa: number };

export type DaySpread = { lowestElevationM: number; highestElevationM: number; rideTemperatureC: number; rideElevationM: number };

/** The parts for one wheel; `ridesHalfKpa` is what the rider's own rides leave open (learning.ts). */
export function uncertaintyParts(targetKpa: number, kind: BasisKind, spread: DaySpread, ridesHalfKpa = 0): UncertaintyParts {
  const basisKpa = kind === "estimate" ? ESTIMATE_UNCERTAINTY * targetKpa : kind === "baseline" ? BASELINE_UNCERTAINTY * targetKpa : ridesHalfKpa;
  const gaugeKpa = kind === "estimate" ? GAUGE_ACCURACY_KPA : GAUGE_REPEATABILITY_KPA;
  const elevationKpa = Math.abs(standardPressureKpa(spread.lowestElevationM) - standardPressureKpa(spread.highestElevationM)) / 2;
  const absoluteKpa = targetKpa + standardPressureKpa(spread.rideElevationM);
  const temperatureKpa = (absoluteKpa * (DAY_TEMPERATURE_SWING_C / 2)) / celsiusToKelvin(spread.rideTemperatureC);
  return { basisKpa, gaugeKpa, elevationKpa, temperatureKpa };
}

export const halfWidthKpa = (p: UncertaintyParts) => Math.hypot(p.basisKpa, p.gaugeKpa, p.elevationKpa, p.temperatureKpa);
