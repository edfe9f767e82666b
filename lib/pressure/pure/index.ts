/**
 * The pressure engine: basis (the rider's baseline, else the estimate) → today's tweak →
 * limits and band → what to pump to now → cautions. Every non-zero contribution is a reason:
 * reasons not prefixed "pump-" add up to each wheel's target; "pump-" reasons add up from the
 * target to pumpToKpa. Pure: no I/O, and only AppError is ever thrown (for invalid input).
 */
import { AppError } from "@/lib/shared/errors";
import { formatTemperature, type PressureUnit } from "@/lib/shared/units";
import { pressureInputSchema, type PressureInput, type PressureInputRaw } from "@/lib/pressure/pure/schemas";
import { limitWheel, wheelLimits, type LimitedWheel } from "./band";
import { ESTIMATE_CAUTION, pumpCaution, reportCautions, STANDARD_CAUTIONS } from "./cautions";
import { planDay } from "./conditions";
import { estimatePressures } from "./estimate";
import { isNegligible, pairText, wheelsText } from "./format";
import { pumpConditions, pumpPlan, pumpReasons, type PumpPlan } from "./pump";
import { todaysTweak } from "./rules";
import type { PressureResult, Reason, WheelBand, WheelPosition } from "./types";

export type { PressureResult, Reason, WheelBand } from "./types";
export { PUMP_REASON_PREFIX } from "./types";
export { inputFromRequest } from "./conditions";

/** Validates engine input; any problem becomes an AppError naming the failing field. */
export function parsePressureInput(raw: unknown): PressureInput {
  const parsed = pressureInputSchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  throw new AppError(400, issue?.message ?? "Invalid pressure request.", issue?.path.join(".") || undefined);
}

/** Rounds to 0.1 kPa, halves away from zero so a reported contribution never rounds to 0. */
const round1 = (kPa: number) => (Math.sign(kPa) * Math.round(Math.abs(kPa) * 10)) / 10 + 0;

/**
 * The baseline is the gauge pressure that felt right, checked at its reference temperature in
 * riding conditions. Support depends on gauge pressure on the trail, so the target keeps that
 * gauge value; the temperature and elevation of today are handled in the pump reading.
 */
function basisOf(input: PressureInput) {
  const { baseline, unit } = input;
  if (!baseline) return { basis: "estimate" as const, ...estimatePressures(input), referenceSurfaces: ["dry" as const] };
  const checked = baseline.temperatureC === undefined ? "" : ` at ${formatTemperature(baseline.temperatureC)}`;
  const reason: Reason = {
    id: "basis-baseline",
    text: `Your baseline, checked${checked} on ${baseline.surfaces.join(", ")} ground: ${pairText(baseline.frontKpa, baseline.rearKpa, unit)}`,
    frontKpa: baseline.frontKpa,
    rearKpa: baseline.rearKpa,
  };
  return {
    basis: "baseline" as const,
    frontKpa: baseline.frontKpa,
    rearKpa: baseline.rearKpa,
    reasons: [reason],
    referenceSurfaces: baseline.surfaces,
  };
}

/** Today's pressure band for both wheels, with reasons and cautions. */
export function computePressureBand(raw: PressureInput | PressureInputRaw): PressureResult {
  const input = parsePressureInput(raw);
  const { unit, pace } = input;
  const mass = input.riderMassKg + input.bikeMassKg;
  const day = planDay(input.today);
  const base = basisOf(input);
  const tweak = todaysTweak({ day, referenceSurfaces: base.referenceSurfaces, front: input.front, rear: input.rear, pace, unit });

  const limit = (position: WheelPosition, requested: number) =>
    limitWheel(requested, wheelLimits(mass, position, input[position]), base.basis, position, unit);
  const front = limit("front", base.frontKpa + tweak.frontKpa);
  const rear = limit("rear", base.rearKpa + tweak.rearKpa);

  const conditions = pumpConditions(input.today);
  const frontPump = pumpPlan(front.target.targetKpa, conditions, front.limits.maxKpa);
  const rearPump = pumpPlan(rear.target.targetKpa, conditions, rear.limits.maxKpa);

  const reasons: Reason[] = [
    ...base.reasons,
    ...tweak.reasons,
    ...limitReasons(front, rear, unit),
    ...pumpReasons(frontPump, rearPump, conditions, unit),
  ];
  const cautions = [
    ...front.cautions,
    ...rear.cautions,
    ...pumpCautions(frontPump, front, "front", unit),
    ...pumpCautions(rearPump, rear, "rear", unit),
    ...(base.basis === "estimate" ? [ESTIMATE_CAUTION] : []),
    ...reportCautions(day),
    ...STANDARD_CAUTIONS,
  ];
  return {
    basis: base.basis,
    front: wheelBand(front, base.frontKpa, frontPump.pumpToKpa),
    rear: wheelBand(rear, base.rearKpa, rearPump.pumpToKpa),
    reasons: reasons.map((r) => ({ ...r, frontKpa: round1(r.frontKpa), rearKpa: round1(r.rearKpa) })),
    cautions,
  };
}

/** Rounded band; rounding is monotone, and the min keeps every value at or under the maximum. */
function wheelBand(wheel: LimitedWheel, basisKpa: number, pumpToKpa: number): WheelBand {
  const within = (kPa: number) => Math.min(round1(kPa), wheel.limits.maxKpa);
  return {
    lowKpa: within(wheel.edges.lowKpa),
    targetKpa: within(wheel.target.targetKpa),
    highKpa: within(wheel.edges.highKpa),
    deltaKpa: round1(wheel.target.targetKpa - basisKpa),
    pumpToKpa: within(pumpToKpa),
  };
}

function limitReasons(front: LimitedWheel, rear: LimitedWheel, unit: PressureUnit): Reason[] {
  const up = (w: LimitedWheel) => Math.max(0, w.target.adjustmentKpa);
  const down = (w: LimitedWheel) => Math.min(0, w.target.adjustmentKpa);
  const items = [
    { id: "limit-floor", label: "Held at the floor for rim strikes and burping", f: up(front), r: up(rear) },
    { id: "limit-max", label: "Held at the printed maximum (tyre or rim, whichever is lower)", f: down(front), r: down(rear) },
  ];
  return items
    .filter((item) => !(isNegligible(item.f) && isNegligible(item.r)))
    .map((item) => ({ id: item.id, text: `${item.label}: ${wheelsText(item.f, item.r, unit)}`, frontKpa: item.f, rearKpa: item.r }));
}

function pumpCautions(plan: PumpPlan, wheel: LimitedWheel, position: WheelPosition, unit: PressureUnit): string[] {
  return plan.binding === "none" ? [] : [pumpCaution(position, plan.binding, unit, wheel.limits.maxKpa)];
}
