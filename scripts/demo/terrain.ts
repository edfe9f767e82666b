import { seededRandom } from "@/scripts/demo/synthetic-trails";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import type { ElevationModel } from "@/lib/map/pure/contours";

type Spot = { lon: number; lat: number; elevationM: number };

/**
 * A synthetic elevation model for a fictional park (invented data for the demo, never a test
 * oracle): one hill whose top is the summit, falling along a ridge through a shoulder to the base,
 * with shallow gullies cut into its flanks. It passes through the three spot heights exactly and is
 * deterministic for a given seed.
 */
export type HillSpec = {
  summit: Spot;
  /** A spot height on the ridge between summit and base: sets how the slope steepens. */
  shoulder: Spot;
  base: Spot;
  /** The valley floor far from the hill. */
  floorM: number;
  /** Cross-slope compression: below 1 the hill is a ridge running from summit to base. */
  ridgeRatio: number;
  /** Depth of the gullies on the flanks, metres. */
  gullyM: number;
  seed: number;
};

export function hillElevationModel(spec: HillSpec): ElevationModel {
  const { summit, shoulder, base, floorM, ridgeRatio, gullyM } = spec;
  const cosLat = Math.cos((summit.lat * Math.PI) / 180);
  const toLocal = (lon: number, lat: number) => [(lon - summit.lon) * cosLat * METRES_PER_DEGREE, (lat - summit.lat) * METRES_PER_DEGREE];
  const [bx, by] = toLocal(base.lon, base.lat);
  const baseDistance = Math.hypot(bx, by);
  const [ux, uy] = [bx / baseDistance, by / baseDistance];
  const ridgeDistance = (x: number, y: number) => Math.hypot(x * ux + y * uy, (-x * uy + y * ux) / ridgeRatio);
  // Height above the floor falls as exp(-(d/L)^p); p and L make it pass through shoulder and base.
  const rise = summit.elevationM - floorM;
  const [a, b] = [Math.log(rise / (base.elevationM - floorM)), Math.log(rise / (shoulder.elevationM - floorM))];
  const shoulderDistance = ridgeDistance(...(toLocal(shoulder.lon, shoulder.lat) as [number, number]));
  const power = Math.log(a / b) / Math.log(baseDistance / shoulderDistance);
  const scaleM = baseDistance / a ** (1 / power);
  const random = seededRandom(spec.seed);
  const waves = [0, 1, 2].map(() => ({ k: 2 + Math.floor(random() * 3), phase: random() * 2 * Math.PI, amplitude: 0.5 + random() * 0.5 }));

  return (lon, lat) => {
    const [x, y] = toLocal(lon, lat);
    const along = x * ux + y * uy;
    const across = -x * uy + y * ux;
    const d = ridgeDistance(x, y);
    const hill = floorM + rise * Math.exp(-((d / scaleM) ** power));
    // Gullies only on the flanks, away from the ridge line where the spot heights stand.
    const fade = Math.min(1, Math.abs(across) / 250);
    const gullies = waves.reduce((sum, w) => sum + w.amplitude * Math.sin((w.k * 2 * Math.PI * across) / baseDistance + w.phase + along / 400), 0);
    return hill - gullyM * fade * Math.abs(gullies) / waves.length;
  };
}
