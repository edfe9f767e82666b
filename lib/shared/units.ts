/**
 * Unit conversions and display helpers. Factors from NIST Special Publication 811 (2008),
 * Appendix B.8: psi = 6 894.757 293 168 Pa, bar = 100 000 Pa, lb = 0.453 592 37 kg (exact),
 * ft = 0.3048 m (exact), in = 0.0254 m (exact), mile (international) = 1 609.344 m (exact). The engine works in SI; the rider picks units.
 */
export const PA_PER_PSI = 6894.757293168;
export const KPA_PER_PSI = PA_PER_PSI / 1000;
export const KPA_PER_BAR = 100;
export const KPA_PER_ATM = 101.325;
export const KG_PER_LB = 0.45359237;
export const M_PER_FT = 0.3048;
export const MM_PER_IN = 25.4;
export const M_PER_MI = 1609.344;

export const PRESSURE_UNITS = ["psi", "bar", "kPa"] as const;
export const MASS_UNITS = ["kg", "lb"] as const;
export const LENGTH_UNITS = ["m", "ft"] as const;
/** A rider's choice for distances and heights (User.units.distance): m and km, or ft and mi. */
export const DISTANCE_SYSTEMS = ["metric", "imperial"] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export type MassUnit = (typeof MASS_UNITS)[number];
export type LengthUnit = (typeof LENGTH_UNITS)[number];
export type DistanceSystem = (typeof DISTANCE_SYSTEMS)[number];

export const psiToKpa = (psi: number) => psi * KPA_PER_PSI;
export const kpaToPsi = (kPa: number) => kPa / KPA_PER_PSI;
export const barToKpa = (bar: number) => bar * KPA_PER_BAR;
export const kpaToBar = (kPa: number) => kPa / KPA_PER_BAR;
export const lbToKg = (lb: number) => lb * KG_PER_LB;
export const kgToLb = (kg: number) => kg / KG_PER_LB;
export const ftToM = (ft: number) => ft * M_PER_FT;
export const mToFt = (m: number) => m / M_PER_FT;
export const miToM = (mi: number) => mi * M_PER_MI;
export const mToMi = (m: number) => m / M_PER_MI;
export const inToMm = (inches: number) => inches * MM_PER_IN;
export const mmToIn = (mm: number) => mm / MM_PER_IN;
export const celsiusToKelvin = (c: number) => c + 273.15;

const KPA_PER_UNIT: Record<PressureUnit, number> = { psi: KPA_PER_PSI, bar: KPA_PER_BAR, kPa: 1 };

/** Converts a pressure in kPa to the given unit. */
export const kpaTo = (kPa: number, unit: PressureUnit) => kPa / KPA_PER_UNIT[unit];
/** Converts a pressure in the given unit to kPa. */
export const kpaFrom = (value: number, unit: PressureUnit) => value * KPA_PER_UNIT[unit];

/** Decimals that match a tyre gauge's resolution in each unit. */
const PRESSURE_DECIMALS: Record<PressureUnit, number> = { psi: 1, bar: 2, kPa: 0 };
const MINUS = "\u2212";

type FormatOptions = { signed?: boolean; decimals?: number };

function formatNumber(value: number, decimals: number, signed: boolean): string {
  const rounded = Number(value.toFixed(decimals));
  const magnitude = Math.abs(rounded).toFixed(decimals);
  if (rounded < 0) return `${MINUS}${magnitude}`;
  if (signed && rounded > 0) return `+${magnitude}`;
  if (signed) return `±${magnitude}`;
  return magnitude;
}

/** "19.0 psi", "1.31 bar", "131 kPa"; with `signed`, "+0.9 psi" / "−1.5 psi". */
export function formatPressure(kPa: number, unit: PressureUnit, options: FormatOptions = {}): string {
  const decimals = options.decimals ?? PRESSURE_DECIMALS[unit];
  return `${formatNumber(kpaTo(kPa, unit), decimals, options.signed ?? false)} ${unit}`;
}

