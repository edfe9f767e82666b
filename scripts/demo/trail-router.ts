import type { ElevationModel } from "@/lib/map/pure/contours";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import { computeTrailStats } from "@/lib/trails/pure/stats";
import type { Position } from "@/lib/trails/pure/types";
import { seededRandom } from "@/scripts/demo/synthetic-trails";

/**
 * Lays a FICTIONAL demo trail on a synthetic terrain the way a crew flags one (invented data,
 * never a test oracle). The trail walks down (or up) its lane, a corridor on the hill:
 * - where the ground along the lane is no steeper than the trail's grade, it runs down the lane
 *   with a gentle meander (a fall-line descent);
 * - where it is steeper, it traverses across the slope at the trail's grade, and at the lane's
 *   edge turns back through the fall line on a tight radius: a switchback, legs tens of metres;
 * - a climb keeps its grade at most 40 % of the side slope (IMBA's half rule, with a margin).
 * Elevations are the terrain's, smoothed over a few metres as a graded tread is, so the
 * contours drawn from the same model agree with the trails. Deterministic for a seed.
 */
export type RouteSpec = {
  seed: number;
  /** Lane: from start through the via points to the end, [lon, lat]. */
  lane: Array<[number, number]>;
  direction: "down" | "up";
  /** Grade the crew aims for where the ground allows, percent. */
  gradePct: number;
  /** 0…1: how much the aimed grade swings along the trail (steep pitches and benches). */
  gradeVariation: number;
  /** How far the trail may wander either side of its lane before it turns back, metres. */
  halfWidthM: number;
  /** Radius of a switchback or bermed turn, metres. */
  turnRadiusM: number;
  /** Tightest bend elsewhere, metres. */
  bendRadiusM: number;
  /** Meander on gentle ground: the largest swing off the lane's heading, degrees. */
  meanderDeg: number;
  /** Mean spacing of the recorded points, metres (each step varies ±30 %). */
  spacingM: number;
  /** Altimeter jitter per point, ± metres. */
  noiseM: number;
  /** Steepest the crew lets the tread get anywhere, turns included (they cut and fill to hold it), percent. */
  steepestPct: number;
};


type Vec = [number, number];
const STEP_M = 1;
const HALF_RULE = 0.4;

const add = (a: Vec, b: Vec, k = 1): Vec => [a[0] + b[0] * k, a[1] + b[1] * k];
const dot = (a: Vec, b: Vec) => a[0] * b[0] + a[1] * b[1];
const cross = (a: Vec, b: Vec) => a[0] * b[1] - a[1] * b[0];
const unit = (a: Vec): Vec => {
  const l = Math.hypot(a[0], a[1]) || 1;
  return [a[0] / l, a[1] / l];
};
const rotate = (a: Vec, angle: number): Vec => [a[0] * Math.cos(angle) - a[1] * Math.sin(angle), a[0] * Math.sin(angle) + a[1] * Math.cos(angle)];
const angleBetween = (from: Vec, to: Vec) => Math.atan2(cross(from, to), dot(from, to));

/** A local plane in metres (east, north) around an origin, and back to longitude and latitude. */
function planeAround(origin: [number, number]) {
  const cosLat = Math.cos((origin[1] * Math.PI) / 180);
  return {
    toLocal: ([lon, lat]: [number, number]): Vec => [(lon - origin[0]) * cosLat * METRES_PER_DEGREE, (lat - origin[1]) * METRES_PER_DEGREE],
    toLonLat: ([x, y]: Vec): [number, number] => [origin[0] + x / (cosLat * METRES_PER_DEGREE), origin[1] + y / METRES_PER_DEGREE],
  };
}

/** Dense lane polyline (every 2 m) with the distance to each point. */
function denseLane(points: Vec[]) {
  const out: Vec[] = [points[0]];
  for (let i = 1; i < points.length; i++) {
    const [a, b] = [points[i - 1], points[i]];
    const n = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / 2));
    for (let k = 1; k <= n; k++) out.push([a[0] + ((b[0] - a[0]) * k) / n, a[1] + ((b[1] - a[1]) * k) / n]);
  }
  const at = [0];
  for (let i = 1; i < out.length; i++) at.push(at[i - 1] + Math.hypot(out[i][0] - out[i - 1][0], out[i][1] - out[i - 1][1]));
  return { points: out, at, length: at[at.length - 1] };
}

