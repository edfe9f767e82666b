// Property-based checks of the pressure engine (fast-check). The directions are common practice,
// no published source; the bounds and "only AppError" are our own contract (security.md).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { computePressureBand, PUMP_REASON_PREFIX, type PressureResult } from "@/lib/pressure/pure";
import {
  BEAD_SEAT_DIAMETERS_MM,
  CASINGS,
  FEATURES,
  PACES,
  SURFACES,
  type PressureInput,
  type WheelSetup,
} from "@/lib/pressure/pure/schemas";
import { PRESSURE_UNITS } from "@/lib/shared/units";

const wheelArb: fc.Arbitrary<WheelSetup> = fc.record(
  {
    bsdMm: fc.constantFrom(...BEAD_SEAT_DIAMETERS_MM),
    widthMm: fc.double({ min: 35, max: 120, noNaN: true }),
    casing: fc.constantFrom(...CASINGS),
    insert: fc.boolean(),
    tubeless: fc.boolean(),
    maxKpa: fc.double({ min: 100, max: 1100, noNaN: true }),
    rimMaxKpa: fc.double({ min: 100, max: 1100, noNaN: true }),
  },
  { requiredKeys: ["bsdMm", "widthMm", "casing", "insert", "tubeless", "maxKpa"] },
);

const surfacesArb = fc.uniqueArray(fc.constantFrom(...SURFACES), { maxLength: 3 });
const featuresArb = fc.uniqueArray(fc.constantFrom(...FEATURES), { maxLength: 3 });

const trailArb = fc.record({
  name: fc.constantFrom("Lynx Flow", "Ridge Hop", "Fern Gully", "Quarry Drop", "Switchback"),
  surfaces: surfacesArb,
  features: featuresArb,
  lastReportAgeHours: fc.option(fc.double({ min: 0, max: 200, noNaN: true }), { nil: null }),
});

const todayArb = fc.record(
  {
    trails: fc.array(trailArb, { maxLength: 6 }),
    surfaces: surfacesArb,
    features: featuresArb,
    airTemperatureC: fc.double({ min: -40, max: 50, noNaN: true }),
    pumpTemperatureC: fc.double({ min: -40, max: 50, noNaN: true }),
    rideElevationM: fc.double({ min: -500, max: 5000, noNaN: true }),
    pumpElevationM: fc.double({ min: -500, max: 5000, noNaN: true }),
  },
  { requiredKeys: [] },
);

const baselineArb = fc.record({
  frontKpa: fc.double({ min: 20, max: 1100, noNaN: true }),
  rearKpa: fc.double({ min: 20, max: 1100, noNaN: true }),
  surfaces: fc.uniqueArray(fc.constantFrom(...SURFACES), { minLength: 1, maxLength: 3 }),
  temperatureC: fc.double({ min: -40, max: 50, noNaN: true }),
});

const inputArb: fc.Arbitrary<PressureInput> = fc.record({
  riderMassKg: fc.double({ min: 10, max: 200, noNaN: true }),
  bikeMassKg: fc.double({ min: 3, max: 60, noNaN: true }),
  pace: fc.constantFrom(...PACES),
  front: wheelArb,
  rear: wheelArb,
  baseline: fc.option(baselineArb, { nil: undefined }),
  unit: fc.constantFrom(...PRESSURE_UNITS),
  today: fc.option(todayArb, { nil: undefined }),
});

const WHEELS = ["front", "rear"] as const;
const RUNS = { numRuns: 300 };

const targets = (r: PressureResult) => [r.front.targetKpa, r.rear.targetKpa];
const notHigher = (a: PressureResult, b: PressureResult) =>
  WHEELS.forEach((w) => expect(b[w].targetKpa).toBeLessThanOrEqual(a[w].targetKpa));

