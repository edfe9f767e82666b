import { expect } from "vitest";
import { AppError } from "@/lib/shared/errors";
import type { Position } from "@/lib/trails/pure";

/** Turf's sphere (packages/turf-helpers earthRadius). */
export const R = 6_371_008.8;
export const metresToLatDegrees = (m: number) => (m / R) * (180 / Math.PI);

/** Points along the meridian lon = −121.94, northwards from lat0, every stepM metres; ele(i, distanceM) optional. */
export function meridianLine(count: number, stepM: number, ele?: (i: number, dM: number) => number, lat0 = 47.3): Position[] {
  return Array.from({ length: count }, (_, i) => {
    const p: Position = [-121.94, lat0 + metresToLatDegrees(i * stepM)];
    if (ele) p.push(ele(i, i * stepM));
    return p;
  });
}

export function thrownBy(fn: () => unknown): unknown {
  try {
    fn();
  } catch (error) {
    return error;
  }
  return undefined;
}

export function expectAppError(fn: () => unknown, status: number, messagePart: string): AppError {
  const error = thrownBy(fn);
  expect(error).toBeInstanceOf(AppError);
  expect((error as AppError).status).toBe(status);
  expect((error as AppError).message).toContain(messagePart);
  return error as AppError;
}

export const bytes = (text: string) => Buffer.from(text, "utf8");
