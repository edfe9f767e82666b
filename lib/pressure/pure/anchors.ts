/**
 * Common-practice anchor points for the starting estimate (no published source: what experienced
 * riders and mechanics commonly run), and the grid of riders checked against them in
 * tests/unit/pressure/calibration.test.ts and tabled in docs/pressure-grid.md (scripts/pressure-grid.ts).
 */
import { CASINGS, type PressureInputRaw, type WheelSetup } from "@/lib/pressure/pure/schemas";
import { inToMm } from "@/lib/shared/units";

export type PsiRange = readonly [number, number];
export type Anchor = { riderKg: number; front: PsiRange; rear: PsiRange; what: string };

/** In rider mass order. Ranges in psi, gauge, on dry ground at a steady pace. */
export const ANCHORS: readonly Anchor[] = [
  { riderKg: 20, front: [8, 12], rear: [8, 12.5], what: "~20 kg child on 20–24″ wheels: around 10 psi" },
  { riderKg: 70, front: [17, 20], rear: [21, 25], what: "~70 kg rider, 29 × 2.4 front / 2.3 rear tubeless trail tyres, bike-park riding" },
  { riderKg: 100, front: [22, 24], rear: [25, 27], what: "~100 kg rider on heavy casings with inserts (29 × 2.4 tubeless here)" },
];

/** Off the anchors' own set-ups, the estimate may sit this far outside the interpolated range (its own ±). */
export const GRID_TOLERANCE_PSI = 1.5;
/** Tubes: "a few psi above tubeless". */
export const TUBES_ALLOWANCE_PSI = 3;

/** A bike for a rider: children's bikes are lighter, heavy riders' sturdier. */
export const bikeKg = (riderKg: number) => (riderKg <= 40 ? 9 : riderKg >= 100 ? 17 : 15);

const lerp = (a: number, b: number, t: number) => a + (b - a) * t;

/**
 * The range for a rider mass: centre and half-width on straight lines between anchors. Beyond the
 * last anchor the centre grows in proportion to rider + bike mass (to first order p ≈ F/A at a
 * constant patch) and the half-width stays.
 */
export function rangeFor(riderKg: number, position: "front" | "rear"): PsiRange {
  const centre = (r: PsiRange) => (r[0] + r[1]) / 2;
  const half = (r: PsiRange) => (r[1] - r[0]) / 2;
  const last = ANCHORS[ANCHORS.length - 1];
  if (riderKg > last.riderKg) {
    const c = (centre(last[position]) * (riderKg + bikeKg(riderKg))) / (last.riderKg + bikeKg(last.riderKg));
    return [c - half(last[position]), c + half(last[position])];
  }
  const next = ANCHORS.findIndex((a) => a.riderKg >= riderKg);
  const i = Math.max(0, next - 1);
  const [a, b] = [ANCHORS[i], ANCHORS[i + 1]];
  const t = (riderKg - a.riderKg) / (b.riderKg - a.riderKg);
  const c = lerp(centre(a[position]), centre(b[position]), t);
  const h = lerp(half(a[position]), half(b[position]), t);
  return [c - h, c + h];
}

const mm = (inches: number) => Math.round(inToMm(inches));
const wheel = (bsdMm: WheelSetup["bsdMm"], inches: number, casing: WheelSetup["casing"], insert: boolean, tubeless = true): WheelSetup =>
  ({ bsdMm, widthMm: mm(inches), casing, insert, tubeless, maxKpa: 350 });

export type GridRow = { label: string; input: PressureInputRaw; front: PsiRange; rear: PsiRange; anchor: boolean };


/** Riders 20–130 kg on every wheel size they ride, every casing, with and without inserts, tubeless; and with tubes. */
export function calibrationGrid(): GridRow[] {
  const rows: GridRow[] = [];
  const add = (riderKg: number, front: WheelSetup, rear: WheelSetup, anchor: boolean, tubes = false) => {
    const widen = anchor ? 0 : GRID_TOLERANCE_PSI;
    const [f, r] = [rangeFor(riderKg, "front"), rangeFor(riderKg, "rear")];
    const up = tubes ? TUBES_ALLOWANCE_PSI : 0;
    rows.push({
      label: `${riderKg} kg`,
      input: { riderMassKg: riderKg, bikeMassKg: bikeKg(riderKg), pace: "steady", front, rear },
      front: [f[0] - widen, f[1] + widen + up],
      rear: [r[0] - widen, r[1] + widen + up],
      anchor,
    });
  };
  for (let riderKg = 20; riderKg <= 130; riderKg += 10) {
    const sizes: WheelSetup["bsdMm"][] = riderKg <= 40 ? [406, 507, 559] : [559, 584, 622];
    for (const bsd of sizes) {
      for (const casing of CASINGS) {
        for (const insert of [false, true]) {
          const anchor = (riderKg === 70 && bsd === 622 && casing === "trail" && !insert) || (riderKg === 100 && bsd === 622 && casing === "downhill" && insert) || (riderKg === 20 && bsd === 507 && casing === "trail" && !insert);
          add(riderKg, wheel(bsd, 2.4, casing, insert), wheel(bsd, riderKg <= 40 || riderKg >= 100 ? 2.4 : 2.3, casing, insert), anchor);
        }
      }
      add(riderKg, wheel(bsd, riderKg <= 40 ? 2.0 : 2.4, "trail", false, false), wheel(bsd, riderKg <= 40 ? 2.0 : riderKg >= 100 ? 2.4 : 2.3, "trail", false, false), false, true);
    }
  }
  return rows;
}
