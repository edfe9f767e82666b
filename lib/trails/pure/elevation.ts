import { CLIMB_THRESHOLD_M, GRADE_WINDOW_M } from "./limits";

/**
 * Climb and descent of one segment with a noise threshold (hysteresis). A change is counted only
 * once the elevation has moved at least `thresholdM` from the last accepted pivot; the pivot then
 * moves there. GPS jitter smaller than the threshold is never counted, while a real climb is
 * counted in full: at the end the remainder since the last pivot is added, so
 * ascent − descent always equals the segment's net change.
 */
export function climbAndDescent(elevations: ArrayLike<number>, thresholdM = CLIMB_THRESHOLD_M): { ascentM: number; descentM: number } {
  let ascentM = 0;
  let descentM = 0;
  if (elevations.length === 0) return { ascentM, descentM };
  let pivot = elevations[0];
  for (let i = 1; i < elevations.length; i++) {
    const change = elevations[i] - pivot;
    if (change >= thresholdM) ascentM += change;
    else if (change <= -thresholdM) descentM -= change;
    else continue;
    pivot = elevations[i];
  }
  const remainder = elevations[elevations.length - 1] - pivot;
  if (remainder > 0) ascentM += remainder;
  else descentM -= remainder;
  return { ascentM, descentM };
}

/**
 * Steepest absolute grade (%) of one segment over a sliding distance window: for each point, the
 * grade to the first point at least `windowM` further along. A segment shorter than the window is
 * measured end to end. Returns null for a segment with no length.
 */
export function steepestGradePct(distancesM: ArrayLike<number>, elevations: ArrayLike<number>, windowM = GRADE_WINDOW_M): number | null {
  const n = distancesM.length;
  if (n < 2 || distancesM[n - 1] <= 0) return null;
  if (distancesM[n - 1] < windowM) return (Math.abs(elevations[n - 1] - elevations[0]) / distancesM[n - 1]) * 100;
  let steepest = 0;
  let j = 0;
  for (let i = 0; i < n; i++) {
    while (j < n - 1 && distancesM[j] - distancesM[i] < windowM) j++;
    const run = distancesM[j] - distancesM[i];
    if (run < windowM) break; // no full window left from here on
    steepest = Math.max(steepest, Math.abs(elevations[j] - elevations[i]) / run);
  }
  return steepest * 100;
}
