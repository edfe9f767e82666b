import "server-only";
/**
 * POST /api/pressure behind the handler: resolves a saved setup (own only) and the park's trails
 * for today into the engine's input, then runs the pure engine. A trail without a report today
 * is unknown (the engine says so in a caution); a closed trail adds a caution of its own.
 */
import type { Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { findOwnSetup, storedSetup } from "@/lib/setups/setup-queries";
import { defaultTrailIds, parkForRequest, pickTrails, trailConditions, trailsToday, type TrailToday } from "@/lib/pressure/trails-today";
import { computePressureBand, inputFromRequest, type PressureResult } from "@/lib/pressure/pure";
import type { PressureUnit } from "@/lib/shared/units";
import { parseInput } from "@/lib/shared/parse";
import {
  pressureRequestSchema,
  savedSetupPressureRequestSchema,
  type PressureRequest,
  type TrailConditions,
} from "@/lib/pressure/pure/schemas";
import { unitsOf } from "@/lib/accounts/pure/units-schema";
import { rideEvidence } from "@/lib/setups/ride-log-queries";
import type { RideEvidence } from "@/lib/pressure/pure/schemas";
import { User } from "@/models";

export type PressureConditions = {
  park: { slug: string; name: string; baseElevationM: number; summitElevationM: number };
  reportDate: string;
  rideElevationM: number;
  /** The planned trails' height range: the maximum is checked at the top, the band widens with the span. */
  lowestElevationM: number;
  highestElevationM: number;
  trails: Pick<TrailToday, "id" | "name" | "status" | "surfaces" | "features">[];
};
export type PressureAnswer = PressureResult & { unit: PressureUnit; setupId?: string; conditions?: PressureConditions };

const hasSetupId = (raw: unknown) => typeof raw === "object" && raw !== null && "setupId" in raw;

/** The request with its setup filled in: inline, or from one of the caller's saved setups. */
async function setupRequest(actor: Actor | null, raw: unknown): Promise<{ request: PressureRequest; setupId?: string; rides?: RideEvidence[] }> {
  if (!hasSetupId(raw)) return { request: parseInput(pressureRequestSchema, raw) };
  const body = parseInput(savedSetupPressureRequestSchema, raw);
  const setup = await findOwnSetup(actor, body.setupId);
  const user = await User.findByPk(setup.userId, { attributes: ["units"] });
  const { name: _name, suspension: _suspension, baseline, ...stored } = storedSetup(setup);
  const request = parseInput(pressureRequestSchema, {
    ...stored,
    ...(baseline ? { baseline } : {}),
    unit: body.unit ?? unitsOf(user?.units).pressure,
    ...(body.today ? { today: body.today } : {}),
  });
  return { request, setupId: setup.id, rides: await rideEvidence(setup.id) };
}

const closedCaution = (closed: TrailToday[]) =>
  `Closed today: ${closed.map((t) => t.name).join(", ")}. Do not ride closed trails; follow park signage and staff.`;

export async function pressureForRequest(actor: Actor | null, raw: unknown, now = new Date()): Promise<PressureAnswer> {
  const { request, setupId, rides } = await setupRequest(actor, raw);
  const today = request.today;
  let trails: TrailConditions[] = [];
  let conditions: PressureConditions | undefined;
  let closed: TrailToday[] = [];
  if (today?.trailIds?.length && !today.parkSlug) throw new AppError(422, "Name the park these trails belong to.", "today.parkSlug");
  if (today?.parkSlug) {
    const park = await parkForRequest(today.parkSlug, "today.parkSlug");
    const parkDay = await trailsToday(park, now);
    const chosen = pickTrails(parkDay, today.trailIds?.length ? today.trailIds : defaultTrailIds(parkDay), "today.trailIds");
    trails = chosen.map((t) => trailConditions(t, now));
    closed = chosen.filter((t) => t.status === "closed");
    // The planned trails' heights (the park's base and summit where a trail has none): the maximum is
    // checked at the top, the band widens with the span, and the midpoint stands for the day.
    today.highestElevationM ??= Math.max(...chosen.map((t) => t.maxElevationM ?? park.summitElevationM));
    today.lowestElevationM ??= Math.min(...chosen.map((t) => t.minElevationM ?? park.baseElevationM));
    today.rideElevationM ??= Math.round((today.lowestElevationM + today.highestElevationM) / 2);
    conditions = {
      park: { slug: park.slug, name: park.name, baseElevationM: park.baseElevationM, summitElevationM: park.summitElevationM },
      reportDate: parkDay.reportDate,
      rideElevationM: today.rideElevationM,
      lowestElevationM: today.lowestElevationM,
      highestElevationM: today.highestElevationM,
      trails: chosen.map(({ id, name, status, surfaces, features }) => ({ id, name, status, surfaces, features })),
    };
  }
  const result = computePressureBand({ ...inputFromRequest(request, trails), ...(rides?.length ? { rides } : {}) });
  const cautions = closed.length > 0 ? [closedCaution(closed), ...result.cautions] : result.cautions;
  return { ...result, cautions, unit: request.unit, ...(setupId ? { setupId } : {}), ...(conditions ? { conditions } : {}) };
}
