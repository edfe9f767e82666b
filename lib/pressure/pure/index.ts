/**
 * The pressure engine: basis (the rider's baseline, else the estimate) → today's tweak →
 * limits and band → what to pump to now → cautions. Every non-zero contribution is a reason:
 * reasons not prefixed "pump-" add up to each wheel's target; "pump-" reasons add up from the
 * target to pumpToKpa. Pure: no I/O, and only AppError is ever thrown (for invalid input).
 */
import { AppError } from "@/lib/shared/errors";
import { formatTemperature, KPA_PER_PSI, type PressureUnit } from "@/lib/shared/units";
import { pressureInputSchema, type PressureInput, type PressureInputRaw, type Surface, type WheelSetup } from "@/lib/pressure/pure/schemas";
import { standardPressureKpa } from "@/lib/pressure/pure/physics/atmosphere";
import { baselineOnTrail } from "./baseline";
import { learnFromRides, slickGroundReason } from "./learning";
import { halfWidthKpa, uncertaintyParts, type BasisKind } from "./uncertainty";
import { limitWheel, wheelLimits, type LimitedWheel } from "./band";
import { ESTIMATE_CAUTION, pumpCaution, reportCautions, STANDARD_CAUTIONS } from "./cautions";
import { planDay } from "./conditions";
import { estimatePressures } from "./estimate";
import { isNegligible, pairText, wheelsText } from "./format";
import { pumpConditions, pumpPlan, pumpReasons, type PumpPlan } from "./pump";
import { todaysTweak } from "./rules";
import type { PlannedDay, PlannedTrail, PressureResult, Reason, WheelBand, WheelPosition } from "./types";

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

type Basis = {
  kind: BasisKind;
  frontKpa: number;
  rearKpa: number;
  reasons: Reason[];
  referenceSurfaces: readonly Surface[];
  ridesHalfKpa?: { front: number; rear: number };
};

/**
 * The basis in trail gauge pressure (what felt right on the trail): the rider's own rides when
 * there are enough, else the baseline carried from where it was checked to where it was ridden
 * (Gay-Lussac, ISO 2533), else the estimate. Today's pump reading is worked out from it in pump.ts.
 */
function basisOf(input: PressureInput, day: PlannedDay): Basis {
  const { baseline, unit } = input;
  const reference = baseline?.surfaces ?? (["dry"] as const);
  const learned = learnFromRides(input.rides, reference, unit);
  if (learned) {
    const slick = slickGroundReason(learned, day, unit);
    const reasons = slick ? [...learned.reasons, slick] : learned.reasons;
    const [f, r] = [learned.front.centreKpa + (slick?.frontKpa ?? 0), learned.rear.centreKpa + (slick?.rearKpa ?? 0)];
    return { kind: "rides", frontKpa: f, rearKpa: r, reasons, referenceSurfaces: reference, ridesHalfKpa: { front: learned.front.halfKpa, rear: learned.rear.halfKpa } };
  }
  if (!baseline) return { kind: "estimate", ...estimatePressures(input), referenceSurfaces: reference };
  const checked = baseline.temperatureC === undefined ? "" : ` at ${formatTemperature(baseline.temperatureC)}`;
  const reasons: Reason[] = [{
    id: "basis-baseline",
    text: `Your baseline, checked${checked} on ${baseline.surfaces.join(", ")} ground: ${pairText(baseline.frontKpa, baseline.rearKpa, unit)}`,
    frontKpa: baseline.frontKpa,
    rearKpa: baseline.rearKpa,
  }];
  const trail = baselineOnTrail(baseline);
  const [df, dr] = [trail.frontKpa - baseline.frontKpa, trail.rearKpa - baseline.rearKpa];
  if (!isNegligible(df) || !isNegligible(dr)) {
    reasons.push({ id: "basis-ride-conditions", text: `${trail.how}, so on the trail it read: ${wheelsText(df, dr, unit)}`, frontKpa: df, rearKpa: dr });
  }
  return { kind: "baseline", frontKpa: trail.frontKpa, rearKpa: trail.rearKpa, reasons, referenceSurfaces: baseline.surfaces };
}

