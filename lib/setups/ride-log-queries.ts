import "server-only";
/** A rider's own ride logs, newest first, with setup, park and trail names for display; and a setup's logs as evidence for the band. */
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { rideLogView } from "@/lib/setups/ride-logs";
import { rideEvidenceSchema, type RideEvidence } from "@/lib/pressure/pure/schemas";
import { MAX_LEARNING_LOGS } from "@/lib/pressure/pure/settings";
import { Park, RideLog, Setup, Trail } from "@/models";

export const RIDE_LOG_PAGE = 100;

export async function listRideLogs(actor: Actor | null) {
  authorize(actor, "own:ride-logs", { ownerId: actor?.id });
  const logs = await RideLog.findAll({
    where: { userId: actor.id },
    include: [{ model: Setup, as: "setup", attributes: ["id", "name", "baseline"] }],
    order: [["riddenOn", "DESC"], ["createdAt", "DESC"]],
    limit: RIDE_LOG_PAGE,
  });
  const parkIds = [...new Set(logs.map((l) => l.parkId).filter((id): id is string => Boolean(id)))];
  const trailIds = [...new Set(logs.flatMap((l) => l.trailIds))];
  const [parks, trails] = await Promise.all([
    parkIds.length ? Park.findAll({ where: { id: parkIds }, attributes: ["id", "slug", "name"] }) : [],
    trailIds.length ? Trail.findAll({ where: { id: trailIds }, attributes: ["id", "name"] }) : [],
  ]);
  const parkById = new Map(parks.map((p) => [p.id, { slug: p.slug, name: p.name }]));
  const trailName = new Map(trails.map((t) => [t.id, t.name]));
  return logs.map((log) => {
    const setup = (log as RideLog & { setup?: Setup | null }).setup;
    return {
      ...rideLogView(log),
      setup: setup ? { id: setup.id, name: setup.name, hasBaseline: Boolean(setup.baseline) } : null,
      park: log.parkId ? (parkById.get(log.parkId) ?? null) : null,
      trails: log.trailIds.map((id) => ({ id, name: trailName.get(id) ?? "(removed trail)" })),
    };
  });
}
export type RideLogListItem = Awaited<ReturnType<typeof listRideLogs>>[number];

/**
 * What a setup's ride logs tell the pressure engine, newest first (lib/pressure/pure/learning.ts).
 * Callers have already checked the setup is the caller's own (findOwnSetup). Logs that no longer
 * pass the engine's schema are left out rather than failing the band.
 */
export async function rideEvidence(setupId: string): Promise<RideEvidence[]> {
  const logs = await RideLog.findAll({
    where: { setupId },
    attributes: ["frontKpa", "rearKpa", "symptoms", "surfaces"],
    order: [["riddenOn", "DESC"], ["createdAt", "DESC"]],
    limit: MAX_LEARNING_LOGS,
  });
  return logs.flatMap((log) => {
    const parsed = rideEvidenceSchema.safeParse({ frontKpa: log.frontKpa, rearKpa: log.rearKpa, symptoms: log.symptoms, surfaces: log.surfaces });
    return parsed.success ? [parsed.data] : [];
  });
}
