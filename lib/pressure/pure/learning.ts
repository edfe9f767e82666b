/**
 * Learning a rider's own range from their ride logs (interval censoring). Each log's pressure is
 * first brought to the reference ground (that day's grip step taken out), then read per wheel:
 * - rim strike, burp or squirm in berms: the right pressure is above it (a lower bound);
 * - harsh, or sliding on grippy ground: the right pressure is below it (an upper bound);
 * - sliding on slick or loose ground (wet, damp, muddy, dusty…): an upper bound for ground that
 *   slick only, kept apart (`slickHighs`) so it never lowers the range on dry ground; on a day
 *   whose trails are at least as slick, `slickGroundReason` holds the basis under it;
 * - felt fine: a point inside the range.
 * The best guess is the mean of the fine rides held inside the bracket (the bracket's middle when
 * none felt fine); its ± shrinks with the number of rides (÷√n) and never exceeds half the
 * bracket. Bounds that cross (a rim strike above a harsh ride) contradict each other: the ± then
 * spans them, and the reason says so.
 */
import { formatBandPressure, type PressureUnit } from "@/lib/shared/units";
import type { RideEvidence, Surface, Symptom } from "@/lib/pressure/pure/schemas";
import { GROUND_WORDS, leastGrippy } from "./rules-grip";
import { wheelsText } from "./format";
import { ESTIMATE_UNCERTAINTY, MAX_LEARNING_LOGS, MIN_LEARNING_LOGS, ONE_SIDED_STEP, SURFACE_GRIP } from "./settings";
import { relativeStepKpa } from "./steps";
import type { PlannedDay, Reason, WheelPosition } from "./types";

const TOO_SOFT: readonly Symptom[] = ["rim-strike", "burp", "squirm-in-berms"];

/** A slide on slick ground: an upper bound on the reference ground (that day's grip step taken out), for ground at least as slick. */
export type SlickHigh = { kpa: number; surface: Surface };
export type WheelLearning = { centreKpa: number; halfKpa: number; lowKpa?: number; highKpa?: number; slickHighs: SlickHigh[]; contradictory: boolean; rides: number };
export type Learning = { front: WheelLearning; rear: WheelLearning; reasons: Reason[]; rides: number };

/** The log's pressure on the reference ground: that day's grip step taken back out. */
export function onReferenceGround(ranKpa: number, surfaces: readonly Surface[], reference: readonly Surface[], position: WheelPosition): number {
  const i = position === "front" ? 0 : 1;
  const day = SURFACE_GRIP[leastGrippy(surfaces) ?? "dry"][i];
  const ref = SURFACE_GRIP[leastGrippy(reference) ?? "dry"][i];
  return ranKpa - relativeStepKpa(day - ref, ranKpa);
}

const grippyDay = (surfaces: readonly Surface[]) => SURFACE_GRIP[leastGrippy(surfaces) ?? "dry"][0] === 0;
const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

function learnWheel(logs: readonly RideEvidence[], reference: readonly Surface[], position: WheelPosition): WheelLearning {
  const lows: number[] = [];
  const highs: number[] = [];
  const fines: number[] = [];
  const slickHighs: SlickHigh[] = [];
  for (const log of logs) {
    const p = onReferenceGround(position === "front" ? log.frontKpa : log.rearKpa, log.surfaces, reference, position);
    const symptoms = log.symptoms[position];
    if (symptoms.some((s) => TOO_SOFT.includes(s))) lows.push(p);
    else if (symptoms.includes("harsh") || (symptoms.includes("sliding") && grippyDay(log.surfaces))) highs.push(p);
    else if (symptoms.includes("sliding")) slickHighs.push({ kpa: p, surface: leastGrippy(log.surfaces)! });
    else if (symptoms.length === 0 || symptoms.includes("fine")) fines.push(p);
  }
  const low = lows.length ? Math.max(...lows) : undefined;
  const high = highs.length ? Math.min(...highs) : undefined;
  const all = [...lows, ...highs, ...fines];
  const typical = all.length ? mean(all) : 0;
  const spreadKpa = (ESTIMATE_UNCERTAINTY * typical) / Math.sqrt(Math.max(1, logs.length));
  if (low !== undefined && high !== undefined && low >= high) {
    return { centreKpa: (low + high) / 2, halfKpa: (low - high) / 2 + spreadKpa, lowKpa: low, highKpa: high, slickHighs, contradictory: true, rides: logs.length };
  }
  let centre = fines.length ? mean(fines) : low !== undefined && high !== undefined ? (low + high) / 2 : typical;
  if (low !== undefined) centre = Math.max(centre, low + (high === undefined ? ONE_SIDED_STEP * low : 0));
  if (high !== undefined) centre = Math.min(centre, high - (low === undefined ? ONE_SIDED_STEP * high : 0));
  const half = low !== undefined && high !== undefined ? Math.min(spreadKpa, (high - low) / 2) : spreadKpa;
  return { centreKpa: centre, halfKpa: half, lowKpa: low, highKpa: high, slickHighs, contradictory: false, rides: logs.length };
}

