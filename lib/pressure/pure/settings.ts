/**
 * Every tunable number of the pressure engine, in one place, with its source.
 * Pressures in kPa. docs/pressure-rules.md explains each one in plain words.
 */
import type { Casing, Pace, Surface } from "@/lib/pressure/pure/schemas";

/** Static front share of rider + bike weight (~40/60): from memory; a setting, not an oracle. */
export const FRONT_STATIC_SHARE = 0.4;
/**
 * Dynamic allowance added to each wheel's share of the weight: braking, cornering and landings
 * load both wheels, so riders run the front closer to the rear than the static split suggests.
 * Common practice calibration, no published source: with 0.5 the design loads are 0.9 and 1.1 × weight.
 */
export const DYNAMIC_ALLOWANCE = 0.5;
/**
 * Target tyre drop as a fraction of section height under the design load. About 15 % follows
 * F. Berto's tyre-drop studies (road and touring tyres; a trend, not a mountain-bike measurement).
 */
export const TARGET_DROP = 0.15;

/** Estimate terms as fractions of the load/patch pressure (common practice, no published source). */
export const CASING_TERM: Record<Casing, number> = { light: 0.08, trail: 0, reinforced: -0.04, downhill: -0.08 };
export const TUBE_TERM = 0.15;
export const INSERT_TERM = -0.06;
export const PACE_TERM: Record<Pace, number> = { easy: -0.05, steady: 0, hard: 0.06 };

/**
 * Floor: the drop (fraction of section height) under the design load beyond which rim strikes
 * and burps become likely. Common practice, no published source. Tubes pinch earlier than
 * tubeless; an insert lets the tyre go deeper. floor = design load / patch area at this drop.
 */
export const FLOOR_DROP_TUBELESS = 0.19;
export const FLOOR_DROP_TUBES = 0.175;
export const FLOOR_DROP_INSERT_BONUS = 0.04;
/** No tyre is run below this, whatever the model says (≈ 5 psi). Common practice. */
export const ABSOLUTE_FLOOR_KPA = 35;

/**
 * Grip: change from a dry reference for each surface, [front, rear] kPa (1 psi ≈ 6.9 kPa).
 * Lower pressure lets the tyre conform and grip on slick or loose ground; the front steers,
 * so it drops more. Common practice, no published source.
 */
export const SURFACE_GRIP_KPA: Record<Surface, readonly [number, number]> = {
  dry: [0, 0],
  tacky: [0, 0],
  rocky: [0, 0],
  dusty: [-3.5, -2],
  damp: [-3.5, -2],
  loose: [-5, -3.5],
  frozen: [-5, -3.5],
  wet: [-7, -5],
  muddy: [-10, -7],
  snow: [-10, -7],
};
/** Surfaces that make roots and wooden features slick. */
export const SLICK_SURFACES: readonly Surface[] = ["damp", "wet", "muddy", "frozen", "snow"];
/** Extra grip drop on a trail with roots / wooden features on a slick surface, [front, rear]. */
export const SLICK_ROOTS_KPA = [-3.5, -2] as const;
export const SLICK_WOOD_KPA = [-2, -1] as const;

/** Support for high-G features, [front, rear] kPa, at steady pace. Common practice. */
export const BERM_SUPPORT_KPA = [2, 3.5] as const;
export const JUMP_DROP_SUPPORT_KPA = [3.5, 7] as const;

/** Protection on rocky trails per unit of vulnerability, [front, rear] kPa. Common practice. */
export const ROCK_PROTECTION_KPA = [5, 7] as const;
export const CASING_VULNERABILITY: Record<Casing, number> = { light: 1, trail: 0.5, reinforced: 0.25, downhill: 0 };
export const TUBE_VULNERABILITY = 0.75;
/** An insert halves the protection needed. */
export const INSERT_VULNERABILITY_FACTOR = 0.5;

/** Pace scales support and protection (more speed, more load). Common practice. */
export const PACE_LOAD_FACTOR: Record<Pace, number> = { easy: 0.5, steady: 1, hard: 1.5 };

/** Today's tweaks together are bounded per wheel (≈ ±2.9 psi). */
export const TWEAK_BOUND_KPA = 20;

/** Band half-width: a fraction of the target, kept between a min and max (common practice). */
export const BAND_FRACTION_BASELINE = 0.04;
export const BAND_FRACTION_ESTIMATE = 0.08;
export const BAND_MIN_HALF_KPA = 3;
export const BAND_MAX_HALF_KPA = 14;

/** Reports older than this trigger a caution. */
export const STALE_REPORT_HOURS = 24;
