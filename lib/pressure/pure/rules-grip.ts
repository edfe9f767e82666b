/**
 * Grip rules: slick or loose ground wants less pressure so the tyre conforms. Each trail counts
 * by its least grippy surface, compared with the surface the baseline was set on, so a baseline
 * set in the wet and ridden dry moves up. Grip is the share-weighted mean over the planned trails
 * (a tyre rides every one of them); steps are fractions of the basis (steps.ts).
 */
import type { PressureUnit } from "@/lib/shared/units";
import { SURFACES, type Surface } from "@/lib/pressure/pure/schemas";
import { shareText } from "./conditions";
import { capitalise, isNegligible, wheelsText } from "./format";
import { ROCK_GRIP_PROTECTED, SLICK_ROOTS, SLICK_SURFACES, SLICK_WOOD, SURFACE_GRIP } from "./settings";
import { stepsKpa, type Basis } from "./steps";
import type { PlannedDay, PlannedTrail, Reason } from "./types";

/** The least grippy of a set of surfaces (ties go to the earlier one in SURFACES); undefined if empty. */
export function leastGrippy(surfaces: readonly Surface[]): Surface | undefined {
  let worst: Surface | undefined;
  for (const surface of SURFACES) {
    if (!surfaces.includes(surface)) continue;
    if (worst === undefined || SURFACE_GRIP[surface][0] < SURFACE_GRIP[worst][0]) worst = surface;
  }
  return worst;
}

/** A surface as an adjective ("wet ground", "snowy ground"). */
export const GROUND_WORDS: Record<Surface, string> = {
  dry: "dry", dusty: "dusty", tacky: "tacky", damp: "damp", wet: "wet",
  muddy: "muddy", loose: "loose", rocky: "rocky", frozen: "frozen", snow: "snowy",
};

/** Surface rules: one reason per least-grippy surface that differs from the reference. */
export function surfaceReasons(day: PlannedDay, referenceSurfaces: readonly Surface[], basis: Basis, unit: PressureUnit): Reason[] {
  const reference = leastGrippy(referenceSurfaces) ?? "dry";
  const [refFront, refRear] = SURFACE_GRIP[reference];
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
    const [front, rear] = stepsKpa([SURFACE_GRIP[surface][0] - refFront, SURFACE_GRIP[surface][1] - refRear], basis, share);
    if (isNegligible(front) && isNegligible(rear)) continue;
    const why = front + rear < 0 ? "less grip" : "more grip";
    const versus = reference === "dry" ? "than dry ground" : `than the ${GROUND_WORDS[reference]} ground your baseline was set on`;
    reasons.push({
      id: `grip-${surface}`,
      text: `${capitalise(GROUND_WORDS[surface])}${shareText(day, trails)}, ${why} ${versus}: ${wheelsText(front, rear, unit)}`,
      frontKpa: front,
      rearKpa: rear,
    });
  }
  return reasons;
}

/** Roots and wooden features turn slick on wet, muddy, frozen or snowy ground. */
export function slickFeatureReasons(day: PlannedDay, basis: Basis, unit: PressureUnit): Reason[] {
  const reasons: Reason[] = [];
  const items = [
    { id: "grip-slick-roots", feature: "roots", noun: "roots", fractions: SLICK_ROOTS },
    { id: "grip-slick-wood", feature: "wooden-feature", noun: "wooden features", fractions: SLICK_WOOD },
  ] as const;
  for (const item of items) {
    const trails = day.trails.filter(
      (t) => t.features.includes(item.feature) && t.surfaces.some((s) => SLICK_SURFACES.includes(s)),
    );
    if (trails.length === 0) continue;
    const share = trails.length / day.trails.length;
    const [front, rear] = stepsKpa(item.fractions, basis, share);
    const slick = [...new Set(trails.map((t) => leastGrippy(t.surfaces.filter((s) => SLICK_SURFACES.includes(s)))))];
    const adjective = slick.length === 1 && slick[0] ? GROUND_WORDS[slick[0]] : "slick";
    reasons.push({
      id: item.id,
      text: `${capitalise(adjective)} ${item.noun}${shareText(day, trails)}, lower for grip: ${wheelsText(front, rear, unit)}`,
      frontKpa: front,
      rearKpa: rear,
    });
  }
  return reasons;
}

/**
 * Rocky ground where the casing or an insert already protects the rim: a small cut for grip, so
 * the tyre wraps the rocks (protectionReasons adds air instead where the rim is exposed).
 */
export function protectedRockReasons(day: PlannedDay, protectedWheels: { front: boolean; rear: boolean }, basis: Basis, unit: PressureUnit): Reason[] {
  if (!protectedWheels.front && !protectedWheels.rear) return [];
  const rocky = day.trails.filter((t) => t.surfaces.includes("rocky") || t.features.includes("rock-garden"));
  if (rocky.length === 0) return [];
  const [f, r] = stepsKpa(ROCK_GRIP_PROTECTED, basis, rocky.length / day.trails.length);
  const front = protectedWheels.front ? f : 0;
  const rear = protectedWheels.rear ? r : 0;
  return [{
    id: "grip-rocky-protected",
    text: `Rocks${shareText(day, rocky)}, and your casing or insert protects the rim: a little less for grip on the rocks: ${wheelsText(front, rear, unit)}`,
    frontKpa: front,
    rearKpa: rear,
  }];
}
