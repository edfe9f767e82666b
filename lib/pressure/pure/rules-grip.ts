/**
 * Grip rules: slick or loose ground wants less pressure so the tyre conforms. Each trail counts
 * by its least grippy surface, compared with the surface the baseline was set on, so a baseline
 * set in the wet and ridden dry moves up. Contributions are weighted by the share of trails.
 */
import type { PressureUnit } from "@/lib/shared/units";
import { SURFACES, type Surface } from "@/lib/pressure/pure/schemas";
import { shareText } from "./conditions";
import { capitalise, isNegligible, wheelsText } from "./format";
import { SLICK_ROOTS_KPA, SLICK_SURFACES, SLICK_WOOD_KPA, SURFACE_GRIP_KPA } from "./settings";
import type { PlannedDay, PlannedTrail, Reason } from "./types";

/** The least grippy of a set of surfaces (ties go to the earlier one in SURFACES); undefined if empty. */
export function leastGrippy(surfaces: readonly Surface[]): Surface | undefined {
  let worst: Surface | undefined;
  for (const surface of SURFACES) {
    if (!surfaces.includes(surface)) continue;
    if (worst === undefined || SURFACE_GRIP_KPA[surface][0] < SURFACE_GRIP_KPA[worst][0]) worst = surface;
  }
  return worst;
}

const ADJECTIVE: Record<Surface, string> = {
  dry: "dry", dusty: "dusty", tacky: "tacky", damp: "damp", wet: "wet",
  muddy: "muddy", loose: "loose", rocky: "rocky", frozen: "frozen", snow: "snowy",
};

/** Surface rules: one reason per least-grippy surface that differs from the reference. */
export function surfaceReasons(day: PlannedDay, referenceSurfaces: readonly Surface[], unit: PressureUnit): Reason[] {
  const reference = leastGrippy(referenceSurfaces) ?? "dry";
  const [refFront, refRear] = SURFACE_GRIP_KPA[reference];
  const groups = new Map<Surface, PlannedTrail[]>();
  for (const trail of day.trails) {
    const surface = leastGrippy(trail.surfaces);
    if (surface === undefined) continue; // unknown today: treated as the reference
    groups.set(surface, [...(groups.get(surface) ?? []), trail]);
  }
  const reasons: Reason[] = [];
  const total = day.trails.length;
  for (const [surface, trails] of groups) {
    const share = trails.length / total;
    const front = (SURFACE_GRIP_KPA[surface][0] - refFront) * share;
    const rear = (SURFACE_GRIP_KPA[surface][1] - refRear) * share;
    if (isNegligible(front) && isNegligible(rear)) continue;
    const why = front + rear < 0 ? "less grip" : "more grip";
    const versus = reference === "dry" ? "than dry ground" : `than the ${ADJECTIVE[reference]} ground your baseline was set on`;
    reasons.push({
      id: `grip-${surface}`,
      text: `${capitalise(ADJECTIVE[surface])}${shareText(day, trails)}, ${why} ${versus}: ${wheelsText(front, rear, unit)}`,
      frontKpa: front,
      rearKpa: rear,
    });
  }
  return reasons;
}

/** Roots and wooden features turn slick on wet, muddy, frozen or snowy ground. */
export function slickFeatureReasons(day: PlannedDay, unit: PressureUnit): Reason[] {
  const reasons: Reason[] = [];
  const items = [
    { id: "grip-slick-roots", feature: "roots", noun: "roots", kpa: SLICK_ROOTS_KPA },
    { id: "grip-slick-wood", feature: "wooden-feature", noun: "wooden features", kpa: SLICK_WOOD_KPA },
  ] as const;
  for (const item of items) {
    const trails = day.trails.filter(
      (t) => t.features.includes(item.feature) && t.surfaces.some((s) => SLICK_SURFACES.includes(s)),
    );
    if (trails.length === 0) continue;
    const share = trails.length / day.trails.length;
    const front = item.kpa[0] * share;
    const rear = item.kpa[1] * share;
    const slick = [...new Set(trails.map((t) => leastGrippy(t.surfaces.filter((s) => SLICK_SURFACES.includes(s)))))];
    const adjective = slick.length === 1 && slick[0] ? ADJECTIVE[slick[0]] : "slick";
    reasons.push({
      id: item.id,
      text: `${capitalise(adjective)} ${item.noun}${shareText(day, trails)}, lower for grip: ${wheelsText(front, rear, unit)}`,
      frontKpa: front,
      rearKpa: rear,
    });
  }
  return reasons;
}
