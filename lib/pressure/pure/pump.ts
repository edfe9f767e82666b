/**
 * What to pump to now so the tyre is at its target on the trail. The target is a gauge pressure
 * at the trail's air temperature and elevation; the air in a (rigid) tyre keeps its volume, so
 * we carry it back to the pump's temperature (Gay-Lussac, absolute pressure) and elevation
 * (ISO 2533 ambient pressure). A missing temperature or elevation means "same as the other".
 */
import { standardPressureKpa } from "@/lib/pressure/pure/physics/atmosphere";
import { gaugeAfterTemperatureChange } from "@/lib/pressure/pure/physics/gas";
import { formatTemperature, type PressureUnit } from "@/lib/shared/units";
import type { DayConditions } from "@/lib/pressure/pure/schemas";
import { isNegligible, wheelsText } from "./format";
import type { Reason } from "./types";

export type PumpConditions = { rideTemperatureC: number; pumpTemperatureC: number; rideElevationM: number; pumpElevationM: number };

/** Fills in missing temperatures and elevations so that a missing value changes nothing. */
export function pumpConditions(today: DayConditions | undefined): PumpConditions {
  const rideT = today?.airTemperatureC ?? today?.pumpTemperatureC ?? 15;
  const pumpT = today?.pumpTemperatureC ?? rideT;
  const rideE = today?.rideElevationM ?? today?.pumpElevationM ?? 0;
  const pumpE = today?.pumpElevationM ?? rideE;
  return { rideTemperatureC: rideT, pumpTemperatureC: pumpT, rideElevationM: rideE, pumpElevationM: pumpE };
}

export type PumpPlan = {
  pumpToKpa: number;
  /** Change from the target due to temperature, then due to elevation. */
  temperatureKpa: number;
  elevationKpa: number;
  /** Change made to keep the reading within 0 … max. */
  limitKpa: number;
  binding: "none" | "max" | "zero";
};

/** Gauge reading at the pump that becomes `targetKpa` on the trail, never above `maxKpa`. */
export function pumpPlan(targetKpa: number, conditions: PumpConditions, maxKpa: number): PumpPlan {
  const rideAmbient = standardPressureKpa(conditions.rideElevationM);
  const afterTemperature = gaugeAfterTemperatureChange(
    targetKpa,
    conditions.rideTemperatureC,
    conditions.pumpTemperatureC,
    rideAmbient,
  );
  const atPump = afterTemperature + rideAmbient - standardPressureKpa(conditions.pumpElevationM);
  const pumpToKpa = Math.max(0, Math.min(atPump, maxKpa));
  const binding = atPump > maxKpa ? "max" : atPump < 0 ? "zero" : "none";
  return {
    pumpToKpa,
    temperatureKpa: afterTemperature - targetKpa,
    elevationKpa: atPump - afterTemperature,
    limitKpa: pumpToKpa - atPump,
    binding,
  };
}

/** The words of the pump-temperature reason before its numbers; pressure-today.ts names the weather in their place when it supplied the temperatures. */
export const pumpTemperatureLabel = (dT: number) => `Trail ${formatTemperature(Math.abs(dT))} ${dT < 0 ? "colder" : "warmer"} than where you pump`;

/** Reasons for the step from target to pump reading (ids start with "pump-"). */
export function pumpReasons(front: PumpPlan, rear: PumpPlan, conditions: PumpConditions, unit: PressureUnit): Reason[] {
  const dT = conditions.rideTemperatureC - conditions.pumpTemperatureC;
  const dE = conditions.rideElevationM - conditions.pumpElevationM;
  const items = [
    { id: "pump-temperature", label: pumpTemperatureLabel(dT), f: front.temperatureKpa, r: rear.temperatureKpa, suffix: " to pump now" },
    { id: "pump-elevation", label: `Riding ${Math.round(Math.abs(dE))} m ${dE > 0 ? "higher" : "lower"} than where you pump`, f: front.elevationKpa, r: rear.elevationKpa, suffix: " to pump now" },
    { id: "pump-limit", label: "Pump reading kept within 0 and the printed maximum", f: front.limitKpa, r: rear.limitKpa, suffix: "" },
  ];
  return items
    .filter((item) => !(isNegligible(item.f) && isNegligible(item.r)))
    .map((item) => ({ id: item.id, text: `${item.label}: ${wheelsText(item.f, item.r, unit)}${item.suffix}`, frontKpa: item.f, rearKpa: item.r }));
}
