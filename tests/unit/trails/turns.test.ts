import { describe, expect, it } from "vitest";
import { tightTurns } from "@/lib/trails/pure/turns";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import type { Position } from "@/lib/trails/pure/types";

// Computed from the definition of a circular arc: length = radius × angle (radians), so a line
// sampled along an arc of radius r through θ is measured as a turn of r through θ.
const LAT = 47.3;
const toLonLat = ([x, y]: [number, number]): Position => [-121.94 + x / (Math.cos((LAT * Math.PI) / 180) * METRES_PER_DEGREE), LAT + y / METRES_PER_DEGREE];

/** Two 60 m legs joined by a hairpin of the given radius (points every `stepM` metres). */
function hairpin(radiusM: number, stepM: number): Position[] {
  const points: Array<[number, number]> = [];
  for (let y = -60; y < 0; y += stepM) points.push([0, y]);
  const steps = Math.round((Math.PI * radiusM) / stepM);
  for (let k = 0; k <= steps; k++) {
    const a = Math.PI - (Math.PI * k) / steps; // from the west end of the circle over the top to the east end
    points.push([radiusM + radiusM * Math.cos(a), radiusM * Math.sin(a)]);
  }
  for (let y = -stepM; y >= -60; y -= stepM) points.push([2 * radiusM, y]);
  return points.map(toLonLat);
}

describe("tightTurns", () => {
  it.each([[3, 1], [6, 1.5], [10, 2]])("measures a hairpin of %s m radius (points every %s m) as one 180° turn of that radius", (radius, step) => {
    const turns = tightTurns(hairpin(radius, step));
    expect(turns).toHaveLength(1);
    expect(turns[0].angleDeg).toBeCloseTo(180, -1);
    expect(Math.abs(turns[0].radiusM - radius) / radius).toBeLessThan(0.05);
    expect(turns[0].atM).toBeCloseTo(60 + (Math.PI * radius) / 2, -1);
  });

  it("does not count a gentle bend, however far it swings (200 m radius through 180°)", () => {
    const arc = Array.from({ length: 300 }, (_, k) => toLonLat([200 * Math.cos((Math.PI * k) / 299), 200 * Math.sin((Math.PI * k) / 299)]));
    expect(tightTurns(arc)).toEqual([]);
    expect(tightTurns(arc, { maxRadiusM: 250 })).toHaveLength(1);
  });

  it("counts a 90° corner only when asked for turns of 60° or more", () => {
    const corner = [...Array.from({ length: 20 }, (_, k) => toLonLat([0, -40 + 2 * k])), ...Array.from({ length: 20 }, (_, k) => toLonLat([2 * k, 0]))];
    expect(tightTurns(corner)).toEqual([]);
    expect(tightTurns(corner, { minAngleDeg: 60 })).toHaveLength(1);
  });
});
