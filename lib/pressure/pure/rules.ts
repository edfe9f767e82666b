/**
 * Today's tweak: every rule's reason, then the total bounded per wheel (TWEAK_BOUND_KPA) with a
 * reason for whatever the bound removed. Reference surfaces: the baseline's, or dry ground for
 * an estimate (the estimate is calibrated for ordinary dry conditions).
 */
import { formatPressure, type PressureUnit } from "@/lib/shared/units";
import type { Surface, WheelSetup } from "@/lib/pressure/pure/schemas";
import { isNegligible, wheelsText } from "./format";
import { protectedRockReasons, surfaceReasons, slickFeatureReasons } from "./rules-grip";
import { protectionReasons, rimProtected, supportReasons } from "./rules-load";
import type { Basis } from "./steps";
import { TWEAK_BOUND_KPA } from "./settings";
import type { PlannedDay, Reason } from "./types";

export type TweakInput = {
  day: PlannedDay;
  referenceSurfaces: readonly Surface[];
  front: WheelSetup;
  rear: WheelSetup;
  /** The basis each step is a fraction of (trail gauge pressure, kPa). */
  basis: Basis;
  unit: PressureUnit;
};

export type Tweak = { frontKpa: number; rearKpa: number; reasons: Reason[] };

const clamp = (value: number, bound: number) => Math.min(bound, Math.max(-bound, value));

/** All of today's rules for the planned day, bounded per wheel. */
export function todaysTweak(input: TweakInput): Tweak {
  const { day, unit, basis } = input;
  if (day.trails.length === 0) return { frontKpa: 0, rearKpa: 0, reasons: [] };
  const reasons = [
    ...surfaceReasons(day, input.referenceSurfaces, basis, unit),
    ...slickFeatureReasons(day, basis, unit),
    ...protectedRockReasons(day, { front: rimProtected(input.front), rear: rimProtected(input.rear) }, basis, unit),
    ...supportReasons(day, basis, unit),
    ...protectionReasons(day, input.front, input.rear, basis, unit),
  ];
  const rawFront = reasons.reduce((sum, r) => sum + r.frontKpa, 0);
  const rawRear = reasons.reduce((sum, r) => sum + r.rearKpa, 0);
  const frontKpa = clamp(rawFront, TWEAK_BOUND_KPA);
  const rearKpa = clamp(rawRear, TWEAK_BOUND_KPA);
  const cutFront = frontKpa - rawFront;
  const cutRear = rearKpa - rawRear;
  if (!isNegligible(cutFront) || !isNegligible(cutRear)) {
    reasons.push({
      id: "tweak-bound",
      text: `Today's changes are capped at ±${formatPressure(TWEAK_BOUND_KPA, unit)} per wheel: ${wheelsText(cutFront, cutRear, unit)}`,
      frontKpa: cutFront,
      rearKpa: cutRear,
    });
  }
  return { frontKpa, rearKpa, reasons };
}
