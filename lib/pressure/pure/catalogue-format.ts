/** Shapes and number wording for the rule catalogue (/pressure/how-it-works). */
import { formatPressure } from "@/lib/shared/units";

/** Where a rule's numbers come from; "from memory" is not a kind: every rule is verified or marked common practice. */
export type Source = "published" | "computed" | "common practice" | "our choice" | "safety";
export type RuleEntry = {
  id: string;
  /** What the rule does, in plain words. */
  plain: string;
  /** The numbers it uses, worded; taken from settings.ts so page and engine never differ. */
  numbers: string;
  source: { kind: Source; text: string };
};
export type RuleSection = { id: string; title: string; intro: string; rules: RuleEntry[] };

export const COMMON_PRACTICE = { kind: "common practice", text: "Common practice, no published source." } as const;

const signedKpa = (kPa: number) => `${kPa > 0 ? "+" : kPa < 0 ? "\u2212" : ""}${Math.abs(kPa)} kPa`;
const signedPsi = (kPa: number) => formatPressure(kPa, "psi", { signed: true });

/** "[−7, −5] kPa" as "front −7 kPa, rear −5 kPa (≈ −1.0 / −0.7 psi)". */
export const frontRear = ([front, rear]: readonly [number, number] | readonly number[]) =>
  `front ${signedKpa(front)}, rear ${signedKpa(rear)} (≈ ${signedPsi(front)} / ${signedPsi(rear)})`;

export const kpaAndPsi = (kPa: number) => `${kPa} kPa (≈ ${formatPressure(kPa, "psi")})`;
export const percent = (fraction: number) => `${fraction > 0 ? "+" : fraction < 0 ? "\u2212" : ""}${Math.round(Math.abs(fraction) * 1000) / 10}\u00a0%`;

/** [−0.055, −0.032] as "front −5.5 %, rear −3.2 %". */
export const frontRearPercent = ([front, rear]: readonly [number, number] | readonly number[]) => `front ${percent(front)}, rear ${percent(rear)}`;
