/** Turns the day's conditions (per trail and/or for the whole day) into one list of trails. */
import type {
  DayConditions,
  Feature,
  PressureInput,
  PressureRequest,
  Surface,
  TrailConditions,
} from "@/lib/pressure/pure/schemas";
import type { PlannedDay, PlannedTrail } from "./types";

const union = <T>(a: readonly T[], b: readonly T[] = []): T[] => [...new Set([...a, ...b])];

/**
 * Planned trails with whole-day surfaces and features added to each of them. With no trails
 * but whole-day conditions, the day counts as one trail; with neither, nothing is known.
 */
export function planDay(today: DayConditions | undefined): PlannedDay {
  const daySurfaces: Surface[] = today?.surfaces ?? [];
  const dayFeatures: Feature[] = today?.features ?? [];
  const trails = today?.trails ?? [];
  if (trails.length > 0) {
    return {
      scope: "trails",
      trails: trails.map((trail): PlannedTrail => {
        const surfaces = union(trail.surfaces, daySurfaces);
        const features = union(trail.features, dayFeatures);
        const hasReport = trail.lastReportAgeHours !== null && (trail.lastReportAgeHours !== undefined || surfaces.length + features.length > 0);
        return { name: trail.name, surfaces, features, reportAgeHours: trail.lastReportAgeHours, hasReport };
      }),
    };
  }
  if (daySurfaces.length + dayFeatures.length > 0) {
    return {
      scope: "day",
      trails: [{ name: "today", surfaces: daySurfaces, features: dayFeatures, reportAgeHours: undefined, hasReport: true }],
    };
  }
  return { scope: "none", trails: [] };
}

/** Trail names shown in a reason before the rest is summed up as "and N more". */
const NAMES_SHOWN = 3;

/** " on 3 of 4 trails (Lynx Flow, Fern Gully, Quarry Drop)", " on Lynx Flow", or " today" for whole-day conditions. */
export function shareText(day: PlannedDay, matching: PlannedTrail[]): string {
  if (day.scope === "day") return " today";
  if (day.trails.length === 1) return ` on ${matching[0]?.name ?? day.trails[0].name}`;
  const names = [...new Set(matching.map((t) => t.name))];
  const more = names.length > NAMES_SHOWN ? ` and ${names.length - NAMES_SHOWN} more` : "";
  return ` on ${matching.length} of ${day.trails.length} trails (${names.slice(0, NAMES_SHOWN).join(", ")}${more})`;
}

/**
 * Engine input from a public request once the route layer has looked up the planned trails:
 * parkSlug and trailIds are replaced by the trails' own conditions.
 */
export function inputFromRequest(request: PressureRequest, trails: TrailConditions[] = []): PressureInput {
  const { today, ...setup } = request;
  if (!today) return setup;
  const { parkSlug: _park, trailIds: _ids, rideHours: _hours, ...day } = today;
  return { ...setup, today: trails.length > 0 ? { ...day, trails } : day };
}
