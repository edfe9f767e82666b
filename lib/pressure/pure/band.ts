/**
 * Band and limits per wheel. Ceiling: the lower of the tyre's and the rim's printed maximum.
 * Floor: the pressure at which the design load would press the tyre in past the drop where rim
 * strikes and burps become likely (settings.ts), never below an absolute minimum. The ceiling
 * always wins over the floor: nothing is ever advised above a printed maximum.
 */
import type { PressureUnit } from "@/lib/shared/units";
import type { WheelSetup } from "@/lib/pressure/pure/schemas";
import { floorAboveMaxCaution, floorCaution, maxCaution } from "./cautions";
import { pressureAtDropKpa } from "./estimate";
import {
  ABSOLUTE_FLOOR_KPA,
  BAND_FRACTION_BASELINE,
  BAND_FRACTION_ESTIMATE,
  BAND_MAX_HALF_KPA,
  BAND_MIN_HALF_KPA,
  FLOOR_DROP_INSERT_BONUS,
  FLOOR_DROP_TUBELESS,
  FLOOR_DROP_TUBES,
} from "./settings";
import type { WheelPosition } from "./types";

export type WheelLimits = { floorKpa: number; maxKpa: number };

/** The lower of the tyre's and the rim's printed maximum. */
export const ceilingKpa = (wheel: WheelSetup) => Math.min(wheel.maxKpa, wheel.rimMaxKpa ?? Infinity);

/** Drop (fraction of section height) past which rim strikes and burps become likely. */
export const floorDrop = (wheel: WheelSetup) =>
  (wheel.tubeless ? FLOOR_DROP_TUBELESS : FLOOR_DROP_TUBES) + (wheel.insert ? FLOOR_DROP_INSERT_BONUS : 0);

/** Pressure below which rim strikes and burps become likely for this load and tyre. */
export function floorKpa(totalMassKg: number, position: WheelPosition, wheel: WheelSetup): number {
  return Math.max(ABSOLUTE_FLOOR_KPA, pressureAtDropKpa(totalMassKg, position, wheel, floorDrop(wheel)));
}

export const wheelLimits = (totalMassKg: number, position: WheelPosition, wheel: WheelSetup): WheelLimits => ({
  floorKpa: floorKpa(totalMassKg, position, wheel),
  maxKpa: ceilingKpa(wheel),
});

export type LimitedTarget = {
  targetKpa: number;
  /** Target minus the requested target (positive when the floor lifted it). */
  adjustmentKpa: number;
  binding: "none" | "floor" | "max" | "floor-above-max";
};

/** Holds a requested target between the floor and the ceiling. */
export function limitTarget(requestedKpa: number, limits: WheelLimits): LimitedTarget {
  const { floorKpa: floor, maxKpa: max } = limits;
  const targetKpa = Math.min(Math.max(requestedKpa, floor), max);
  let binding: LimitedTarget["binding"] = "none";
  if (floor > max) binding = "floor-above-max";
  else if (requestedKpa > max) binding = "max";
  else if (requestedKpa < floor) binding = "floor";
  return { targetKpa, adjustmentKpa: targetKpa - requestedKpa, binding };
}

export type BandEdges = { lowKpa: number; highKpa: number; lowAtFloor: boolean; highAtMax: boolean };

/** Band half-width: wider for an estimate, which is less certain than a rider's own baseline. */
export function bandHalfWidthKpa(targetKpa: number, basis: "baseline" | "estimate"): number {
  const fraction = basis === "baseline" ? BAND_FRACTION_BASELINE : BAND_FRACTION_ESTIMATE;
  return Math.min(BAND_MAX_HALF_KPA, Math.max(BAND_MIN_HALF_KPA, fraction * targetKpa));
}

/** Low and high edges around a limited target; low ≤ target ≤ high ≤ max always. */
export function bandEdges(targetKpa: number, limits: WheelLimits, basis: "baseline" | "estimate"): BandEdges {
  const half = bandHalfWidthKpa(targetKpa, basis);
  const lowFloor = Math.min(limits.floorKpa, targetKpa);
  const lowKpa = Math.max(targetKpa - half, lowFloor);
  const highKpa = Math.max(targetKpa, Math.min(targetKpa + half, limits.maxKpa));
  return { lowKpa, highKpa, lowAtFloor: targetKpa - half < lowFloor, highAtMax: targetKpa + half > limits.maxKpa };
}

export type LimitedWheel = { limits: WheelLimits; target: LimitedTarget; edges: BandEdges; cautions: string[] };

/** Limits, band edges and the cautions for whichever limit binds, for one wheel. */
export function limitWheel(
  requestedKpa: number,
  limits: WheelLimits,
  basis: "baseline" | "estimate",
  position: WheelPosition,
  unit: PressureUnit,
): LimitedWheel {
  const target = limitTarget(requestedKpa, limits);
  const edges = bandEdges(target.targetKpa, limits, basis);
  const cautions: string[] = [];
  if (target.binding === "floor-above-max") {
    cautions.push(floorAboveMaxCaution(position, limits.floorKpa, limits.maxKpa, unit));
  } else {
    if (target.binding === "floor" || edges.lowAtFloor) {
      cautions.push(floorCaution(position, limits.floorKpa, target.binding === "floor", unit));
    }
    if (target.binding === "max" || edges.highAtMax) cautions.push(maxCaution(position, limits.maxKpa, unit));
  }
  return { limits, target, edges, cautions };
}
