/**
 * After a ride: symptoms per wheel → exactly one suggested baseline change, because changing one
 * thing at a time is how riders learn what works (common practice, no published source).
 * Priority, safety first: rim strike, burp (both can wreck a rim or drop air mid-ride), squirm in
 * berms (the tyre folds), then grip and comfort: sliding, harsh. Ties go to the front wheel,
 * whose failure or slide is the likelier crash. Step sizes are common practice (about 1 psi).
 */
import { AppError } from "@/lib/shared/errors";
import { formatPressure, type PressureUnit } from "@/lib/shared/units";
import { rideSymptomsSchema, type Symptom } from "@/lib/pressure/pure/schemas";
import type { WheelPosition } from "./types";

type Rule = { symptom: Exclude<Symptom, "fine">; deltaKpa: number; why: string };

/** In priority order. */
export const FEEDBACK_RULES: readonly Rule[] = [
  { symptom: "rim-strike", deltaKpa: 10, why: "rim strikes can crack a rim or cut the tyre" },
  { symptom: "burp", deltaKpa: 7, why: "burping lets air out mid-ride and can unseat the tyre" },
  { symptom: "squirm-in-berms", deltaKpa: 7, why: "a tyre that squirms in berms is folding under load" },
  { symptom: "sliding", deltaKpa: -5, why: "a little less pressure lets the tyre conform and grip" },
  { symptom: "harsh", deltaKpa: -5, why: "a little less pressure takes the sting out and keeps the tyre in contact" },
];

export type WheelLimit = { currentKpa: number; maxKpa: number; floorKpa?: number };

export type FeedbackOptions = {
  unit?: PressureUnit;
  /** The saved baseline and limits, so a suggestion never crosses them. */
  limits?: { front: WheelLimit; rear: WheelLimit };
};

export type FeedbackSuggestion = {
  wheel: WheelPosition | null;
  symptom: Symptom | null;
  deltaKpa: number;
  reason: string;
};

const WHEELS: readonly WheelPosition[] = ["front", "rear"];

/** One suggested change to the baseline for the next ride. */
export function suggestBaselineChange(raw: unknown, options: FeedbackOptions = {}): FeedbackSuggestion {
  const parsed = rideSymptomsSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new AppError(400, issue?.message ?? "Invalid ride log.", issue?.path.join(".") || undefined);
  }
  const unit = options.unit ?? "psi";
  for (const rule of FEEDBACK_RULES) {
    for (const wheel of WHEELS) {
      if (!parsed.data[wheel].includes(rule.symptom)) continue;
      return limited(wheel, rule, options.limits?.[wheel], unit);
    }
  }
  return { wheel: null, symptom: null, deltaKpa: 0, reason: "Both tyres felt fine: keep the baseline as it is." };
}

function limited(wheel: WheelPosition, rule: Rule, limit: WheelLimit | undefined, unit: PressureUnit): FeedbackSuggestion {
  const label = rule.symptom.replace(/-/g, " ");
  let delta = rule.deltaKpa;
  if (limit && delta > 0) delta = Math.min(delta, limit.maxKpa - limit.currentKpa);
  if (limit?.floorKpa !== undefined && delta < 0) delta = Math.max(delta, limit.floorKpa - limit.currentKpa);
  const step = formatPressure(delta, unit, { signed: true });
  if (rule.deltaKpa > 0 && delta <= 0) {
    return {
      wheel, symptom: rule.symptom, deltaKpa: 0,
      reason: `${capital(wheel)} ${label}, but the tyre is already at its printed maximum: do not add air. Consider a tougher casing or an insert, and ask a qualified mechanic.`,
    };
  }
  if (rule.deltaKpa < 0 && delta >= 0) {
    return {
      wheel, symptom: rule.symptom, deltaKpa: 0,
      reason: `${capital(wheel)} ${label}, but going lower risks rim strikes and burping: keep the baseline and look at other set-up (tyre, suspension).`,
    };
  }
  const clipped = delta === rule.deltaKpa ? "" : " (as far as the limit allows)";
  return {
    wheel, symptom: rule.symptom, deltaKpa: delta,
    reason: `${capital(wheel)} ${label}: ${step} ${wheel}${clipped}, because ${rule.why}. Change only this, then ride again.`,
  };
}

const capital = (w: WheelPosition) => (w === "front" ? "Front" : "Rear");
