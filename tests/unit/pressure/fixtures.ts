/** Invented example setups for the pressure tests (not data from any source). */
import type { PressureInputRaw, WheelSetup } from "@/lib/pressure/pure/schemas";
import { psiToKpa } from "@/lib/shared/units";

export const trailWheel29: WheelSetup = { bsdMm: 622, widthMm: 61, casing: "trail", insert: false, tubeless: true, maxKpa: 276 };

/** ~70 kg rider + ~15 kg bike on 29 × 2.4" (61-622) tubeless trail casing, steady pace. */
export const adult = (overrides: Partial<PressureInputRaw> = {}): PressureInputRaw => ({
  riderMassKg: 70,
  bikeMassKg: 15,
  pace: "steady",
  front: trailWheel29,
  rear: trailWheel29,
  ...overrides,
});

export const withBaseline = (overrides: Partial<PressureInputRaw> = {}): PressureInputRaw =>
  adult({ baseline: { frontKpa: psiToKpa(19), rearKpa: psiToKpa(23), surfaces: ["dry"], temperatureC: 18 }, ...overrides });

export const sum = (values: number[]) => values.reduce((a, b) => a + b, 0);
