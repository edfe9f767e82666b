/**
 * Starting estimate when the rider has no baseline. Physical core: the pressure that gives the
 * wheel's design load a contact patch of the target size (A ≈ F/p, so p = F/A), where the
 * target patch grows with tyre width and wheel diameter (lib/pressure/pure/physics/contact-patch.ts).
 * Then construction and pace terms as fractions of the core. All numbers: settings.ts.
 */
import { patchAreaAtDropM2, pressureForPatchKpa, weightN } from "@/lib/pressure/pure/physics/contact-patch";
import type { PressureUnit } from "@/lib/shared/units";
import type { Pace, PressureInput, WheelSetup } from "@/lib/pressure/pure/schemas";
import { capitalise, isNegligible, pairText, percentText, wheelsText } from "./format";
import {
  CASING_TERM,
  DYNAMIC_ALLOWANCE,
  FRONT_STATIC_SHARE,
  INSERT_TERM,
  PACE_TERM,
  TARGET_DROP,
  TUBE_TERM,
} from "./settings";
import type { Reason, WheelPosition } from "./types";

/** Design load (N) on one wheel: static share plus the dynamic allowance, times total weight. */
export function designLoadN(totalMassKg: number, position: WheelPosition): number {
  const share = position === "front" ? FRONT_STATIC_SHARE : 1 - FRONT_STATIC_SHARE;
  return weightN(totalMassKg) * (share + DYNAMIC_ALLOWANCE);
}

/** Pressure (kPa) at which the design load presses the tyre in by `dropFraction` of its height. */
export function pressureAtDropKpa(totalMassKg: number, position: WheelPosition, wheel: WheelSetup, dropFraction: number) {
  return pressureForPatchKpa(designLoadN(totalMassKg, position), patchAreaAtDropM2(wheel.bsdMm, wheel.widthMm, dropFraction));
}

export type WheelEstimate = {
  coreKpa: number;
  casingKpa: number;
  tubesKpa: number;
  insertKpa: number;
  paceKpa: number;
  totalKpa: number;
};

/** The estimate for one wheel, split into its terms. */
export function estimateWheel(totalMassKg: number, position: WheelPosition, wheel: WheelSetup, pace: Pace): WheelEstimate {
  const coreKpa = pressureAtDropKpa(totalMassKg, position, wheel, TARGET_DROP);
  const casingKpa = coreKpa * CASING_TERM[wheel.casing];
  const tubesKpa = wheel.tubeless ? 0 : coreKpa * TUBE_TERM;
  const insertKpa = wheel.insert ? coreKpa * INSERT_TERM : 0;
  const paceKpa = coreKpa * PACE_TERM[pace];
  return { coreKpa, casingKpa, tubesKpa, insertKpa, paceKpa, totalKpa: coreKpa + casingKpa + tubesKpa + insertKpa + paceKpa };
}

export type Estimate = { frontKpa: number; rearKpa: number; reasons: Reason[] };

const designation = (w: WheelSetup) => `${Math.round(w.widthMm)}-${w.bsdMm}`;

/** Estimate for both wheels, each term explained. */
export function estimatePressures(input: PressureInput): Estimate {
  const mass = input.riderMassKg + input.bikeMassKg;
  const unit: PressureUnit = input.unit;
  const front = estimateWheel(mass, "front", input.front, input.pace);
  const rear = estimateWheel(mass, "rear", input.rear, input.pace);
  const split = `${Math.round(FRONT_STATIC_SHARE * 100)}/${Math.round((1 - FRONT_STATIC_SHARE) * 100)}`;
  const sizes =
    designation(input.front) === designation(input.rear)
      ? `${designation(input.front)} tyres`
      : `${designation(input.front)} front and ${designation(input.rear)} rear tyres`;
  const reasons: Reason[] = [
    {
      id: "estimate-load",
      text: `Starting point from ${mass.toFixed(1)} kg of rider and bike (${split} split plus riding loads) on ${sizes}, sized for a ${Math.round(TARGET_DROP * 100)} % tyre drop: ${pairText(front.coreKpa, rear.coreKpa, unit)}`,
      frontKpa: front.coreKpa,
      rearKpa: rear.coreKpa,
    },
  ];
  const add = (id: string, label: string, f: number, r: number) => {
    if (isNegligible(f) && isNegligible(r)) return;
    reasons.push({ id, text: `${label}: ${wheelsText(f, r, unit)}`, frontKpa: f, rearKpa: r });
  };
  const casingLabel =
    input.front.casing === input.rear.casing
      ? `${capitalise(input.front.casing)} casing (${percentText(CASING_TERM[input.front.casing])})`
      : `Casings (${input.front.casing} front ${percentText(CASING_TERM[input.front.casing])}, ${input.rear.casing} rear ${percentText(CASING_TERM[input.rear.casing])})`;
  add("estimate-casing", `${casingLabel}; thinner casings need more air to hold their shape`, front.casingKpa, rear.casingKpa);
  add("estimate-tubes", `Inner tubes (${percentText(TUBE_TERM)}) to keep them from pinching`, front.tubesKpa, rear.tubesKpa);
  add("estimate-insert", `Tyre insert (${percentText(INSERT_TERM)}); it backs the tyre up in hard hits`, front.insertKpa, rear.insertKpa);
  add("estimate-pace", `${capitalise(input.pace)} pace (${percentText(PACE_TERM[input.pace])})`, front.paceKpa, rear.paceKpa);
  return { frontKpa: front.totalKpa, rearKpa: rear.totalKpa, reasons };
}

