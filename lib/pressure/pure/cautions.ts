/** Caution wording. The standard cautions are always shown, whatever the result. */
import { formatPressure, type PressureUnit } from "@/lib/shared/units";
import { STALE_REPORT_HOURS } from "./settings";
import type { PlannedDay, WheelPosition } from "./types";

export const STANDARD_CAUTIONS = [
  "Never go above the tyre's or the rim's printed maximum pressure, whichever is lower.",
  "Check both tyres with a gauge before you ride; pump gauges often read off.",
  "This band is a starting point, not a guarantee: adjust by feel, one change at a time.",
  "Ride within your ability, and ride trails you do not know slowly first.",
  "Follow park signage, closures and staff instructions.",
  "Tyre, rim and insert makers' limits come first; when in doubt, ask a qualified mechanic.",
] as const;

export const ESTIMATE_CAUTION =
  "No baseline saved: this is a starting estimate from weight and tyre size. Ride it, then log how it felt to refine it.";

const Wheel = (w: WheelPosition) => (w === "front" ? "Front" : "Rear");

export function reportCautions(day: PlannedDay): string[] {
  if (day.scope === "none") {
    return ["No trail conditions for today: the band assumes the ground your baseline was set on (ordinary dry ground for an estimate). Check the conditions board."];
  }
  const cautions: string[] = [];
  const missing = day.trails.filter((t) => !t.hasReport);
  const stale = day.trails.filter((t) => t.hasReport && (t.reportAgeHours ?? 0) > STALE_REPORT_HOURS);
  if (missing.length > 0) {
    cautions.push(`No report today for ${missing.map((t) => t.name).join(", ")}: the ground there is unknown and left out (its mapped features still count). Check the conditions board.`);
  }
  if (stale.length > 0) {
    cautions.push(
      `Reports older than ${STALE_REPORT_HOURS} h for ${stale.map((t) => t.name).join(", ")}: conditions may have changed.`,
    );
  }
  return cautions;
}

export function floorCaution(wheel: WheelPosition, floorKpa: number, raised: boolean, unit: PressureUnit): string {
  const floor = formatPressure(floorKpa, unit);
  return raised
    ? `${Wheel(wheel)}: the target was held at ${floor}; lower than that, rim strikes and burping become likely for this load and tyre.`
    : `${Wheel(wheel)}: the low end of the band stops at ${floor}; below it, rim strikes and burping become likely.`;
}

export function maxCaution(wheel: WheelPosition, maxKpa: number, unit: PressureUnit): string {
  return `${Wheel(wheel)}: the band is capped at the printed maximum of ${formatPressure(maxKpa, unit)} (tyre or rim, whichever is lower).`;
}

export function floorAboveMaxCaution(wheel: WheelPosition, floorKpa: number, maxKpa: number, unit: PressureUnit): string {
  return `${Wheel(wheel)}: this load needs about ${formatPressure(floorKpa, unit)} to avoid rim strikes, above the printed maximum of ${formatPressure(maxKpa, unit)}. Held at the maximum; ask a qualified mechanic about a tyre and rim rated for the load.`;
}

export function pumpCaution(wheel: WheelPosition, binding: "max" | "zero", unit: PressureUnit, maxKpa: number): string {
  return binding === "max"
    ? `${Wheel(wheel)}: do not pump above ${formatPressure(maxKpa, unit)}; pump to the maximum now and check again with a gauge on the trail.`
    : `${Wheel(wheel)}: the tyre will gain so much pressure on the way up that you should set it at the trailhead instead.`;
}
