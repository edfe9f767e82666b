import "server-only";
/**
 * Ride logs: what a rider ran and how it felt → the ONE suggested baseline change
 * (lib/pressure/pure/feedback.ts), which the rider may then apply to the setup's baseline, once.
 */
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { findOwnSetup, setupView, storedSetup } from "@/lib/setups/setup-queries";
import { parkForRequest, pickTrails, trailsToday } from "@/lib/pressure/trails-today";
import { ceilingKpa, floorKpa } from "@/lib/pressure/pure/band";
import { suggestBaselineChange } from "@/lib/pressure/pure/feedback";
import { onReferenceGround } from "@/lib/pressure/pure/learning";
import type { Surface } from "@/lib/pressure/pure/schemas";
import { shiftDate } from "@/lib/shared/park-clock";
import { isUuid } from "@/lib/shared/ids";
import { parseInput } from "@/lib/shared/parse";
import { rideLogSchema } from "@/lib/setups/pure/ride-log-schema";
import { setupSchema, type SetupInput } from "@/lib/setups/pure/setup-schema";
import { unitsOf } from "@/lib/accounts/pure/units-schema";
import { unlessStale } from "@/lib/server/optimistic-lock";
import { RideLog, Setup, User, sequelize } from "@/models";
import { staleSetup } from "./setup-writes";
import { canApply, proposedBaseline, type StoredSuggestion } from "./pure/suggestion";

export type { StoredSuggestion } from "./pure/suggestion";

const WHEELS = ["front", "rear"] as const;

/** Limits for the suggestion: what was run (brought to the baseline's ground), max and floor. */
function feedbackLimits(setup: SetupInput, ran: { frontKpa: number; rearKpa: number; surfaces?: Surface[] }) {
  const mass = setup.riderMassKg + setup.bikeMassKg;
  const reference = setup.baseline?.surfaces ?? ran.surfaces ?? [];
  const limit = (w: (typeof WHEELS)[number]) => ({
    currentKpa: onReferenceGround(ran[`${w}Kpa`], ran.surfaces ?? [], reference, w),
    maxKpa: ceilingKpa(setup[w]),
    floorKpa: floorKpa(mass, w, setup[w]),
  });
  return { front: limit("front"), rear: limit("rear") };
}

export async function createRideLog(actor: Actor | null, raw: unknown, now = new Date()) {
  authorize(actor, "own:ride-logs", { ownerId: actor?.id });
  const input = parseInput(rideLogSchema, raw);
  const setupRow = await findOwnSetup(actor, input.setupId);
  // A day of slack for time zones; a ride cannot be logged further ahead.
  if (input.riddenOn > shiftDate(now.toISOString().slice(0, 10), 1)) throw new AppError(422, "The ride date cannot be in the future.", "riddenOn");
  const trailIds = input.trailIds ?? [];
  if (trailIds.length > 0 && !input.parkSlug) throw new AppError(422, "Name the park these trails belong to.", "parkSlug");
  const park = input.parkSlug ? await parkForRequest(input.parkSlug, "parkSlug") : null;
  if (park && trailIds.length > 0) pickTrails(await trailsToday(park, now), trailIds, "trailIds");

  const setup = storedSetup(setupRow);
  const user = await User.findByPk(actor.id, { attributes: ["units"] });
  const suggestion = suggestBaselineChange(input.symptoms, {
    unit: unitsOf(user?.units).pressure,
    limits: feedbackLimits(setup, input),
    surfaces: input.surfaces ?? [],
    referenceSurfaces: setup.baseline?.surfaces ?? input.surfaces ?? [],
  });
  const stored: StoredSuggestion = { ...suggestion, appliesTo: setup.baseline ? "baseline" : "ran" };
  const log = await RideLog.create({
    userId: actor.id,
    setupId: setupRow.id,
    parkId: park?.id ?? null,
    riddenOn: input.riddenOn,
    trailIds,
    frontKpa: input.frontKpa,
    rearKpa: input.rearKpa,
    symptoms: input.symptoms,
    surfaces: input.surfaces ?? [],
    note: input.note || null,
    suggestion: stored,
  });
  return { rideLog: rideLogView(log), suggestion: stored };
}

export function rideLogView(log: RideLog) {
  return {
    id: log.id,
    setupId: log.setupId,
    riddenOn: log.riddenOn,
    trailIds: log.trailIds,
    frontKpa: log.frontKpa,
    rearKpa: log.rearKpa,
    symptoms: log.symptoms,
    surfaces: log.surfaces,
    note: log.note,
    suggestion: log.suggestion as StoredSuggestion | null,
    appliedAt: log.appliedAt ?? null,
    createdAt: log.createdAt,
  };
}

/** Applies a ride log's suggestion to its setup's baseline, in one transaction, at most once. */
export async function applyRideLogSuggestion(actor: Actor | null, id: unknown, now = new Date()) {
  authorize(actor, "own:ride-logs", { ownerId: actor?.id });
  return sequelize.transaction(async (transaction) => {
    const log = isUuid(id) ? await RideLog.findOne({ where: { id, userId: actor.id }, lock: transaction.LOCK.UPDATE, transaction }) : null;
    if (!log) throw new AppError(404, "Ride log not found.");
    const suggestion = log.suggestion as StoredSuggestion | null;
    if (log.appliedAt) throw new AppError(409, "This suggestion was already applied.");
    if (!log.setupId || !suggestion) throw new AppError(409, "The setup of this ride no longer exists.");
    const setupRow = await Setup.findOne({ where: { id: log.setupId, userId: actor.id }, lock: transaction.LOCK.UPDATE, transaction });
    if (!setupRow) throw new AppError(409, "The setup of this ride no longer exists.");
    const setup = storedSetup(setupRow);
    if (!canApply({ suggestion, appliedAt: null, setupId: log.setupId }, Boolean(setup.baseline))) {
      throw new AppError(409, "Nothing to change: keep the baseline as it is.");
    }
    const baseline = setup.baseline ?? { frontKpa: log.frontKpa, rearKpa: log.rearKpa, surfaces: log.surfaces.length ? log.surfaces : ["dry"] };
    const changed = proposedBaseline(baseline, suggestion);
    const merged = parseInput(setupSchema, { ...setup, baseline: changed });
    await unlessStale(() => setupRow.update({ baseline: merged.baseline ?? null }, { transaction }), () => staleSetup(setupRow.lockVersion));
    await log.update({ appliedAt: now }, { transaction });
    return { setup: setupView(setupRow), rideLog: rideLogView(log) };
  });
}