export function routeTrail(spec: RouteSpec, terrain: ElevationModel): Position[] {
  const random = seededRandom(spec.seed);
  const plane = planeAround(spec.lane[0]);
  const z = (p: Vec) => terrain(...plane.toLonLat(p));
  const uphill = (p: Vec): Vec => [(z([p[0] + 2, p[1]]) - z([p[0] - 2, p[1]])) / 4, (z([p[0], p[1] + 2]) - z([p[0], p[1] - 2])) / 4];
  const lane = denseLane(spec.lane.map(plane.toLocal));
  const end = lane.points[lane.points.length - 1];
  const sign = spec.direction === "down" ? -1 : 1; // grade along u, counted in the trail's direction: sign · ∇z · u
  const [k1, k2, phase1, phase2, meanderPhase] = [2 + Math.floor(random() * 4), 7 + Math.floor(random() * 6), random() * 6.3, random() * 6.3, random() * 6.3];
  const meanderWaveM = 50 + random() * 40;

  let p: Vec = lane.points[0];
  let heading = unit(add(lane.points[Math.min(10, lane.points.length - 1)], p, -1));
  let side = random() < 0.5 ? 1 : -1;
  let turning = false;
  let turnDirection = 1;
  let legReach = 1;
  let laneIndex = 0;
  const path: Vec[] = [p];
  let travelled = 0;

  while (Math.hypot(end[0] - p[0], end[1] - p[1]) > 2) {
    if (travelled > 60_000) throw new Error(`Trail ${spec.seed} did not reach its end: check its lane and grade.`);
    // Where the trail is along its lane (search near the last place: legs never jump far).
    let [best, bestSquared] = [laneIndex, Infinity];
    for (let i = Math.max(0, laneIndex - 60); i < Math.min(lane.points.length, laneIndex + 150); i++) {
      const [dx, dy] = [lane.points[i][0] - p[0], lane.points[i][1] - p[1]];
      if (dx * dx + dy * dy < bestSquared) [best, bestSquared] = [i, dx * dx + dy * dy];
    }
    laneIndex = best;
    const progress = lane.at[best] / lane.length;
    const toEnd = lane.length - lane.at[best];
    const tangent = unit(add(lane.points[Math.min(best + 3, lane.points.length - 1)], lane.points[Math.max(best - 3, 0)], -1));
    const normal: Vec = [-tangent[1], tangent[0]];
    const offset = dot(add(p, lane.points[best], -1), normal);
    // The lane narrows near its ends so the trail leaves its start and reaches its end directly.
    // It also swells and narrows along the way, as benches and cliffs leave room for longer or shorter legs.
    const room = 0.8 + 0.2 * Math.sin(2 * Math.PI * 3 * progress + phase2);
    const halfWidth = Math.max(2.5 * spec.turnRadiusM, room * spec.halfWidthM * Math.min(1, toEnd / (3 * spec.halfWidthM), lane.at[best] / (2 * spec.halfWidthM) + 0.3));

    const gradient = uphill(p);
    const slope = Math.hypot(...gradient);
    const swing = 1 + spec.gradeVariation * (0.6 * Math.sin(2 * Math.PI * k1 * progress + phase1) + 0.4 * Math.sin(2 * Math.PI * k2 * progress + phase2));
    let grade = (spec.gradePct / 100) * Math.max(0.3, swing);
    if (spec.direction === "up") grade = Math.min(grade, HALF_RULE * slope);
    const gradeAlong = (u: Vec) => sign * dot(gradient, u);

    // Down the lane, meandering and pulled back towards its middle.
    const meander = ((spec.meanderDeg * Math.PI) / 180) * Math.sin((2 * Math.PI * travelled) / meanderWaveM + meanderPhase);
    const pull = -Math.atan((1.2 * offset) / halfWidth) * 0.6;
    let desired = rotate(tangent, meander + pull);
    if (toEnd < 25) desired = unit(add(end, p, -1));
    else if (gradeAlong(desired) > grade) {
      // Too steep: traverse at the trail's grade towards the current side; at the edge, switch back.
      if (side * offset > halfWidth * legReach && !turning) {
        side = -side;
        legReach = 0.45 + 0.55 * random(); // legs of uneven length, as the ground dictates where a turn fits
        turning = true;
        // A switchback swings through the fall line (downhill for a descent, uphill for a climb), as a built turn does.
        turnDirection = Math.sign(angleBetween(heading, unit([sign * gradient[0], sign * gradient[1]]))) || 1;
      }
      const A = gradeAlong(tangent);
      const B = gradeAlong(normal);
      const R = Math.hypot(A, B);
      const alpha = Math.atan2(B, A);
      const beta = Math.acos(Math.min(1, grade / R));
      const candidates = [alpha + beta, alpha - beta];
      const chosen = candidates.find((phi) => Math.sign(Math.sin(phi)) === side) ?? (Math.cos(candidates[0]) > Math.cos(candidates[1]) ? candidates[0] : candidates[1]);
      desired = unit([tangent[0] * Math.cos(chosen) + normal[0] * Math.sin(chosen), tangent[1] * Math.cos(chosen) + normal[1] * Math.sin(chosen)]);
    }

    // Turn towards the wanted heading no tighter than the radius allows.
    let change = angleBetween(heading, desired);
    if (turning) {
      // Swing the chosen way round; a wanted heading just behind the swing means it is already reached.
      const overshot = Math.sign(change) !== turnDirection && Math.abs(change) < 1;
      // …unless that way round is a loop: then the short way.
      if (Math.sign(change) !== turnDirection && !overshot && 2 * Math.PI - Math.abs(change) < 3.5) change = turnDirection * (2 * Math.PI - Math.abs(change));
      if (overshot || Math.abs(change) < 0.08) {
        turning = false;
      }
    }
    // The last few metres run straight in, whatever the heading (a trail's end is where it joins the base).
    const limit = toEnd < 25 ? Math.PI : STEP_M / (turning ? spec.turnRadiusM : spec.bendRadiusM);
    heading = unit(rotate(heading, Math.max(-limit, Math.min(limit, change))));
    p = add(p, heading, STEP_M);
    travelled += STEP_M;
    path.push(p);
  }
  path.push(end);
  return recorded(path, z, (q) => Math.hypot(...uphill(q)), spec, random);
}

