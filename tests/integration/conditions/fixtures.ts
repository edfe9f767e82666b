import { loadActor } from "@/lib/server/auth/actor";
import type { Actor } from "@/lib/server/auth/permissions";
import { photoStorage } from "@/lib/server/storage";
import { Trail, type Park } from "@/models";
import { addStaff, createPark, createUser } from "../helpers";

/** A straight test trail of about 1.1 km running north from the park's centre. */
export async function createTrail(park: Park, name: string, difficulty = "intermediate", kind = "flow") {
  const line: GeoJSON.LineString = {
    type: "LineString",
    coordinates: [
      [park.centerLon, park.centerLat],
      [park.centerLon, park.centerLat + 0.005],
      [park.centerLon, park.centerLat + 0.01],
    ],
  };
  return Trail.create({
    parkId: park.id,
    name,
    difficulty,
    kind,
    geometry: line,
    simplified: line,
    lengthM: 1112,
    ascentM: null,
    descentM: null,
    avgGradePct: null,
    maxGradePct: null,
    minElevationM: null,
    maxElevationM: null,
    suggestedDifficulty: null,
    minLon: park.centerLon,
    minLat: park.centerLat,
    maxLon: park.centerLon,
    maxLat: park.centerLat + 0.01,
    pointCount: 3,
    createdBy: null,
  });
}

export async function staffOf(park: Park, role: "ranger" | "manager" = "ranger"): Promise<Actor> {
  const user = await createUser();
  await addStaff(park.id, user.id, role);
  return (await loadActor(user.id))!;
}

export async function riderActor(): Promise<Actor> {
  return (await loadActor((await createUser()).id))!;
}

/** A park with a ranger and `count` trails named "Trail 1"… */
export async function parkWithTrails(count: number, timeZone = "Europe/Zurich") {
  const park = await createPark();
  if (timeZone !== park.timeZone) await park.update({ timeZone });
  const ranger = await staffOf(park);
  const trails = [];
  for (let i = 1; i <= count; i++) trails.push(await createTrail(park, `Trail ${i}`));
  return { park, ranger, trails };
}

/** Every object in the photo storage, whichever driver holds it (empty when there is none yet). */
export const storedFiles = (): Promise<string[]> => photoStorage().list();

/** The refusal an async call ends with (or a failure when it does not refuse). */
export async function refusal(promise: Promise<unknown>): Promise<{ status: number; message: string; field?: string; details?: unknown }> {
  try {
    await promise;
  } catch (error) {
    return error as { status: number; message: string; field?: string; details?: unknown };
  }
  throw new Error("expected a refusal, but the call succeeded");
}