/** Today's pressure band for both wheels, with reasons and cautions. */
export function computePressureBand(raw: PressureInput | PressureInputRaw): PressureResult {
  const input = parsePressureInput(raw);
  const { unit } = input;
  const mass = input.riderMassKg + input.bikeMassKg;
  const day = planDay(input.today);
  const base = basisOf(input, day);
  const tweak = todaysTweak({ day, referenceSurfaces: base.referenceSurfaces, front: input.front, rear: input.rear, basis: base, unit });

  const conditions = pumpConditions(input.today);
  const spread = {
    lowestElevationM: Math.min(input.today?.lowestElevationM ?? conditions.rideElevationM, conditions.rideElevationM),
    highestElevationM: Math.max(input.today?.highestElevationM ?? conditions.rideElevationM, conditions.rideElevationM),
    rideTemperatureC: conditions.rideTemperatureC,
    rideElevationM: conditions.rideElevationM,
  };
  // The gauge reads more where the air is thinner: hold the target so the top of the day stays under the maximum.
  const summitRiseKpa = standardPressureKpa(conditions.rideElevationM) - standardPressureKpa(spread.highestElevationM);
  // The floor takes the worst planned trail: a drop or a rock garden anywhere in the plan lifts it.
  const hardHit = day.trails.find((t) => t.features.includes("drop") || t.features.includes("rock-garden"));
  const limit = (position: WheelPosition, requested: number) => {
    const limits = wheelLimits(mass, position, input[position], Boolean(hardHit));
    const held = { ...limits, maxKpa: limits.maxKpa - summitRiseKpa };
    const parts = uncertaintyParts(Math.min(Math.max(requested, held.floorKpa), held.maxKpa), base.kind, spread, base.ridesHalfKpa?.[position]);
    return { ...limitWheel(requested, held, halfWidthKpa(parts), position, unit), parts, printedMaxKpa: limits.maxKpa };
  };
  const front = limit("front", base.frontKpa + tweak.frontKpa);
  const rear = limit("rear", base.rearKpa + tweak.rearKpa);

  const frontPump = pumpPlan(front.target.targetKpa, conditions, front.printedMaxKpa);
  const rearPump = pumpPlan(rear.target.targetKpa, conditions, rear.printedMaxKpa);

  const reasons: Reason[] = [
    ...foldSmall([...base.reasons, ...tweak.reasons, ...limitReasons(front, rear, { summitRiseKpa, highestM: spread.highestElevationM, hardHit: hardHit && hitText(day, hardHit) }, unit)], "small-adjustments", unit),
    ...foldSmall(pumpReasons(frontPump, rearPump, conditions, unit), "pump-small", unit),
  ];
  const cautions = [
    ...front.cautions,
    ...rear.cautions,
    ...pumpCautions(frontPump, front, "front", unit),
    ...pumpCautions(rearPump, rear, "rear", unit),
    ...rearBelowFrontCaution(input, front.target.targetKpa, rear.target.targetKpa),
    ...(base.kind === "estimate" ? [ESTIMATE_CAUTION] : []),
    ...reportCautions(day),
    ...STANDARD_CAUTIONS,
  ];
  return {
    basis: base.kind,
    front: wheelBand(front, base.frontKpa, frontPump.pumpToKpa),
    rear: wheelBand(rear, base.rearKpa, rearPump.pumpToKpa),
    reasons: reasons.map((r) => ({ ...r, frontKpa: round1(r.frontKpa), rearKpa: round1(r.rearKpa) })),
    cautions,
    uncertainty: { front: front.parts, rear: rear.parts },
  };
}

/** Contributions smaller than this (0.2 psi) on both wheels are summed into one "small adjustments" reason. */
export const SMALL_REASON_KPA = 0.2 * KPA_PER_PSI;
const BASIS_IDS = /^(basis-|estimate-)/;

function foldSmall(reasons: Reason[], id: string, unit: PressureUnit): Reason[] {
  const small = reasons.filter((r) => !BASIS_IDS.test(r.id) && Math.abs(r.frontKpa) < SMALL_REASON_KPA && Math.abs(r.rearKpa) < SMALL_REASON_KPA);
  if (small.length < 1) return reasons;
  const kept = reasons.filter((r) => !small.includes(r));
  const f = small.reduce((a, r) => a + r.frontKpa, 0);
  const r = small.reduce((a, x) => a + x.rearKpa, 0);
  if (isNegligible(f) && isNegligible(r)) return kept;
  const what = small.map((x) => { const head = x.text.split(":")[0]; return head.charAt(0).toLowerCase() + head.slice(1); }).join("; ");
  return [...kept, { id, text: `Small adjustments (${what}): ${wheelsText(f, r, unit)}`, frontKpa: f, rearKpa: r }];
}

const sameTyre = (a: WheelSetup, b: WheelSetup) =>
  a.bsdMm === b.bsdMm && a.widthMm === b.widthMm && a.casing === b.casing && a.tubeless === b.tubeless && a.insert === b.insert;

function rearBelowFrontCaution(input: PressureInput, frontKpa: number, rearKpa: number): string[] {
  if (!sameTyre(input.front, input.rear) || rearKpa >= frontKpa) return [];
  return ["The rear is below the front on the same tyres: riders usually run the rear about 2–4 psi higher, because it carries more of the weight. Check your baseline."];
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

/** "the drop on Quarry Drop", or "today's drops" for whole-day conditions. */
const hitText = (day: PlannedDay, trail: PlannedTrail) =>
  `${trail.features.includes("drop") ? "drop" : "rock garden"}${day.scope === "day" ? " planned today" : ` on ${trail.name}`}`;

type LimitContext = { summitRiseKpa: number; highestM: number; hardHit: string | false | undefined };

function limitReasons(front: LimitedWheel, rear: LimitedWheel, { summitRiseKpa, highestM, hardHit }: LimitContext, unit: PressureUnit): Reason[] {
  const top = summitRiseKpa > 0.05 ? `, so the gauge stays under it at the top of the day (${Math.round(highestM)} m)` : "";
  const hit = hardHit ? ` (higher for the ${hardHit})` : "";
  const up = (w: LimitedWheel) => Math.max(0, w.target.adjustmentKpa);
  const down = (w: LimitedWheel) => Math.min(0, w.target.adjustmentKpa);
  const items = [
    { id: "limit-floor", label: `Held at the floor for rim strikes and burping${hit}`, f: up(front), r: up(rear) },
    { id: "limit-max", label: `Held at the printed maximum (tyre or rim, whichever is lower)${top}`, f: down(front), r: down(rear) },
  ];
  return items
    .filter((item) => !(isNegligible(item.f) && isNegligible(item.r)))
    .map((item) => ({ id: item.id, text: `${item.label}: ${wheelsText(item.f, item.r, unit)}`, frontKpa: item.f, rearKpa: item.r }));
}

function pumpCautions(plan: PumpPlan, wheel: LimitedWheel, position: WheelPosition, unit: PressureUnit): string[] {
  return plan.binding === "none" ? [] : [pumpCaution(position, plan.binding, unit, wheel.limits.maxKpa)];
}