/**
 * The tread's height along the walked path: the ground, cut and filled so no step is steeper than
 * `steepestPct` (how a crew benches a switchback: the upper leg is cut down, the lower one built
 * up). The mean of a fill pass (from the top) and a cut pass (from the bottom): each holds the
 * limit, so their mean does too, and it strays from the ground half as far as either. A climb's
 * limit is also the half rule's, its turns included.
 */
function gradedTread(ground: number[], stepM: number, steepestPct: number[]): number[] {
  const rise = steepestPct.map((pct) => (pct / 100) * stepM);
  const fill = [...ground];
  for (let i = 1; i < fill.length; i++) fill[i] = Math.min(Math.max(fill[i], fill[i - 1] - rise[i]), fill[i - 1] + rise[i]);
  const cut = [...ground];
  for (let i = cut.length - 2; i >= 0; i--) cut[i] = Math.min(Math.max(cut[i], cut[i + 1] - rise[i + 1]), cut[i + 1] + rise[i + 1]);
  return ground.map((_, i) => (fill[i] + cut[i]) / 2);
}

/** The walked path as a recording: the graded tread's height, points every few metres. */
function recorded(path: Vec[], z: (p: Vec) => number, slope: (p: Vec) => number, spec: RouteSpec, random: () => number): Position[] {
  const plane = planeAround(spec.lane[0]);
  const ground = path.map(z);
  const limits = path.map((p) => (spec.direction === "up" ? Math.min(spec.steepestPct, 100 * HALF_RULE * slope(p)) : spec.steepestPct));
  const tread = gradedTread(ground, STEP_M, limits);
  const out: Position[] = [];
  for (let i = 0; ; i = Math.min(path.length - 1, i + Math.max(1, Math.round(spec.spacingM * (0.7 + 0.6 * random()))))) {
    const [lon, lat] = plane.toLonLat(path[i]);
    const ele = i === 0 || i === path.length - 1 ? tread[i] : tread[i] + spec.noiseM * (2 * random() - 1);
    out.push([round(lon, 7), round(lat, 7), round(ele, 1)]);
    if (i === path.length - 1) return out;
  }
}

const round = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;

/** A lane from `from` to `to` bowed sideways by `bulgeM` (positive to the left), as [lon, lat] via points. */
export function bowedLane(from: [number, number], to: [number, number], bulgeM: number, vias = 12): Array<[number, number]> {
  const plane = planeAround(from);
  const b = plane.toLocal(to);
  const along = unit(b);
  const left: Vec = [-along[1], along[0]];
  return Array.from({ length: vias + 1 }, (_, i) => {
    const t = i / vias;
    return plane.toLonLat(add([b[0] * t, b[1] * t], left, bulgeM * Math.sin(Math.PI * t)));
  });
}

/**
 * Routes the trail so its average grade (the project's own measure, computeTrailStats) comes out
 * at `averagePct`: switchbacks drop faster than the legs, so the aimed leg grade is corrected a few
 * times by the ratio of wanted to measured average.
 */
export function routeToAverage(spec: Omit<RouteSpec, "gradePct">, averagePct: number, terrain: ElevationModel): Position[] {
  let gradePct = averagePct;
  let routed = routeTrail({ ...spec, gradePct }, terrain);
  for (let round = 0; round < 4; round++) {
    const measured = computeTrailStats([routed]).avgGradePct ?? averagePct;
    if (Math.abs(measured - averagePct) < 0.1) break;
    gradePct = Math.min(1.5 * averagePct, Math.max(0.4 * averagePct, gradePct * (averagePct / measured)));
    routed = routeTrail({ ...spec, gradePct }, terrain);
  }
  return routed;
}
