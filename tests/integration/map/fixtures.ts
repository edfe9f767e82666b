import { Trail, type Park } from "@/models";

// An invented trail near the test park's centre (8.5, 46.8).
export const line = (dLat: number): GeoJSON.LineString => ({ type: "LineString", coordinates: [[8.5, 46.8 + dLat, 1500], [8.505, 46.8 + dLat, 1450], [8.51, 46.803 + dLat, 1400]] });

export async function createTrail(park: Park, name: string, extra: Partial<Trail> = {}) {
  const geometry = extra.geometry ?? line(0);
  return Trail.create({
    parkId: park.id,
    name,
    difficulty: "easy",
    kind: "flow",
    direction: "downhill",
    geometry,
    simplified: geometry,
    lengthM: 1092.6,
    ascentM: 0,
    descentM: 100.4,
    avgGradePct: 9.2,
    maxGradePct: 11.26,
    minElevationM: 1400,
    maxElevationM: 1500,
    suggestedDifficulty: null,
    minLon: 8.5,
    minLat: 46.8,
    maxLon: 8.51,
    maxLat: 46.803,
    pointCount: 3,
    createdBy: null,
    ...extra,
  });
}

