/** Invented riders, setups and trails for the pressure integration tests (not real data). */
import { loadActor } from "@/lib/server/auth/actor";
import { parkToday } from "@/lib/conditions/park-today";
import { createSetup } from "@/lib/setups/setup-writes";
import { psiToKpa } from "@/lib/shared/units";
import type { SetupInputRaw } from "@/lib/setups/pure/setup-schema";
import { Park, Trail, TrailFeature, TrailReport } from "@/models";
import { createUser } from "../helpers";

export const wheel29 = { bsdMm: 622, widthMm: 61, casing: "trail", insert: false, tubeless: true, maxKpa: psiToKpa(40) } as const;

export const trailBike = (overrides: Partial<SetupInputRaw> = {}): SetupInputRaw => ({
  name: "Test 29er",
  riderMassKg: 72,
  bikeMassKg: 15.5,
  pace: "steady",
  front: wheel29,
  rear: wheel29,
  baseline: { frontKpa: psiToKpa(19), rearKpa: psiToKpa(23), surfaces: ["dry"], temperatureC: 18 },
  ...overrides,
});

export async function newRider() {
  const user = await createUser();
  return (await loadActor(user.id))!;
}

export async function riderWithSetup(overrides: Partial<SetupInputRaw> = {}) {
  const actor = await newRider();
  return { actor, setup: await createSetup(actor, trailBike(overrides)) };
}

/** A short straight trail near the test park's centre, with mapped features of the given kinds. */
export async function createTrail(park: Park, name: string, kinds: string[] = [], archived = false) {
  const line: GeoJSON.LineString = { type: "LineString", coordinates: [[8.5, 46.8], [8.501, 46.801]] };
  const trail = await Trail.create({
    parkId: park.id, name, difficulty: "intermediate", kind: "flow", geometry: line, simplified: line,
    lengthM: 135, ascentM: 0, descentM: 20, avgGradePct: 15, maxGradePct: 18, minElevationM: 900, maxElevationM: 920,
    suggestedDifficulty: null, minLon: 8.5, minLat: 46.8, maxLon: 8.501, maxLat: 46.801, pointCount: 2, createdBy: null,
    archivedAt: archived ? new Date() : null,
  });
  await TrailFeature.bulkCreate(kinds.map((kind, i) => ({ trailId: trail.id, kind, name: null, size: null, lon: 8.5, lat: 46.8, distanceAlongM: 10 * i })));
  return trail;
}

/** Today's report for a trail, written directly with the model (park-local date). */
export async function reportToday(park: Park, trail: Trail, status: "open" | "caution" | "closed", surfaces: string[], hoursAgo = 2) {
  return TrailReport.create({
    trailId: trail.id, parkId: park.id, reportDate: parkToday(park), status, reason: null, surfaces, features: {}, note: null,
    reporterId: null, reportedAt: new Date(Date.now() - hoursAgo * 3_600_000),
  });
}