describe("pressure engine properties", () => {
  it("never throws for valid input, and low ≤ target ≤ high ≤ the printed maximum (pumpTo too)", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const r = computePressureBand(input);
        for (const w of WHEELS) {
          const max = Math.min(input[w].maxKpa, input[w].rimMaxKpa ?? Infinity);
          const b = r[w];
          expect(b.lowKpa).toBeLessThanOrEqual(b.targetKpa);
          expect(b.targetKpa).toBeLessThanOrEqual(b.highKpa);
          expect(b.highKpa).toBeLessThanOrEqual(max);
          expect(b.pumpToKpa).toBeLessThanOrEqual(max);
          expect(b.pumpToKpa).toBeGreaterThanOrEqual(0);
          expect(b.lowKpa).toBeGreaterThan(0);
          for (const v of Object.values(b)) expect(Number.isFinite(v)).toBe(true);
        }
        expect(r.cautions.length).toBeGreaterThanOrEqual(6);
      }),
      RUNS,
    );
  });

  it("every non-zero contribution has a reason: reasons add up to the target and to pumpTo", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const r = computePressureBand(input);
        const toTarget = r.reasons.filter((x) => !x.id.startsWith(PUMP_REASON_PREFIX));
        const toPump = r.reasons.filter((x) => x.id.startsWith(PUMP_REASON_PREFIX));
        const tolerance = 0.06 * (r.reasons.length + 2);
        for (const w of WHEELS) {
          const key = w === "front" ? "frontKpa" : "rearKpa";
          const sumTarget = toTarget.reduce((s, x) => s + x[key], 0);
          const sumPump = toPump.reduce((s, x) => s + x[key], 0);
          expect(Math.abs(sumTarget - r[w].targetKpa)).toBeLessThanOrEqual(tolerance);
          expect(Math.abs(r[w].targetKpa + sumPump - r[w].pumpToKpa)).toBeLessThanOrEqual(tolerance);
          const basis = toTarget.filter((x) => x.id.startsWith("basis-") || x.id.startsWith("estimate-")).reduce((s, x) => s + x[key], 0);
          expect(Math.abs(r[w].targetKpa - basis - r[w].deltaKpa)).toBeLessThanOrEqual(tolerance);
        }
        for (const reason of r.reasons) {
          expect(reason.frontKpa !== 0 || reason.rearKpa !== 0).toBe(true);
          expect(reason.text.length).toBeGreaterThan(10);
        }
        expect(new Set(r.reasons.map((x) => x.id)).size).toBe(r.reasons.length);
      }),
      RUNS,
    );
  });

  it("more mass never lowers the target", () => {
    fc.assert(
      fc.property(inputArb, fc.double({ min: 0, max: 80, noNaN: true }), (input, extra) => {
        const heavier = { ...input, riderMassKg: Math.min(200, input.riderMassKg + extra) };
        notHigher(computePressureBand(heavier), computePressureBand(input));
      }),
      RUNS,
    );
  });

  it("a wider tyre never raises the target", () => {
    fc.assert(
      fc.property(inputArb, fc.double({ min: 0, max: 40, noNaN: true }), (input, extra) => {
        const widen = (w: WheelSetup) => ({ ...w, widthMm: Math.min(120, w.widthMm + extra) });
        notHigher(computePressureBand(input), computePressureBand({ ...input, front: widen(input.front), rear: widen(input.rear) }));
      }),
      RUNS,
    );
  });

  it("tubes never give a lower target than tubeless", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const set = (tubeless: boolean) => ({ ...input, front: { ...input.front, tubeless }, rear: { ...input.rear, tubeless } });
        notHigher(computePressureBand(set(false)), computePressureBand(set(true)));
      }),
      RUNS,
    );
  });

  it("wetter ground never gives a higher target", () => {
    fc.assert(
      fc.property(inputArb, fc.constantFrom("damp", "wet", "muddy") , fc.nat(), (input, wetter, pick) => {
        const trails = input.today?.trails ?? [];
        const known = trails.map((t, i) => [t, i] as const).filter(([t]) => t.surfaces.length > 0);
        fc.pre(known.length > 0);
        const [trail, index] = known[pick % known.length];
        const wetterTrail = { ...trail, surfaces: [...new Set([...trail.surfaces, wetter])] };
        const wet = { ...input, today: { ...input.today, trails: trails.map((t, i) => (i === index ? wetterTrail : t)) } };
        notHigher(computePressureBand(input), computePressureBand(wet));
      }),
      RUNS,
    );
  });

  it("a heavier casing never raises the target (common practice: heavier casings allow less)", () => {
    const order = CASINGS;
    fc.assert(
      fc.property(inputArb, fc.nat({ max: 2 }), (input, i) => {
        const set = (casing: (typeof CASINGS)[number]) => ({ ...input, front: { ...input.front, casing }, rear: { ...input.rear, casing } });
        fc.pre(!input.today?.trails?.length && !input.today?.surfaces?.length && !input.today?.features?.length);
        notHigher(computePressureBand(set(order[i])), computePressureBand(set(order[i + 1])));
      }),
      RUNS,
    );
  });

  it("an insert never raises the target, on a day without rocks (common practice)", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        fc.pre(!input.baseline);
        const day = { ...input, today: undefined };
        const set = (insert: boolean) => ({ ...day, front: { ...day.front, insert }, rear: { ...day.rear, insert } });
        notHigher(computePressureBand(set(false)), computePressureBand(set(true)));
      }),
      RUNS,
    );
  });

  it("a harder pace never lowers the estimate (common practice)", () => {
    fc.assert(
      fc.property(inputArb, fc.nat({ max: 1 }), (input, i) => {
        const set = (pace: (typeof PACES)[number]) => ({ ...input, baseline: undefined, rides: undefined, pace });
        notHigher(computePressureBand(set(PACES[i + 1])), computePressureBand(set(PACES[i])));
      }),
      RUNS,
    );
  });

  it("adding a berm, jump or drop to a planned trail never lowers the target (common practice)", () => {
    fc.assert(
      fc.property(inputArb, fc.constantFrom("berm", "jump", "drop" as const), fc.nat(), (input, feature, pick) => {
        const trails = input.today?.trails ?? [];
        fc.pre(trails.length > 0);
        const index = pick % trails.length;
        const more = trails.map((t, i) => (i === index ? { ...t, features: [...new Set([...t.features, feature])] } : t));
        notHigher(computePressureBand({ ...input, today: { ...input.today, trails: more } }), computePressureBand(input));
      }),
      RUNS,
    );
  });

  it("a higher printed maximum never lowers the target; the floor never passes the maximum", () => {
    fc.assert(
      fc.property(inputArb, fc.double({ min: 0, max: 300, noNaN: true }), (input, extra) => {
        const raise = (w: WheelSetup) => ({ ...w, maxKpa: Math.min(1100, w.maxKpa + extra), rimMaxKpa: undefined });
        const lower = { ...input, front: { ...input.front, rimMaxKpa: undefined }, rear: { ...input.rear, rimMaxKpa: undefined } };
        notHigher(computePressureBand({ ...input, front: raise(input.front), rear: raise(input.rear) }), computePressureBand(lower));
      }),
      RUNS,
    );
  });

  it("a warmer pump than trail never lowers the pump reading (Gay-Lussac)", () => {
    fc.assert(
      fc.property(inputArb, fc.double({ min: 0, max: 30, noNaN: true }), (input, warmer) => {
        const t = input.today?.airTemperatureC ?? 10;
        fc.pre(t + warmer <= 50);
        const cold = computePressureBand({ ...input, today: { ...input.today, airTemperatureC: t, pumpTemperatureC: t } });
        const warm = computePressureBand({ ...input, today: { ...input.today, airTemperatureC: t, pumpTemperatureC: t + warmer } });
        WHEELS.forEach((w) => expect(warm[w].pumpToKpa).toBeGreaterThanOrEqual(cold[w].pumpToKpa - 1e-9));
      }),
      RUNS,
    );
  });

  it("only AppError is ever thrown for arbitrary or broken input", () => {
    const broken = fc.oneof(
      fc.anything(),
      inputArb.chain((input) =>
        fc.record({ key: fc.constantFrom("riderMassKg", "front", "pace", "today", "baseline", "unit", "extra"), value: fc.anything() }).map(
          ({ key, value }) => ({ ...input, [key]: value }) as unknown,
        ),
      ),
    );
    fc.assert(
      fc.property(broken, (raw) => {
        try {
          computePressureBand(raw as never);
        } catch (error) {
          expect(error).toBeInstanceOf(AppError);
          expect((error as AppError).status).toBe(400);
        }
      }),
      RUNS,
    );
  });

  it("does not modify its input and gives the same answer twice (pure)", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const frozen = structuredClone(input);
        const first = computePressureBand(input);
        expect(input).toEqual(frozen);
        expect(targets(computePressureBand(input))).toEqual(targets(first));
      }),
      { numRuns: 50 },
    );
  });
});
