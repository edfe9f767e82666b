/** Wording helpers for reasons: numbers always in the rider's unit, signed. */
import { formatPressure, kpaToPsi, type PressureUnit } from "@/lib/shared/units";

/** Below this a contribution is treated as zero (0.05 kPa ≈ 0.007 psi). */
export const NEGLIGIBLE_KPA = 0.05;

export const isNegligible = (kPa: number) => Math.abs(kPa) < NEGLIGIBLE_KPA;

/** "−1.0 psi front, −0.7 psi rear"; a wheel with no change is left out. */
export function wheelsText(frontKpa: number, rearKpa: number, unit: PressureUnit): string {
  const parts: string[] = [];
  if (!isNegligible(frontKpa)) parts.push(`${formatPressure(frontKpa, unit, { signed: true, decimals: decimalsFor(unit, frontKpa) })} front`);
  if (!isNegligible(rearKpa)) parts.push(`${formatPressure(rearKpa, unit, { signed: true, decimals: decimalsFor(unit, rearKpa) })} rear`);
  return parts.join(", ");
}

/** Changes are small: one decimal finer than a reading, and a second one for a change under 0.05 psi (never "±0.0"). */
const decimalsFor = (unit: PressureUnit, kPa = 1) => (unit === "kPa" ? 1 : unit === "bar" ? 3 : Math.abs(kpaToPsi(kPa)) < 0.05 ? 2 : 1);

/** "19.0 psi front, 23.1 psi rear" for absolute values. */
export function pairText(frontKpa: number, rearKpa: number, unit: PressureUnit): string {
  return `${formatPressure(frontKpa, unit)} front, ${formatPressure(rearKpa, unit)} rear`;
}

export const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export const percentText = (fraction: number) =>
  fraction === 0 ? "no change" : `${fraction > 0 ? "+" : "\u2212"}${Math.round(Math.abs(fraction) * 100)} %`;
