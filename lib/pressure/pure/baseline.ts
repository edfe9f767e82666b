/**
 * A baseline is a gauge reading where it was checked (temperature, elevation) of a pressure that
 * felt right where it was ridden. The engine works in trail gauge pressure, so the reading is
 * carried to its ride conditions: Gay-Lussac in absolute pressure, ISO 2533 ambient at each
 * elevation (physics/gas.ts). Each missing ride condition means "where it was checked".
 */
import { gaugeAtConditions } from "@/lib/pressure/pure/physics/gas";
import { formatTemperature } from "@/lib/shared/units";
import type { Baseline } from "@/lib/pressure/pure/schemas";

export type TrailBaseline = { frontKpa: number; rearKpa: number; how: string };

export function baselineOnTrail(baseline: Baseline): TrailBaseline {
  const checked = { temperatureC: baseline.temperatureC ?? 15, elevationM: baseline.elevationM ?? 0 };
  const ridden = { temperatureC: baseline.rideTemperatureC ?? checked.temperatureC, elevationM: baseline.rideElevationM ?? checked.elevationM };
  const carry = (kPa: number) => gaugeAtConditions(kPa, checked, ridden);
  const parts: string[] = [];
  if (ridden.temperatureC !== checked.temperatureC) parts.push(`checked at ${formatTemperature(checked.temperatureC)}, ridden at ${formatTemperature(ridden.temperatureC)}`);
  if (ridden.elevationM !== checked.elevationM) parts.push(`checked at ${Math.round(checked.elevationM)} m, ridden at ${Math.round(ridden.elevationM)} m`);
  return { frontKpa: carry(baseline.frontKpa), rearKpa: carry(baseline.rearKpa), how: `Your baseline was ${parts.join(" and ")}` };
}
