/** Shapes shared by the pressure engine's parts. Pressures in kPa (gauge). */
import type { Feature, Surface } from "@/lib/pressure/pure/schemas";
import type { UncertaintyParts } from "./uncertainty";

export type WheelPosition = "front" | "rear";

/** One explained contribution. Ids are namespaced: basis-, estimate-, grip-, support-,
 *  protection-, tweak-, limit- add up to the target; pump- add up from target to pumpTo. */
export type Reason = { id: string; text: string; frontKpa: number; rearKpa: number };

export type WheelBand = {
  lowKpa: number;
  targetKpa: number;
  highKpa: number;
  /** Target minus the basis (baseline, or the estimate before today's tweaks). */
  deltaKpa: number;
  /** Gauge reading to pump to now, at the pump's temperature and elevation. */
  pumpToKpa: number;
};

export type PressureResult = {
  /** Where the band starts: the rider's own rides, their baseline, or the starting estimate. */
  basis: "baseline" | "estimate" | "rides";
  front: WheelBand;
  rear: WheelBand;
  reasons: Reason[];
  cautions: string[];
  /** The band's half-width parts per wheel (kPa), added in quadrature (uncertainty.ts). */
  uncertainty: { front: UncertaintyParts; rear: UncertaintyParts };
};

/** A trail as the rules see it, with the whole day's conditions merged in. */
export type PlannedTrail = {
  name: string;
  surfaces: Surface[];
  features: Feature[];
  /** Null when nothing is known about the trail today. */
  reportAgeHours: number | null | undefined;
  hasReport: boolean;
};

/** How the day was described: per planned trail, for the whole day, or not at all. */
export type PlannedDay = { scope: "trails" | "day" | "none"; trails: PlannedTrail[] };

export const PUMP_REASON_PREFIX = "pump-";
