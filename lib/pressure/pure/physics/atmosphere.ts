/**
 * ISO 2533:1975 Standard Atmosphere, troposphere layer (identical to the U.S. Standard
 * Atmosphere 1976 below 11 km): p = p0 · (1 − L·H/T0)^(g0·M/(R*·L)), H geopotential height.
 */
import { AppError } from "@/lib/shared/errors";

export const SEA_LEVEL_PRESSURE_PA = 101325;
export const SEA_LEVEL_TEMPERATURE_K = 288.15;
export const LAPSE_RATE_K_PER_M = 0.0065;
export const STANDARD_GRAVITY = 9.80665;
export const MOLAR_MASS_AIR = 0.02896442;
export const GAS_CONSTANT = 8.31432;

/** g0·M/(R*·L) ≈ 5.255 88. */
export const TROPOSPHERE_EXPONENT = (STANDARD_GRAVITY * MOLAR_MASS_AIR) / (GAS_CONSTANT * LAPSE_RATE_K_PER_M);

/** The troposphere formula holds from below sea level to the tropopause at 11 000 m. */
export const MIN_HEIGHT_M = -5000;
export const MAX_HEIGHT_M = 11000;

/** Standard ambient pressure (Pa) at a geopotential height in metres. */
export function standardPressurePa(heightM: number): number {
  if (!Number.isFinite(heightM) || heightM < MIN_HEIGHT_M || heightM > MAX_HEIGHT_M) {
    throw new AppError(422, `Elevation must be between ${MIN_HEIGHT_M} and ${MAX_HEIGHT_M} m.`, "elevation");
  }
  const ratio = 1 - (LAPSE_RATE_K_PER_M * heightM) / SEA_LEVEL_TEMPERATURE_K;
  return SEA_LEVEL_PRESSURE_PA * ratio ** TROPOSPHERE_EXPONENT;
}

/** Standard ambient pressure in kPa. */
export const standardPressureKpa = (heightM: number) => standardPressurePa(heightM) / 1000;
