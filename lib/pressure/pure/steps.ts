/** Today's steps as fractions of the basis, held between a minimum and a maximum size (settings.ts). */
import { STEP_MAX_KPA, STEP_MIN_KPA } from "./settings";

/** A step of `fraction` × basis (kPa), its size held in [STEP_MIN_KPA, STEP_MAX_KPA]; zero stays zero. */
export function relativeStepKpa(fraction: number, basisKpa: number): number {
  if (fraction === 0 || basisKpa <= 0) return 0;
  const size = Math.min(STEP_MAX_KPA, Math.max(STEP_MIN_KPA, Math.abs(fraction) * basisKpa));
  return Math.sign(fraction) * size;
}

export type Basis = { frontKpa: number; rearKpa: number };

/** [front, rear] fractions → [front, rear] kPa for this basis, scaled by a share (0…1). */
export const stepsKpa = (fractions: readonly [number, number] | readonly number[], basis: Basis, share = 1): [number, number] => [
  relativeStepKpa(fractions[0], basis.frontKpa) * share,
  relativeStepKpa(fractions[1], basis.rearKpa) * share,
];
