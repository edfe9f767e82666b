/**
 * Every tunable number of the pressure engine, in one place, with its source.
 * Pressures in kPa. docs/pressure-rules.md explains each one in plain words.
 */
import type { Casing, Pace, Surface } from "@/lib/pressure/pure/schemas";

/** Static front share of rider + bike weight on a mountain bike (~40/60). Common practice, no published source. */
export const FRONT_STATIC_SHARE = 0.4;
/**
 * Riding loads added to each wheel's static share of the weight: braking, berms and landings load
 * both wheels, so the design loads are (0.4 + 0.53) and (0.6 + 0.53) × weight. Common practice
 * calibration (rear about 3 psi above front on equal tyres for a ~70 kg rider), no published source.
 */
export const DYNAMIC_ALLOWANCE = 0.9;
/**
 * Drop (fraction of section height) the design load presses the tyre in at the estimate's load
 * term, in the footprint of physics/contact-patch.ts. Our calibration against the common-practice
 * anchor points (docs/pressure-grid.md); the static drop at the result is shown in the reason.
 */
export const TARGET_DROP = 0.185;
/**
 * Pressure every tyre needs whatever its load, to hold its shape in corners and keep the bead
 * seated; stiffer casings hold their shape with less. Common practice calibration, no published source.
 */
export const SHAPE_PRESSURE_KPA: Record<Casing, number> = { light: 33, trail: 30, reinforced: 28, downhill: 26.5 };
/** Construction and pace, each counted once, as factors on the load term (common practice, no published source). */
export const TUBE_FACTOR = 1.12;
export const INSERT_FACTOR = 0.97;
/** Pace scales the riding loads in the estimate; it is not counted again in today's rules. */
export const PACE_FACTOR: Record<Pace, number> = { easy: 0.92, steady: 1, hard: 1.08 };

/**
 * Floor: the drop under the design load beyond which rim strikes and burps become likely.
 * Common practice, no published source. Tubes pinch earlier than tubeless; an insert lets the
 * tyre go deeper. floor = design load / patch area at this drop.
 */
export const FLOOR_DROP_TUBELESS = 0.2;
export const FLOOR_DROP_TUBES = 0.19;
export const FLOOR_DROP_INSERT_BONUS = 0.03;
/**
 * A planned drop or rock garden lands in square hits: the floor's drop limit comes down by this
 * share of the tyre's height for the whole day (the worst planned trail counts). Common practice.
 */
export const FLOOR_DROP_HARD_HIT_CUT = 0.02;
/** No tyre is run below this, whatever the model says (≈ 5 psi). Common practice. */
export const ABSOLUTE_FLOOR_KPA = 35;
/**
 * Floor by bead-seat diameter: a tubeless tyre needs this much to keep its bead sealed, small
 * wheels more than big ones (a tighter bead curve, riders' reports of burping). Tubes get the same
 * floor, so they never come out below tubeless. Trade judgement, no published source.
 */
export const WHEEL_FLOOR_KPA: Record<number, number> = { 406: 62, 507: 59, 559: 55, 584: 55, 622: 52 };

/**
 * Today's steps are fractions of the wheel's basis pressure (a child and a heavy rider get
 * proportionate changes), each held between STEP_MIN_KPA and STEP_MAX_KPA in size.
 * Our choice: about 0.15 psi is below what a gauge shows, about 2 psi is a big change for one rule.
 */
export const STEP_MIN_KPA = 1;
export const STEP_MAX_KPA = 14;

/**
 * Grip: change from a dry reference for each surface, [front, rear] as fractions of the basis.
 * Lower pressure lets the tyre conform and grip on slick or loose ground; the front steers,
 * so it drops more. Common practice, no published source.
 */
export const SURFACE_GRIP: Record<Surface, readonly [number, number]> = {
  dry: [0, 0],
  tacky: [0, 0],
  rocky: [0, 0],
  dusty: [-0.025, -0.013],
  damp: [-0.025, -0.013],
  loose: [-0.04, -0.022],
  frozen: [-0.04, -0.022],
  wet: [-0.055, -0.032],
  muddy: [-0.075, -0.045],
  snow: [-0.075, -0.045],
};
/** Surfaces that make roots and wooden features slick. */
export const SLICK_SURFACES: readonly Surface[] = ["damp", "wet", "muddy", "frozen", "snow"];
/** Extra grip drop on a trail with roots / wooden features on a slick surface, [front, rear]. */
export const SLICK_ROOTS = [-0.027, -0.013] as const;
export const SLICK_WOOD = [-0.015, -0.007] as const;
/** Rocky ground on a wheel whose casing or insert protects the rim: a little less for grip. */
export const ROCK_GRIP_PROTECTED = [-0.02, -0.012] as const;

/** Support for the most demanding feature planned, [front, rear] fractions. Common practice. */
export const BERM_SUPPORT = [0.015, 0.022] as const;
export const JUMP_DROP_SUPPORT = [0.027, 0.045] as const;

/** Protection on the rockiest planned trail per unit of vulnerability, [front, rear]. Common practice. */
export const ROCK_PROTECTION = [0.04, 0.045] as const;
export const CASING_VULNERABILITY: Record<Casing, number> = { light: 1, trail: 0.5, reinforced: 0.25, downhill: 0 };
export const TUBE_VULNERABILITY = 0.75;
/** An insert halves the protection needed. */
export const INSERT_VULNERABILITY_FACTOR = 0.5;
/** At or below this vulnerability the rim is protected: rocks cut for grip instead of adding air. */
export const PROTECTED_VULNERABILITY = 0.25;
/** A rock garden counts more than rocky ground (a line of square hits, not scattered ones). */
export const ROCK_GARDEN_WEIGHT = 1;
export const ROCKY_SURFACE_WEIGHT = 0.6;

/** Today's tweaks together are bounded per wheel (≈ ±2.9 psi). */
export const TWEAK_BOUND_KPA = 20;

/**
 * The band's half-width is built from independent parts, added in quadrature (uncertainty.ts):
 * the basis (estimate, baseline or rides), the gauge, the park's elevation span and the day's
 * temperature swing. The fractions and the swing are common practice, no published source.
 */
export const ESTIMATE_UNCERTAINTY = 0.07;
export const BASELINE_UNCERTAINTY = 0.02;
/** Between gauges about ±1 psi; the same gauge repeats to about ±0.5 psi (a baseline or ride log was read on it). */
export const GAUGE_ACCURACY_KPA = 6.9;
export const GAUGE_REPEATABILITY_KPA = 3.4;
/** Air temperature over a riding day, morning to afternoon, when nothing else is known (°C, whole swing). */
export const DAY_TEMPERATURE_SWING_C = 6;

/** Learning from ride logs (learning.ts): at least this many logs, the newest this many. */
export const MIN_LEARNING_LOGS = 2;
export const MAX_LEARNING_LOGS = 20;
/** Beyond a one-sided bracket, the best guess sits this fraction of the pressure inside it. */
export const ONE_SIDED_STEP = 0.05;

/** Reports older than this trigger a caution. */
export const STALE_REPORT_HOURS = 24;
