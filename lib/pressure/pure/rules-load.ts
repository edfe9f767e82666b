/**
 * Support and protection rules. High-G berms and jump or drop landings want more support so the
 * tyre does not fold, roll or burp (rear most); rocks want protection for rims and casings,
 * more with tubes or a light casing, less with an insert. Safety takes the worst case: the most
 * demanding planned trail sets each rule, and the reason names it. Pace is already in the basis
 * (the estimate's riding loads, or the rider's own baseline), so it is not counted again.
 */
import type { PressureUnit } from "@/lib/shared/units";
import type { WheelSetup } from "@/lib/pressure/pure/schemas";
import { wheelsText } from "./format";
import {
  BERM_SUPPORT,
  CASING_VULNERABILITY,
  INSERT_VULNERABILITY_FACTOR,
  JUMP_DROP_SUPPORT,
  PROTECTED_VULNERABILITY,
  ROCK_GARDEN_WEIGHT,
  ROCK_PROTECTION,
  ROCKY_SURFACE_WEIGHT,
  TUBE_VULNERABILITY,
} from "./settings";
import { stepsKpa, type Basis } from "./steps";
import type { PlannedDay, PlannedTrail, Reason } from "./types";

type Demand = { weight: number; what: string };

/** The most demanding of the planned trails (first on ties), or undefined when none demands anything. */
function worstTrail(day: PlannedDay, demand: (t: PlannedTrail) => Demand | undefined) {
  let worst: { trail: PlannedTrail; demand: Demand } | undefined;
  for (const trail of day.trails) {
    const d = demand(trail);
    if (d && d.weight > (worst?.demand.weight ?? 0)) worst = { trail, demand: d };
  }
  return worst;
}

const where = (day: PlannedDay, trail: PlannedTrail) => (day.scope === "day" ? " today" : ` on ${trail.name}`);
const othersText = (count: number) => (count > 0 ? ` (and ${count} more planned trail${count === 1 ? "" : "s"} like it)` : "");

/** Support for the biggest feature planned: jumps or drops, else berms. */
export function supportReasons(day: PlannedDay, basis: Basis, unit: PressureUnit): Reason[] {
  const demand = (t: PlannedTrail): Demand | undefined => {
    if (t.features.includes("jump") || t.features.includes("drop")) {
      return { weight: 2, what: t.features.includes("jump") ? (t.features.includes("drop") ? "Jumps and drops" : "Jumps") : "Drops" };
    }
    return t.features.includes("berm") ? { weight: 1, what: "Berms" } : undefined;
  };
  const worst = worstTrail(day, demand);
  if (!worst) return [];
  const jumpy = worst.demand.weight === 2;
  const [front, rear] = stepsKpa(jumpy ? JUMP_DROP_SUPPORT : BERM_SUPPORT, basis);
  const others = day.trails.filter((t) => t !== worst.trail && demand(t)?.weight === worst.demand.weight).length;
  return [
    {
      id: jumpy ? "support-jump-drop" : "support-berm",
      text: `${worst.demand.what}${where(day, worst.trail)}${othersText(others)}, more support ${jumpy ? "on landings" : "in high-G turns"}: ${wheelsText(front, rear, unit)}`,
      frontKpa: front,
      rearKpa: rear,
    },
  ];
}

/** How exposed a wheel is to pinch flats, casing cuts and rim damage (0 = not at all). */
export function vulnerability(wheel: WheelSetup): number {
  const base = CASING_VULNERABILITY[wheel.casing] + (wheel.tubeless ? 0 : TUBE_VULNERABILITY);
  return wheel.insert ? base * INSERT_VULNERABILITY_FACTOR : base;
}

/** A casing or insert that protects the rim well enough that rocks call for grip, not air. */
export const rimProtected = (wheel: WheelSetup) => vulnerability(wheel) <= PROTECTED_VULNERABILITY;

const rockDemand = (t: PlannedTrail): Demand | undefined =>
  t.features.includes("rock-garden")
    ? { weight: ROCK_GARDEN_WEIGHT, what: "Rock garden" }
    : t.surfaces.includes("rocky")
      ? { weight: ROCKY_SURFACE_WEIGHT, what: "Rocky ground" }
      : undefined;

function exposureNote(front: WheelSetup, rear: WheelSetup): string {
  const notes: string[] = [];
  if (!front.tubeless || !rear.tubeless) notes.push("tubes pinch");
  if (front.casing === "light" || rear.casing === "light") notes.push("light casing");
  if (front.insert || rear.insert) notes.push("an insert halves it");
  return notes.length ? ` (${notes.join("; ")})` : "";
}

/** The rockiest planned trail: protection scaled by each exposed wheel's vulnerability. */
export function protectionReasons(day: PlannedDay, front: WheelSetup, rear: WheelSetup, basis: Basis, unit: PressureUnit): Reason[] {
  const worst = worstTrail(day, rockDemand);
  const exposed = (w: WheelSetup) => (rimProtected(w) ? 0 : vulnerability(w) * (worst?.demand.weight ?? 0));
  if (!worst || (exposed(front) === 0 && exposed(rear) === 0)) return [];
  const [f, r] = stepsKpa(ROCK_PROTECTION, basis);
  const frontKpa = f * exposed(front);
  const rearKpa = r * exposed(rear);
  const others = day.trails.filter((t) => t !== worst.trail && rockDemand(t)?.weight === worst.demand.weight).length;
  return [
    {
      id: "protection-rocks",
      text: `${worst.demand.what}${where(day, worst.trail)}${othersText(others)}, more air to protect rims and casings${exposureNote(front, rear)}: ${wheelsText(frontKpa, rearKpa, unit)}`,
      frontKpa,
      rearKpa,
    },
  ];
}
