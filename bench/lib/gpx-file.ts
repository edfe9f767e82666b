import { SaxesParser } from "saxes";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import type { Position, TrailWaypoint } from "@/lib/trails/pure/types";
import { seededRandom } from "@/scripts/demo/synthetic-trails";

/** The large synthetic recordings of bench/gpx-100k.ts and bench/http-uploads.ts. */
export const PARK = { lon: -121.94, lat: 47.3 };

/** The bare baseline: a saxes pass with the options we parse with, no handlers. */
export const bareSaxesPass = (text: string) => void new SaxesParser({ xmlns: true }).write(text).close();

/** Laps of a 1.5 km-radius loop round the (fictional) demo park, a point every ~5 m, rolling elevation with jitter. */
export function syntheticRecording(points: number): { segments: Position[][]; waypoints: TrailWaypoint[] } {
  const random = seededRandom(2024);
  const radiusM = 1500;
  const stepRad = 5 / radiusM;
  const cosLat = Math.cos((PARK.lat * Math.PI) / 180);
  const line: Position[] = [];
  for (let i = 0; i < points; i++) {
    const a = i * stepRad;
    const lon = PARK.lon + (radiusM * Math.cos(a)) / (cosLat * METRES_PER_DEGREE);
    const lat = PARK.lat + (radiusM * Math.sin(a)) / METRES_PER_DEGREE;
    const ele = 900 + 120 * Math.sin(a) + 4 * Math.sin(a * 40) + (random() - 0.5);
    line.push([+lon.toFixed(7), +lat.toFixed(7), +ele.toFixed(1)]);
  }
  const waypoints = Array.from({ length: 20 }, (_, k) => {
    const [lon, lat] = line[k * 4000];
    return { name: `Feature ${k}`, type: ["berm", "jump", "drop", "roots"][k % 4], lon, lat };
  });
  return { segments: [line], waypoints };
}

