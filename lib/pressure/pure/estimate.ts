/**
 * Starting estimate when the rider has no baseline, per wheel:
 *   p = shape pressure (casing) + design load / patch area at the target drop × tubes × insert,
 * with the design load = weight × (static share + riding loads) × pace. The footprint is the
 * F ∝ p·d^(3/2) law of physics/contact-patch.ts; every number is in settings.ts and checked against
 * the common-practice anchor points (docs/pressure-grid.md). Each term is counted once.
 */
import { dropAtPressure, patchAreaAtDropM2, pressureForPatchKpa, weightN } from "@/lib/pressure/pure/physics/contact-patch";
import { tyreSizeText, type PressureUnit } from "@/lib/shared/units";
import type { Pace, PressureInput, WheelSetup } from "@/lib/pressure/pure/schemas";
import { capitalise, isNegligible, pairText, wheelsText } from "./format";
import {
  DYNAMIC_ALLOWANCE,
  FRONT_STATIC_SHARE,
  INSERT_FACTOR,
  PACE_FACTOR,
  SHAPE_PRESSURE_KPA,
  TARGET_DROP,
  TUBE_FACTOR,
} from "./settings";
import type { Reason, WheelPosition } from "./types";

const staticShare = (position: WheelPosition) => (position === "front" ? FRONT_STATIC_SHARE : 1 - FRONT_STATIC_SHARE);

/** Design load (N) on one wheel at steady pace: static share plus the riding loads, times total weight. */
export function designLoadN(totalMassKg: number, position: WheelPosition): number {
  return weightN(totalMassKg) * (staticShare(position) + DYNAMIC_ALLOWANCE);
}

/** Pressure (kPa) at which the design load presses the tyre in by `dropFraction` of its height. */
export function pressureAtDropKpa(totalMassKg: number, position: WheelPosition, wheel: WheelSetup, dropFraction: number) {
  return pressureForPatchKpa(designLoadN(totalMassKg, position), patchAreaAtDropM2(wheel.bsdMm, wheel.widthMm, dropFraction));
}

export type WheelEstimate = {
  shapeKpa: number;
  loadKpa: number;
  tubesKpa: number;
  insertKpa: number;
  paceKpa: number;
  totalKpa: number;
  /** Drop under the rider's and bike's static weight alone at the estimate (fraction of height). */
  staticDrop: number;
};

/** The estimate for one wheel, split into its terms (they add up to totalKpa). */
export function estimateWheel(totalMassKg: number, position: WheelPosition, wheel: WheelSetup, pace: Pace): WheelEstimate {
  const shapeKpa = SHAPE_PRESSURE_KPA[wheel.casing];
  const loadKpa = pressureAtDropKpa(totalMassKg, position, wheel, TARGET_DROP);
  const paceKpa = loadKpa * (PACE_FACTOR[pace] - 1);
  const paced = loadKpa + paceKpa;
  const tubesKpa = wheel.tubeless ? 0 : paced * (TUBE_FACTOR - 1);
  const insertKpa = wheel.insert ? (paced + tubesKpa) * (INSERT_FACTOR - 1) : 0;
  const totalKpa = shapeKpa + paced + tubesKpa + insertKpa;
  const staticDrop = dropAtPressure(wheel.bsdMm, wheel.widthMm, weightN(totalMassKg) * staticShare(position), totalKpa);
  return { shapeKpa, loadKpa, tubesKpa, insertKpa, paceKpa, totalKpa, staticDrop };
}

export type Estimate = { frontKpa: number; rearKpa: number; reasons: Reason[] };

const percentOf = (fraction: number) => `${Math.round(fraction * 100)} %`;

/** Estimate for both wheels, each term explained in plain words. */
export function estimatePressures(input: PressureInput): Estimate {
  const mass = input.riderMassKg + input.bikeMassKg;
  const unit: PressureUnit = input.unit;
  const front = estimateWheel(mass, "front", input.front, input.pace);
  const rear = estimateWheel(mass, "rear", input.rear, input.pace);
  const [f, r] = [tyreSizeText(input.front.bsdMm, input.front.widthMm), tyreSizeText(input.rear.bsdMm, input.rear.widthMm)];
  const sizes = f === r ? `${f} tyres` : `${f} front and ${r} rear`;
  const reasons: Reason[] = [];
  const add = (id: string, text: string, fk: number, rk: number, absolute = false) => {
    if (isNegligible(fk) && isNegligible(rk)) return;
    reasons.push({ id, text: `${text}: ${absolute ? pairText(fk, rk, unit) : wheelsText(fk, rk, unit)}`, frontKpa: fk, rearKpa: rk });
  };
  const check = `; at the final pressure your weight alone presses the tyres in about ${percentOf(front.staticDrop)} front, ${percentOf(rear.staticDrop)} rear`;
  add(
    "estimate-load",
    `Starting point for ${mass.toFixed(1)} kg of rider and bike on ${sizes}, so that braking, berms and landings press each tyre in about ${percentOf(TARGET_DROP)} of its height (${Math.round(FRONT_STATIC_SHARE * 100)} % of the weight on the front, ${Math.round((1 - FRONT_STATIC_SHARE) * 100)} % on the rear)${check}`,
    front.loadKpa,
    rear.loadKpa,
    true,
  );
  const casings = input.front.casing === input.rear.casing ? `${capitalise(input.front.casing)} casing` : `${capitalise(input.front.casing)} casing front, ${input.rear.casing} rear`;
  add("estimate-casing", `${casings}: what every tyre needs to hold its shape in corners and keep its bead seated, less for stiffer casings`, front.shapeKpa, rear.shapeKpa);
  add("estimate-pace", `${capitalise(input.pace)} pace: ${input.pace === "hard" ? "harder hits and turns load the tyres more" : "gentler riding loads the tyres less"}`, front.paceKpa, rear.paceKpa);
  add("estimate-tubes", "Inner tubes: more air so they do not pinch", front.tubesKpa, rear.tubesKpa);
  add("estimate-insert", "Tyre insert: it backs the tyre up in hard hits, so a little less air", front.insertKpa, rear.insertKpa);
  return { frontKpa: front.totalKpa, rearKpa: rear.totalKpa, reasons };
}
