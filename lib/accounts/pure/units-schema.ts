/** A rider's display units (User.units). The engine always works in SI; these only change what is shown. */
import { z } from "zod";
import { MASS_UNITS, PRESSURE_UNITS, type MassUnit, type PressureUnit } from "@/lib/shared/units";

export const DISTANCE_SYSTEMS = ["metric", "imperial"] as const;

export const unitPrefsSchema = z.strictObject({
  pressure: z.enum(PRESSURE_UNITS, { error: `Pressure unit must be one of: ${PRESSURE_UNITS.join(", ")}.` }),
  mass: z.enum(MASS_UNITS, { error: `Mass unit must be one of: ${MASS_UNITS.join(", ")}.` }),
  distance: z.enum(DISTANCE_SYSTEMS, { error: `Distance must be one of: ${DISTANCE_SYSTEMS.join(", ")}.` }),
});

export type UnitPrefs = z.infer<typeof unitPrefsSchema>;
export const DEFAULT_UNITS: UnitPrefs = { pressure: "psi", mass: "kg", distance: "metric" };

/** Fills whatever a stored preference lacks (older rows, anonymous visitors) with the defaults. */
export function unitsOf(stored: Partial<Record<keyof UnitPrefs, string>> | null | undefined): UnitPrefs {
  const parsed = unitPrefsSchema.partial().safeParse(stored ?? {});
  return { ...DEFAULT_UNITS, ...(parsed.success ? parsed.data : {}) };
}

export type DisplayUnits = { pressure: PressureUnit; mass: MassUnit };
