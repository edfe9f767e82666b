/**
 * Sag check: sag % = sag at rest ÷ shock stroke (or fork travel). Target bands are common
 * practice, no published standard: rear 25–30 % (some guides 20–30 %); fork 15–25 %. The verdict
 * compares the unrounded percentage; outside SAG_PLAUSIBLE_PERCENT a reading is more likely a
 * misread than a setting, so the answer is "measure again" (common practice, no published source).
 * Follow the suspension maker's own figure when it gives one.
 */
import { AppError } from "@/lib/shared/errors";
import { sagInputSchema, type SagInput } from "@/lib/pressure/pure/schemas";

export const SAG_TARGET_PERCENT = { rear: { min: 25, max: 30 }, fork: { min: 15, max: 25 } } as const;

export const SAG_PLAUSIBLE_PERCENT = { min: 10, max: 45 } as const;

export type SagVerdict = "too-little" | "in-range" | "too-much" | "measure-again";
export type SagResult = { percent: number; min: number; max: number; verdict: SagVerdict; text: string; cautions: string[] };

export const SAG_CAUTIONS = [
  "Never go above the shock's or fork's printed maximum air pressure.",
  "The suspension maker's set-up guide comes first; when in doubt, ask a qualified mechanic.",
] as const;

/** Sag as a percentage of stroke or travel. */
export const sagPercent = (sagMm: number, strokeMm: number) => (sagMm / strokeMm) * 100;

/** Sag percentage and a verdict against the target band for the rear shock or the fork. */
export function checkSag(raw: SagInput | unknown): SagResult {
  const parsed = sagInputSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new AppError(400, issue?.message ?? "Invalid sag measurement.", issue?.path.join(".") || undefined);
  }
  const { end, sagMm, strokeMm } = parsed.data;
  const percent = sagPercent(sagMm, strokeMm);
  const { min, max } = SAG_TARGET_PERCENT[end];
  const shown = `${percent.toFixed(1)} %`;
  const part = end === "rear" ? "shock" : "fork";
  const range = `${min}–${max} %`;
  if (percent < SAG_PLAUSIBLE_PERCENT.min || percent > SAG_PLAUSIBLE_PERCENT.max) {
    return { percent, min, max, verdict: "measure-again", cautions: [...SAG_CAUTIONS], text: `Sag ${shown} is outside anything a ridden ${part} sits at: measure again. Push the O-ring (or a zip tie) against the seal, get on in riding kit in your riding position without bouncing, step off gently, and measure from the seal to the ring against the ${end === "rear" ? "shock's stroke (not the wheel travel)" : "fork's travel"}.` };
  }
  if (percent < min) {
    return { percent, min, max, verdict: "too-little", cautions: [...SAG_CAUTIONS], text: `Sag ${shown} is below the usual ${range}: soften the ${part} spring (less air or a lighter coil) a little, then measure again.` };
  }
  if (percent > max) {
    return { percent, min, max, verdict: "too-much", cautions: [...SAG_CAUTIONS], text: `Sag ${shown} is above the usual ${range}: firm up the ${part} spring (more air or a stiffer coil) a little, then measure again.` };
  }
  return { percent, min, max, verdict: "in-range", cautions: [...SAG_CAUTIONS], text: `Sag ${shown} is within the usual ${range}. Next, set rebound so the bike returns once without a second bounce.` };
}

type SuspensionMeasures = { rearStrokeMm?: number; rearSagMm?: number; forkTravelMm?: number; frontSagMm?: number };

/** Sag checks for whichever ends of a setup have both a sag and a stroke (or travel) measured. */
export function suspensionSag(s: SuspensionMeasures | null | undefined): { rear?: SagResult; fork?: SagResult } {
  const result: { rear?: SagResult; fork?: SagResult } = {};
  const ends = [
    { end: "rear" as const, sagMm: s?.rearSagMm, strokeMm: s?.rearStrokeMm },
    { end: "fork" as const, sagMm: s?.frontSagMm, strokeMm: s?.forkTravelMm },
  ];
  for (const { end, sagMm, strokeMm } of ends) {
    if (sagMm === undefined || strokeMm === undefined) continue;
    const parsed = sagInputSchema.safeParse({ end, sagMm, strokeMm });
    if (parsed.success) result[end] = checkSag(parsed.data);
  }
  return result;
}
