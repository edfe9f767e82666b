/**
 * Tyre air as an ideal gas in a rigid volume. Gauges read pressure above ambient, but the gas
 * laws work on absolute pressure: p_abs = p_gauge + p_ambient.
 * Gay-Lussac at fixed volume: p_abs2 / p_abs1 = T2 / T1 (kelvin).
 * A rigid tyre carried to another elevation keeps its absolute pressure; only the ambient changes.
 */
import { celsiusToKelvin, KPA_PER_ATM } from "@/lib/shared/units";
import { standardPressureKpa } from "./atmosphere";

export const gaugeToAbsolute = (gaugeKpa: number, ambientKpa: number) => gaugeKpa + ambientKpa;
export const absoluteToGauge = (absoluteKpa: number, ambientKpa: number) => absoluteKpa - ambientKpa;

/** Gauge pressure after the air in a fixed volume changes temperature (ambient unchanged). */
export function gaugeAfterTemperatureChange(
  gaugeKpa: number,
  fromC: number,
  toC: number,
  ambientKpa: number = KPA_PER_ATM,
): number {
  const absolute = gaugeToAbsolute(gaugeKpa, ambientKpa);
  return absoluteToGauge((absolute * celsiusToKelvin(toC)) / celsiusToKelvin(fromC), ambientKpa);
}

/** Gauge pressure of a rigid tyre carried between elevations at constant temperature. */
export function gaugeAfterElevationChange(gaugeKpa: number, fromM: number, toM: number): number {
  return gaugeKpa + standardPressureKpa(fromM) - standardPressureKpa(toM);
}

export type AirConditions = { temperatureC: number; elevationM: number };

/** Gauge pressure after both the temperature and the elevation change (fixed volume). */
export function gaugeAtConditions(gaugeKpa: number, from: AirConditions, to: AirConditions): number {
  const absolute = gaugeToAbsolute(gaugeKpa, standardPressureKpa(from.elevationM));
  const heated = (absolute * celsiusToKelvin(to.temperatureC)) / celsiusToKelvin(from.temperatureC);
  return absoluteToGauge(heated, standardPressureKpa(to.elevationM));
}
