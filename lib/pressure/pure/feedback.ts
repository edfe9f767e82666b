/**
 * After a ride: symptoms per wheel → exactly one suggested baseline change, because changing one
 * thing at a time is how riders learn what works (common practice, no published source).
 * Priority, safety first: rim strike, burp (both can wreck a rim or drop air mid-ride), squirm in
 * berms (the tyre folds), then grip and comfort: sliding, harsh. A safety symptom on both wheels
 * raises both (one change: "more air"); otherwise ties go to the front wheel, whose failure or
 * slide is the likelier crash. The change starts from the pressure actually run, brought to the
 * baseline's ground; sliding on ground less grippy than the baseline's is the ground's doing,
 * and does not lower the baseline. Steps are shares of that pressure (steps.ts).
 */
import { AppError } from "@/lib/shared/errors";
import { formatPressure, type PressureUnit } from "@/lib/shared/units";
import { rideSymptomsSchema, type Surface, type Symptom } from "@/lib/pressure/pure/schemas";
import { leastGrippy } from "./rules-grip";
import { SURFACE_GRIP } from "./settings";
import { relativeStepKpa } from "./steps";
import type { WheelPosition } from "./types";

type Rule = { symptom: Exclude<Symptom, "fine">; fraction: number; why: string };

/** In priority order; fractions of the pressure run (common practice: about 1–1.5 psi for an adult). */
export const FEEDBACK_RULES: readonly Rule[] = [
  { symptom: "rim-strike", fraction: 0.07, why: "rim strikes can crack a rim or cut the tyre" },
  { symptom: "burp", fraction: 0.05, why: "burping lets air out mid-ride and can unseat the tyre" },
  { symptom: "squirm-in-berms", fraction: 0.05, why: "a tyre that squirms in berms is folding under load" },
  { symptom: "sliding", fraction: -0.04, why: "a little less pressure lets the tyre conform and grip" },
  { symptom: "harsh", fraction: -0.04, why: "a little less pressure takes the sting out and keeps the tyre in contact" },
];

/** Without the pressures run (docs, old callers): a typical adult pressure, about 20 psi. */
export const TYPICAL_KPA = 140;

export type WheelLimit = { currentKpa: number; maxKpa: number; floorKpa?: number };

export type FeedbackOptions = {
  unit?: PressureUnit;
  /** The pressure run (on the baseline's ground) and the limits, so a suggestion never crosses them. */
  limits?: { front: WheelLimit; rear: WheelLimit };
  /** The ride's ground and the baseline's, for sliding. */
  surfaces?: readonly Surface[];
  referenceSurfaces?: readonly Surface[];
};

export type FeedbackSuggestion = {
  wheel: WheelPosition | "both" | null;
  symptom: Symptom | null;
  /** The change on the wheel named (the front's when both change). */
  deltaKpa: number;
  /** Per wheel, and the baseline it proposes (pressure run + change); absent when nothing changes. */
  deltas?: { frontKpa: number; rearKpa: number };
  proposedKpa?: { frontKpa: number; rearKpa: number };
  reason: string;
};

const WHEELS: readonly WheelPosition[] = ["front", "rear"];
const SAFETY: readonly Symptom[] = ["rim-strike", "burp", "squirm-in-berms"];
const capital = (w: string) => w.charAt(0).toUpperCase() + w.slice(1);
const label = (s: Symptom) => s.replace(/-/g, " ");

/** Was the ride's ground less grippy than the baseline's? */
const slickerThanBaseline = (options: FeedbackOptions) => {
  const day = SURFACE_GRIP[leastGrippy(options.surfaces ?? []) ?? "dry"][0];
  const ref = SURFACE_GRIP[leastGrippy(options.referenceSurfaces ?? []) ?? "dry"][0];
  return day < ref;
};

/** One suggested change to the baseline for the next ride. */
export function suggestBaselineChange(raw: unknown, options: FeedbackOptions = {}): FeedbackSuggestion {
  const parsed = rideSymptomsSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new AppError(400, issue?.message ?? "Invalid ride log.", issue?.path.join(".") || undefined);
  }
  const unit = options.unit ?? "psi";
  let slidOnSlickGround = false;
  for (const rule of FEEDBACK_RULES) {
    const wheels = WHEELS.filter((w) => parsed.data[w].includes(rule.symptom));
    if (wheels.length === 0) continue;
    if (rule.symptom === "sliding" && slickerThanBaseline(options)) {
      slidOnSlickGround = true;
      continue;
    }
    const changed = wheels.length === 2 && SAFETY.includes(rule.symptom) ? wheels : [wheels[0]];
    return limited(changed, rule, options, unit);
  }
  if (slidOnSlickGround) {
    return { wheel: null, symptom: "sliding", deltaKpa: 0, reason: "Sliding on ground slicker than your baseline's is the ground, not the baseline: today's band already lowers for it. Keep the baseline as it is." };
  }
  return { wheel: null, symptom: null, deltaKpa: 0, reason: "Both tyres felt fine: keep the baseline as it is." };
}

function limited(wheels: WheelPosition[], rule: Rule, options: FeedbackOptions, unit: PressureUnit): FeedbackSuggestion {
  const limit = (w: WheelPosition): WheelLimit => options.limits?.[w] ?? { currentKpa: TYPICAL_KPA, maxKpa: Infinity };
  const deltaFor = (w: WheelPosition) => {
    if (!wheels.includes(w)) return 0;
    const l = limit(w);
    let delta = relativeStepKpa(rule.fraction, l.currentKpa);
    if (delta > 0) delta = Math.max(0, Math.min(delta, l.maxKpa - l.currentKpa));
    if (delta < 0 && l.floorKpa !== undefined) delta = Math.min(0, Math.max(delta, l.floorKpa - l.currentKpa));
    return delta;
  };
  const deltas = { frontKpa: deltaFor("front"), rearKpa: deltaFor("rear") };
  const wheel = wheels.length === 2 ? "both" : wheels[0];
  const who = wheels.length === 2 ? "Both wheels" : capital(wheels[0]);
  const main = wheels[0] === "front" ? deltas.frontKpa : deltas.rearKpa;
  if (wheels.every((w) => (w === "front" ? deltas.frontKpa : deltas.rearKpa) === 0)) {
    const reason = rule.fraction > 0
      ? `${who} ${label(rule.symptom)}, but the tyre is already at its printed maximum: do not add air. Consider a tougher casing or an insert, and ask a qualified mechanic.`
      : `${who} ${label(rule.symptom)}, but going lower risks rim strikes and burping: keep the baseline and look at other set-up (tyre, suspension).`;
    return { wheel, symptom: rule.symptom, deltaKpa: 0, reason };
  }
  const steps = wheels.map((w) => `${formatPressure(w === "front" ? deltas.frontKpa : deltas.rearKpa, unit, { signed: true })} ${w}`).join(", ");
  const full = wheels.every((w) => (w === "front" ? deltas.frontKpa : deltas.rearKpa) === relativeStepKpa(rule.fraction, limit(w).currentKpa));
  const proposedKpa = options.limits ? { frontKpa: limit("front").currentKpa + deltas.frontKpa, rearKpa: limit("rear").currentKpa + deltas.rearKpa } : undefined;
  return {
    wheel, symptom: rule.symptom, deltaKpa: main, deltas, ...(proposedKpa ? { proposedKpa } : {}),
    reason: `${who} ${label(rule.symptom)}: ${steps} from what you ran${full ? "" : " (as far as the limit allows)"}, because ${rule.why}. Change only this, then ride again.`,
  };
}