/** "72.0 kg" or "158.7 lb". */
export function formatMass(kg: number, unit: MassUnit, decimals = 1): string {
  const value = unit === "kg" ? kg : kgToLb(kg);
  return `${formatNumber(value, decimals, false)} ${unit}`;
}

/** "1400 m" or "4593 ft". */
export function formatLength(m: number, unit: LengthUnit, decimals = 0): string {
  const value = unit === "m" ? m : mToFt(m);
  return `${formatNumber(value, decimals, false)} ${unit}`;
}

/** "6 °C" or "−4.5 °C" (one decimal only when needed). */
export function formatTemperature(c: number): string {
  const decimals = Number.isInteger(Number(c.toFixed(1))) ? 0 : 1;
  return `${formatNumber(c, decimals, false)} °C`;
}

/** The unit for heights and short distances in a distance system. */
export const lengthUnitOf = (system: DistanceSystem): LengthUnit => (system === "imperial" ? "ft" : "m");

/** Anything that is not a known choice (a missing preference, an anonymous visitor) reads as metric. */
export const distanceSystemOf = (value: unknown): DistanceSystem => (value === "imperial" ? "imperial" : "metric");

/**
 * A trail's length: "740 m" / "2.41 km" / "12.3 km", or "820 ft" / "1.24 mi" / "12.3 mi".
 * Short distances stay in the small unit so a 300 m trail never reads "0.30 km".
 */
export function formatDistance(m: number, system: DistanceSystem): string {
  if (system === "imperial") {
    const ft = mToFt(m);
    if (Math.round(ft) < 1000) return `${formatNumber(ft, 0, false)} ft`;
    const mi = mToMi(m);
    return `${formatNumber(mi, mi < 9.995 ? 2 : 1, false)} mi`;
  }
  if (Math.round(m) < 1000) return `${formatNumber(m, 0, false)} m`;
  const km = m / 1000;
  return `${formatNumber(km, km < 9.995 ? 2 : 1, false)} km`;
}

/** A height or a climb/descent in whole metres or feet: "412 m", "1352 ft". */
export const formatHeight = (m: number, system: DistanceSystem) => formatLength(m, lengthUnitOf(system));

/** A grade in percent: "8.4 %". */
export const formatGrade = (pct: number, decimals = 1) => `${formatNumber(pct, decimals, false)} %`;

/** Wheel-size labels by ISO 5775 bead-seat diameter (mm): the one table for every screen and reason. */
export const WHEEL_SIZE_LABELS: Readonly<Record<number, string>> = { 406: "20", 507: "24", 559: "26", 584: "27.5", 622: "29" };

/** A wheel's everyday name: "29″", or the bead-seat diameter in mm for one without a label. */
export const wheelSizeText = (bsdMm: number) => (WHEEL_SIZE_LABELS[bsdMm] ? `${WHEEL_SIZE_LABELS[bsdMm]}″` : `${bsdMm} mm`);

/** ETRTO "61-622" in riders' words: "29 × 2.4 in" (width to the nearest 0.05 in). */
export function tyreSizeText(bsdMm: number, widthMm: number): string {
  const inches = Math.round(mmToIn(widthMm) * 20) / 20;
  const wheel = WHEEL_SIZE_LABELS[bsdMm] ?? `${bsdMm} mm`;
  return `${wheel} × ${Number(inches.toFixed(2))} in`;
}

/** Screen steps for a band: the estimate is good to about ±1.5 psi and gauges to about ±1 psi, so finer would mislead. */
const BAND_STEP: Record<PressureUnit, { step: number; decimals: number }> = { psi: { step: 0.5, decimals: 1 }, bar: { step: 0.05, decimals: 2 }, kPa: { step: 5, decimals: 0 } };

/** A band value for the screen: "18.5 psi", "1.30 bar", "130 kPa" (to 0.5 psi, 0.05 bar, 5 kPa). */
export function formatBandPressure(kPa: number, unit: PressureUnit): string {
  const { step, decimals } = BAND_STEP[unit];
  const value = Math.round(kpaTo(kPa, unit) / step) * step;
  return `${formatNumber(value, decimals, false)} ${unit}`;
}
