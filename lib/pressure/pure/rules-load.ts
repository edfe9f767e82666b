/**
 * Support and protection rules. High-G berms and jump or drop landings want more support so the
 * tyre does not fold, roll or burp (rear most); rocks want protection for rims and casings,
 * more with tubes or a light casing, less with an insert. The rider's pace scales both.
 */
import type { PressureUnit } from "@/lib/shared/units";
import type { Pace, WheelSetup } from "@/lib/pressure/pure/schemas";
import { shareText } from "./conditions";
import { isNegligible, wheelsText } from "./format";
import {
  BERM_SUPPORT_KPA,
  CASING_VULNERABILITY,
  INSERT_VULNERABILITY_FACTOR,
  JUMP_DROP_SUPPORT_KPA,
  PACE_LOAD_FACTOR,
  ROCK_PROTECTION_KPA,
  TUBE_VULNERABILITY,
} from "./settings";
import type { PlannedDay, PlannedTrail, Reason } from "./types";

const paceNote = (pace: Pace) => (pace === "steady" ? "" : ` (${pace} pace, ×${PACE_LOAD_FACTOR[pace]})`);

/** Each trail counts once, by its most demanding feature: jumps or drops, else berms. */
export function supportReasons(day: PlannedDay, pace: Pace, unit: PressureUnit): Reason[] {
  const jumpy = day.trails.filter((t) => t.features.includes("jump") || t.features.includes("drop"));
  const bermed = day.trails.filter((t) => !jumpy.includes(t) && t.features.includes("berm"));
  const factor = PACE_LOAD_FACTOR[pace];
  const groups = [
    { id: "support-jump-drop", label: "Jumps or drops", why: "support on landings", trails: jumpy, kpa: JUMP_DROP_SUPPORT_KPA },
    { id: "support-berm", label: "Berms", why: "support in high-G turns", trails: bermed, kpa: BERM_SUPPORT_KPA },
  ];
  const reasons: Reason[] = [];
  for (const group of groups) {
    if (group.trails.length === 0) continue;
    const share = group.trails.length / day.trails.length;
    const front = group.kpa[0] * factor * share;
    const rear = group.kpa[1] * factor * share;
    reasons.push({
      id: group.id,
      text: `${group.label}${shareText(day, group.trails)}${paceNote(pace)}, more ${group.why}: ${wheelsText(front, rear, unit)}`,
      frontKpa: front,
      rearKpa: rear,
    });
  }
  return reasons;
}

/** How exposed a wheel is to pinch flats, casing cuts and rim damage (0 = not at all). */
export function vulnerability(wheel: WheelSetup): number {
  const base = CASING_VULNERABILITY[wheel.casing] + (wheel.tubeless ? 0 : TUBE_VULNERABILITY);
  return wheel.insert ? base * INSERT_VULNERABILITY_FACTOR : base;
}

const isRocky = (t: PlannedTrail) => t.surfaces.includes("rocky") || t.features.includes("rock-garden");

function exposureNote(front: WheelSetup, rear: WheelSetup): string {
  const notes: string[] = [];
  if (!front.tubeless || !rear.tubeless) notes.push("tubes");
  if (front.casing === "light" || rear.casing === "light") notes.push("light casing");
  if (front.insert || rear.insert) notes.push("inserts halve it");
  return notes.length ? ` (${notes.join("; ")})` : "";
}

/** Rocky surfaces and rock gardens: protection scaled by each wheel's vulnerability and pace. */
export function protectionReasons(day: PlannedDay, front: WheelSetup, rear: WheelSetup, pace: Pace, unit: PressureUnit): Reason[] {
  const rocky = day.trails.filter(isRocky);
  if (rocky.length === 0) return [];
  const share = rocky.length / day.trails.length;
  const factor = PACE_LOAD_FACTOR[pace] * share;
  const frontKpa = ROCK_PROTECTION_KPA[0] * vulnerability(front) * factor;
  const rearKpa = ROCK_PROTECTION_KPA[1] * vulnerability(rear) * factor;
  if (isNegligible(frontKpa) && isNegligible(rearKpa)) return [];
  return [
    {
      id: "protection-rocks",
      text: `Rocks${shareText(day, rocky)}${paceNote(pace)}, more air to protect rims and casings${exposureNote(front, rear)}: ${wheelsText(frontKpa, rearKpa, unit)}`,
      frontKpa,
      rearKpa,
    },
  ];
}
