/**
 * Band and limits per wheel. Ceiling: the lower of the tyre's and the rim's printed maximum.
 * Floor: the pressure at which the design load would press the tyre in past the drop where rim
 * strikes and burps become likely (settings.ts), never below the tubeless bead floor (higher on
 * small wheels), the tube floor, or the tyre's printed minimum. The ceiling always wins over the
 * floor: nothing is ever advised above a printed maximum.
 */
import type { PressureUnit } from "@/lib/shared/units";
import type { WheelSetup } from "@/lib/pressure/pure/schemas";
import { floorAboveMaxCaution, floorCaution, maxCaution } from "./cautions";
import { pressureAtDropKpa } from "./estimate";
import {
  ABSOLUTE_FLOOR_KPA,
  FLOOR_DROP_HARD_HIT_CUT,
  FLOOR_DROP_INSERT_BONUS,
  FLOOR_DROP_TUBELESS,
  FLOOR_DROP_TUBES,
  WHEEL_FLOOR_KPA,
} from "./settings";
import type { WheelPosition } from "./types";

export type WheelLimits = { floorKpa: number; maxKpa: number };

/** The lower of the tyre's and the rim's printed maximum. */
export const ceilingKpa = (wheel: WheelSetup) => Math.min(wheel.maxKpa, wheel.rimMaxKpa ?? Infinity);

/** Drop (fraction of section height) past which rim strikes and burps become likely; less on a day of square hits. */
export const floorDrop = (wheel: WheelSetup, hardHits = false) =>
  (wheel.tubeless ? FLOOR_DROP_TUBELESS : FLOOR_DROP_TUBES) + (wheel.insert ? FLOOR_DROP_INSERT_BONUS : 0) - (hardHits ? FLOOR_DROP_HARD_HIT_CUT : 0);

/** Pressure below which rim strikes and burps become likely for this load and tyre (and the day's worst hits). */
export function floorKpa(totalMassKg: number, position: WheelPosition, wheel: WheelSetup, hardHits = false): number {
  return Math.max(minimumKpa(wheel), pressureAtDropKpa(totalMassKg, position, wheel, floorDrop(wheel, hardHits)));
}

/**
 * Whatever the load: the floor for this wheel size (set by tubeless bead retention; a tube is
 * never advised below it either, so tubes never come out lower than tubeless), never below the
 * absolute floor, and the tyre's printed minimum if that is higher.
 */
export const minimumKpa = (wheel: WheelSetup) =>
  Math.max(ABSOLUTE_FLOOR_KPA, WHEEL_FLOOR_KPA[wheel.bsdMm] ?? ABSOLUTE_FLOOR_KPA, wheel.minKpa ?? 0);

export const wheelLimits = (totalMassKg: number, position: WheelPosition, wheel: WheelSetup, hardHits = false): WheelLimits => ({
  floorKpa: floorKpa(totalMassKg, position, wheel, hardHits),
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

/** Low and high edges `halfKpa` around a limited target; low ≤ target ≤ high ≤ max always. */
export function bandEdges(targetKpa: number, limits: WheelLimits, halfKpa: number): BandEdges {
  const lowFloor = Math.min(limits.floorKpa, targetKpa);
  const lowKpa = Math.max(targetKpa - halfKpa, lowFloor);
  const highKpa = Math.max(targetKpa, Math.min(targetKpa + halfKpa, limits.maxKpa));
  return { lowKpa, highKpa, lowAtFloor: targetKpa - halfKpa < lowFloor, highAtMax: targetKpa + halfKpa > limits.maxKpa };
}

export type LimitedWheel = { limits: WheelLimits; target: LimitedTarget; edges: BandEdges; cautions: string[] };

/** Limits, band edges and the cautions for whichever limit binds, for one wheel. */
export function limitWheel(
  requestedKpa: number,
  limits: WheelLimits,
  halfKpa: number,
  position: WheelPosition,
  unit: PressureUnit,
): LimitedWheel {
  const target = limitTarget(requestedKpa, limits);
  const edges = bandEdges(target.targetKpa, limits, halfKpa);
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
