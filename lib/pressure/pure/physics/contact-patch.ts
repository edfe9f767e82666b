/**
 * Contact patch of a pneumatic tyre. To first order the casing carries no load of its own, so
 * the patch area is the wheel load over the inflation (gauge) pressure: A ≈ F/p
 * (Wilson & Papadopoulos, Bicycling Science, 3rd ed., 2004, tyre chapter — from memory;
 * Renart & Roura-Grabulosa, Am. J. Phys. 87:102–109, 2019).
 */
import { STANDARD_GRAVITY } from "./atmosphere";

/** Patch area (m²) for a wheel load (N) at a gauge pressure (kPa). */
export const contactPatchAreaM2 = (loadN: number, gaugeKpa: number) => loadN / (gaugeKpa * 1000);

/** Gauge pressure (kPa) that gives a wheel load (N) a patch of the given area (m²). */
export const pressureForPatchKpa = (loadN: number, areaM2: number) => loadN / areaM2 / 1000;

/** Weight (N) of a mass (kg) in standard gravity. */
export const weightN = (massKg: number) => massKg * STANDARD_GRAVITY;

/**
 * Patch area (m²) of a tyre pressed in by `dropFraction` of its section height.
 * Geometry (our own simplification): the tread is a circle of the outer diameter D along the
 * wheel and a circle of the section width W across it; pressed in by δ, each gives a chord
 * 2√(D·δ) and 2√(W·δ), and the patch is the ellipse between them:
 *   A = π/4 · 2√(Dδ) · 2√(Wδ) = π·√(D·W)·δ, with δ = dropFraction · W (section height ≈ width).
 * Wider and larger wheels get a larger patch for the same drop, so need less pressure.
 */
export function patchAreaAtDropM2(bsdMm: number, widthMm: number, dropFraction: number): number {
  const widthM = widthMm / 1000;
  const outerDiameterM = (bsdMm + 2 * widthMm) / 1000;
  const dropM = dropFraction * widthM;
  return Math.PI * Math.sqrt(outerDiameterM * widthM) * dropM;
}