const SYMPTOM_WORDS: Record<Exclude<Symptom, "fine">, string> = {
  "rim-strike": "rim strikes", burp: "burping", "squirm-in-berms": "squirm in berms", harsh: "harsh", sliding: "sliding",
};

function bracketText(logs: readonly RideEvidence[], w: WheelLearning, position: WheelPosition, unit: PressureUnit): string {
  const named = (bound: number | undefined, symptoms: readonly Symptom[]) => {
    if (bound === undefined) return undefined;
    const which = logs.flatMap((l) => l.symptoms[position]).find((s): s is Exclude<Symptom, "fine"> => symptoms.includes(s) && s !== "fine");
    return `${which ? SYMPTOM_WORDS[which] : "trouble"} at ${formatBandPressure(bound, unit)}`;
  };
  const parts = [named(w.lowKpa, TOO_SOFT), named(w.highKpa, ["harsh", "sliding"])].filter(Boolean);
  return parts.length ? `${position} ${parts.join(", ")}` : `${position} felt fine`;
}

/** The rider's own range per wheel from two or more logs of this setup, or null with fewer. */
export function learnFromRides(raw: readonly RideEvidence[] | undefined, reference: readonly Surface[], unit: PressureUnit): Learning | null {
  const logs = (raw ?? []).slice(0, MAX_LEARNING_LOGS);
  if (logs.length < MIN_LEARNING_LOGS) return null;
  const front = learnWheel(logs, reference, "front");
  const rear = learnWheel(logs, reference, "rear");
  const disagree = front.contradictory || rear.contradictory;
  const text =
    `From ${logs.length} of your rides on this setup (${bracketText(logs, front, "front", unit)}; ${bracketText(logs, rear, "rear", unit)})` +
    (disagree ? ", which disagree with each other: the band is wider until more rides settle it" : "") +
    `: ${formatBandPressure(front.centreKpa, unit)} front, ${formatBandPressure(rear.centreKpa, unit)} rear`;
  return { front, rear, rides: logs.length, reasons: [{ id: disagree ? "basis-rides-disagree" : "basis-rides", text, frontKpa: front.centreKpa, rearKpa: rear.centreKpa }] };
}

/**
 * How far one wheel's learned basis comes down on one of today's trails: under the lowest slide
 * seen on ground no slicker than this trail's (less a one-sided step, as for any upper bound),
 * never below a rim-strike or burp bound (safety comes first). Zero on grippier ground.
 */
function slickDrop(w: WheelLearning, surfaces: readonly Surface[], position: WheelPosition): { kpa: number; from?: SlickHigh } {
  const i = position === "front" ? 0 : 1;
  const grip = SURFACE_GRIP[leastGrippy(surfaces) ?? "dry"][i];
  const applicable = w.slickHighs.filter((h) => grip <= SURFACE_GRIP[h.surface][i]);
  if (!applicable.length) return { kpa: 0 };
  const from = applicable.reduce((a, b) => (b.kpa < a.kpa ? b : a));
  const cap = Math.max(from.kpa * (1 - ONE_SIDED_STEP), w.lowKpa ?? -Infinity);
  return { kpa: Math.max(0, w.centreKpa - cap), from };
}

/**
 * Slides on slick ground, applied to today: each planned trail at least as slick as a logged
 * slide holds the basis under it; like every grip rule, the drop is the share-weighted mean over
 * the planned trails. Null when no trail today is that slick (a dry day keeps the dry range).
 */
export function slickGroundReason(learned: Learning, day: PlannedDay, unit: PressureUnit): Reason | null {
  if (!day.trails.length) return null;
  const drops = (position: WheelPosition) => day.trails.map((t) => slickDrop(learned[position], t.surfaces, position));
  const front = drops("front");
  const rear = drops("rear");
  const share = (xs: { kpa: number }[]) => -xs.reduce((a, x) => a + x.kpa, 0) / xs.length;
  const [f, r] = [share(front), share(rear)];
  if (f === 0 && r === 0) return null;
  const seen = [...front, ...rear].find((d) => d.kpa > 0)!.from!;
  const wheel = front.some((d) => d.kpa > 0) ? "front" : "rear";
  const text = `Your rides slid on ${GROUND_WORDS[seen.surface]} ground (${wheel} ${formatBandPressure(seen.kpa, unit)} on your baseline's ground), so on ground that slick today: ${wheelsText(f, r, unit)}`;
  return { id: "basis-rides-slick", text, frontKpa: f, rearKpa: r };
}
