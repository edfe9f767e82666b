import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import type { Position } from "@/lib/trails/pure/types";

/**
 * Synthetic lines winding between two points for the benchmark and unit tests (invented data, never a
 * test oracle; the demo parks lay theirs on a terrain, trail-router.ts). Deterministic: the same
 * spec and seed always give the same line.
 */

/** Small seeded PRNG (mulberry32): uniform numbers in [0, 1). */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export type SyntheticTrailSpec = {
  seed: number;
  start: [number, number];
  end: [number, number];
  startEleM: number;
  endEleM: number;
  /** Target horizontal length; the line winds back and forth until it is this long. */
  lengthM: number;
  /** Sideways bow of the whole line, metres (positive to the left of start→end): its lane on the hill. */
  bulgeM: number;
  /** Half-width of the winding (switchbacks) within the lane, metres. */
  meanderM: number;
  /** Mean spacing between points, metres (each step varies ±30 %). */
  spacingM: number;
  /** 0…1: how uneven the grade is along the trail (steep pitches and flatter benches). */
  gradeVariation: number;
  /** Small rollers on top of the descent: amplitude and wavelength, metres. */
  rollerM: number;
  rollerWavelengthM: number;
  /** Independent elevation jitter per point (± metres), like a GPS. */
  noiseM: number;
};

const DENSE = 6000;

type Frame = { x0: number; y0: number; cosLat: number; ux: number; uy: number; length: number };

function frameOf(start: [number, number], end: [number, number]): Frame {
  const cosLat = Math.cos((((start[1] + end[1]) / 2) * Math.PI) / 180);
  const dx = (end[0] - start[0]) * cosLat * METRES_PER_DEGREE;
  const dy = (end[1] - start[1]) * METRES_PER_DEGREE;
  const length = Math.hypot(dx, dy);
  return { x0: start[0], y0: start[1], cosLat, ux: dx / length, uy: dy / length, length };
}

/**
 * Dense planar path (metres from start) winding `cycles` times across its lane. The winding
 * narrows towards both ends so every trail leaves its start and reaches its end directly.
 */
function densePath(frame: Frame, spec: SyntheticTrailSpec, cycles: number): Array<[number, number]> {
  const path: Array<[number, number]> = [];
  for (let i = 0; i <= DENSE; i++) {
    const t = i / DENSE;
    const along = frame.length * t;
    const envelope = Math.sqrt(Math.sin(Math.PI * t));
    const side = spec.bulgeM * Math.sin(Math.PI * t) + spec.meanderM * envelope * Math.sin(2 * Math.PI * cycles * t);
    path.push([frame.ux * along - frame.uy * side, frame.uy * along + frame.ux * side]);
  }
  return path;
}

function cumulative(path: Array<[number, number]>): number[] {
  const out = [0];
  for (let i = 1; i < path.length; i++) out.push(out[i - 1] + Math.hypot(path[i][0] - path[i - 1][0], path[i][1] - path[i - 1][1]));
  return out;
}

/** Finds how many windings give the target length (bisection; length grows with the count). */
function pathOfLength(frame: Frame, spec: SyntheticTrailSpec): Array<[number, number]> {
  let [low, high] = [0, spec.lengthM / Math.max(1, spec.meanderM)];
  for (let k = 0; k < 50; k++) {
    const mid = (low + high) / 2;
    const total = cumulative(densePath(frame, spec, mid)).at(-1)!;
    if (total < spec.lengthM) low = mid;
    else high = mid;
  }
  return densePath(frame, spec, (low + high) / 2);
}

/** Elevation at fraction f of the trail: uneven steady descent (or climb), rollers, jitter. */
function elevationModel(spec: SyntheticTrailSpec, random: () => number): (f: number, s: number) => number {
  const [k1, k2] = [2 + Math.floor(random() * 4), 6 + Math.floor(random() * 6)];
  const [p1, p2, p3] = [random(), random(), random()].map((r) => r * 2 * Math.PI);
  const weight = (f: number) =>
    Math.max(0.1, 1 + spec.gradeVariation * (0.6 * Math.sin(2 * Math.PI * k1 * f + p1) + 0.4 * Math.sin(2 * Math.PI * k2 * f + p2)));
  const integral = [0];
  for (let i = 1; i <= DENSE; i++) integral.push(integral[i - 1] + weight(i / DENSE) / DENSE);
  const total = integral[DENSE];
  return (f, s) => {
    const share = integral[Math.round(f * DENSE)] / total;
    const roller = spec.rollerM * Math.sin((2 * Math.PI * s) / spec.rollerWavelengthM + p3) * Math.sin(Math.PI * f);
    return spec.startEleM + (spec.endEleM - spec.startEleM) * share + roller;
  };
}

/** A line of [lon, lat, ele] from start to end, with the spec's length, spacing and profile. */
export function synthesizeTrail(spec: SyntheticTrailSpec): Position[] {
  const random = seededRandom(spec.seed);
  const frame = frameOf(spec.start, spec.end);
  const path = pathOfLength(frame, spec);
  const lengths = cumulative(path);
  const total = lengths[lengths.length - 1];
  const elevation = elevationModel(spec, random);

  const out: Position[] = [];
  let j = 0;
  for (let s = 0; ; s += spec.spacingM * (0.7 + 0.6 * random())) {
    const at = Math.min(s, total);
    while (j < lengths.length - 2 && lengths[j + 1] < at) j++;
    const t = (at - lengths[j]) / (lengths[j + 1] - lengths[j] || 1);
    const x = path[j][0] + t * (path[j + 1][0] - path[j][0]);
    const y = path[j][1] + t * (path[j + 1][1] - path[j][1]);
    const lon = frame.x0 + x / (frame.cosLat * METRES_PER_DEGREE);
    const lat = frame.y0 + y / METRES_PER_DEGREE;
    const ele = elevation(at / total, at) + spec.noiseM * (2 * random() - 1);
    out.push([round(lon, 7), round(lat, 7), round(ele, 1)]);
    if (at >= total) return out;
  }
}

const round = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;
