/**
 * Contact patch of a pneumatic tyre. To first order the casing carries no load of its own, so
 * the patch area is the wheel load over the inflation (gauge) pressure: A ≈ F/p.
 *
 * How the patch grows with the tyre's deflection d follows the power law of Renart &
 * Roura-Grabulosa (Am. J. Phys. 87:102–109, 2019, doi:10.1119/1.5086008): for small loads
 * F ∝ p·d^(3/2). Our footprint gives that law: along the wheel the tread (outer diameter D) is cut
 * by the ground over a length 2√(D·d); across it, the flattened band is PATCH_SPREAD times as wide
 * as the local depth d − x²/D. Integrated, A = (4/3)·PATCH_SPREAD·√D·d^(3/2). PATCH_SPREAD is our
 * calibration (a 2.4″ section flattened 4 mm gives a band about as wide as its 31 mm chord).
 */
import { STANDARD_GRAVITY } from "./atmosphere";

/** Width of the flattened band over the local depth (our calibration, see above). */
export const PATCH_SPREAD = 8;

/** Patch area (m²) for a wheel load (N) at a gauge pressure (kPa). */
export const contactPatchAreaM2 = (loadN: number, gaugeKpa: number) => loadN / (gaugeKpa * 1000);

/** Gauge pressure (kPa) that gives a wheel load (N) a patch of the given area (m²). */
export const pressureForPatchKpa = (loadN: number, areaM2: number) => loadN / areaM2 / 1000;

/** Weight (N) of a mass (kg) in standard gravity. */
export const weightN = (massKg: number) => massKg * STANDARD_GRAVITY;

/** Outer diameter (m) of a tyre: bead-seat diameter plus twice the section height (≈ width). */
export const outerDiameterM = (bsdMm: number, widthMm: number) => (bsdMm + 2 * widthMm) / 1000;

/** Patch area (m²) of a tyre pressed in by `dropFraction` of its section height (≈ its width). */
export function patchAreaAtDropM2(bsdMm: number, widthMm: number, dropFraction: number): number {
  const dropM = (dropFraction * widthMm) / 1000;
  return (4 / 3) * PATCH_SPREAD * Math.sqrt(outerDiameterM(bsdMm, widthMm)) * dropM ** 1.5;
}

/** The drop (fraction of section height) at which a load (N) at a gauge pressure (kPa) balances. */
export function dropAtPressure(bsdMm: number, widthMm: number, loadN: number, gaugeKpa: number): number {
  const area = contactPatchAreaM2(loadN, gaugeKpa);
  const dropM = (area / ((4 / 3) * PATCH_SPREAD * Math.sqrt(outerDiameterM(bsdMm, widthMm)))) ** (2 / 3);
  return dropM / (widthMm / 1000);
}
