import { cumulativeDistancesM } from "./geo";
import { METRES_PER_DEGREE } from "./limits";
import type { Position } from "./types";

export type Turn = {
  /** Distance along the segment to the turn's middle, metres. */
  atM: number;
  /** How far the heading swings through the turn, degrees. */
  angleDeg: number;
  /** Mean turning radius: the turn's length over the angle it swings (radians), metres. */
  radiusM: number;
};

/**
 * The tight turns of one segment: runs of points where the line bends one way at least as sharply
 * as `maxRadiusM`, and swings through at least `minAngleDeg` in all (120° finds switchbacks, 60°
 * bermed corners too). Gentle bends along a contour never count, however far they swing.
 * Headings are measured on a local plane (fine over a trail's few kilometres).
 */
export function tightTurns(segment: Position[], { minAngleDeg = 120, maxRadiusM = 30 } = {}): Turn[] {
  const n = segment.length;
  if (n < 3) return [];
  const cosLat = Math.cos((segment[0][1] * Math.PI) / 180);
  const xy = segment.map((p) => [p[0] * cosLat * METRES_PER_DEGREE, p[1] * METRES_PER_DEGREE]);
  const along = cumulativeDistancesM(segment);
  const turns: Turn[] = [];
  let run = { sign: 0, angle: 0, length: 0, from: 0, to: 0 };
  const close = () => {
    if ((run.angle * 180) / Math.PI >= minAngleDeg) {
      // Where a sampled arc meets straight legs, its end points turn by half a step each, so the arc
      // from the first to the last turning point is the turn's length (one point alone: its share).
      const arcM = run.to > run.from ? along[run.to] - along[run.from] : run.length;
      turns.push({ atM: (along[run.from] + along[run.to]) / 2, angleDeg: (run.angle * 180) / Math.PI, radiusM: arcM / run.angle });
    }
    run = { sign: 0, angle: 0, length: 0, from: 0, to: 0 };
  };
  for (let i = 1; i < n - 1; i++) {
    const [a, b, c] = [xy[i - 1], xy[i], xy[i + 1]];
    const [ux, uy, vx, vy] = [b[0] - a[0], b[1] - a[1], c[0] - b[0], c[1] - b[1]];
    const change = Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
    // Each point stands for half of the step before it and half of the step after it.
    const share = (Math.hypot(ux, uy) + Math.hypot(vx, vy)) / 2;
    const sharp = share > 0 && Math.abs(change) / share >= 1 / maxRadiusM;
    if (!sharp || (run.sign !== 0 && Math.sign(change) !== run.sign)) close();
    if (!sharp) continue;
    if (run.sign === 0) run = { sign: Math.sign(change), angle: 0, length: 0, from: i, to: i };
    run.angle += Math.abs(change);
    run.length += share;
    run.to = i;
  }
  close();
  return turns;
}
