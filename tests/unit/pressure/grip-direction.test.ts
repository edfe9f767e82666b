// Direction of the grip rule: slick or loose ground wants less pressure, never more.
// Common practice, no published source (docs/pressure-rules.md, "Grip").
//
// This file closes a gap: the older property only ADDED a wet surface to a trail, which the
// least-grippy rule ignores when the added surface's value has the wrong sign, so a grip table
// or a grip formula with its sign flipped went unnoticed. Here "dry" is REPLACED, for every
// surface that grips less than dry, and the target must come down (checked by flipping the
// signs of `loose`, `wet` and of the formula in rules-grip.ts: each makes this file fail).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computePressureBand } from "@/lib/pressure/pure";
import { CASINGS, PACES, SURFACES, type PressureInputRaw, type Surface, type TrailConditions } from "@/lib/pressure/pure/schemas";
import { adult, withBaseline } from "./fixtures";

/** Surfaces that grip less than dry ground (everything but dry, tacky and rocky). */
const LESS_GRIP: Surface[] = ["dusty", "damp", "loose", "frozen", "wet", "muddy", "snow"];
const WHEELS = ["front", "rear"] as const;

const oneTrail = (input: PressureInputRaw, surfaces: Surface[]): PressureInputRaw => ({
  ...input,
  today: { trails: [{ name: "Slatebelt Flow", surfaces, features: [], lastReportAgeHours: 2 }] },
});

describe("replacing dry ground by a less grippy surface", () => {
  for (const basis of ["baseline", "estimate"] as const) {
    const setup = basis === "baseline" ? withBaseline() : adult();
    for (const surface of LESS_GRIP) {
      it(`${surface} instead of dry lowers both targets (${basis}), front at least as much as rear`, () => {
        const dry = computePressureBand(oneTrail(setup, ["dry"]));
        const slick = computePressureBand(oneTrail(setup, [surface]));
        expect(slick.basis).toBe(basis);
        // Far from floor and maximum, so the limits cannot hide the rule.
        for (const w of WHEELS) expect(slick[w].targetKpa).toBeLessThan(dry[w].targetKpa);
        const frontDrop = dry.front.targetKpa - slick.front.targetKpa;
        const rearDrop = dry.rear.targetKpa - slick.rear.targetKpa;
        expect(frontDrop).toBeGreaterThanOrEqual(rearDrop);
        const reason = slick.reasons.find((r) => r.id === `grip-${surface}`);
        expect(reason?.frontKpa).toBeLessThan(0);
        expect(reason?.rearKpa).toBeLessThan(0);
        expect(reason?.text).toContain("Slatebelt Flow");
        expect(reason?.text).toContain("less grip");
      });
    }
  }
});

const trailArb: fc.Arbitrary<TrailConditions> = fc.record({
  name: fc.constantFrom("Cedar Skip", "Tumblewire", "Gnarlroot", "Basalt Chute"),
  surfaces: fc.uniqueArray(fc.constantFrom(...SURFACES), { maxLength: 3 }),
  features: fc.uniqueArray(fc.constantFrom("berm", "jump", "drop", "rock-garden", "roots", "wooden-feature" as const), { maxLength: 3 }),
  lastReportAgeHours: fc.constantFrom(1, 5, 30),
});

const inputArb = fc.record({
  riderMassKg: fc.double({ min: 20, max: 140, noNaN: true }),
  bikeMassKg: fc.double({ min: 8, max: 25, noNaN: true }),
  pace: fc.constantFrom(...PACES),
  casing: fc.constantFrom(...CASINGS),
  tubeless: fc.boolean(),
  insert: fc.boolean(),
  baseline: fc.option(
    fc.record({
      frontKpa: fc.double({ min: 60, max: 250, noNaN: true }),
      rearKpa: fc.double({ min: 60, max: 250, noNaN: true }),
      surfaces: fc.uniqueArray(fc.constantFrom(...SURFACES), { minLength: 1, maxLength: 2 }),
    }),
    { nil: undefined },
  ),
  trails: fc.array(trailArb, { minLength: 1, maxLength: 5 }),
  pick: fc.nat(),
  surface: fc.constantFrom(...LESS_GRIP),
});

describe("grip property", () => {
  it("on any trail, replacing dry by a less grippy surface never raises either target", () => {
    fc.assert(
      fc.property(inputArb, (a) => {
        const wheel = { bsdMm: 622 as const, widthMm: 61, casing: a.casing, insert: a.insert, tubeless: a.tubeless, maxKpa: 300 };
        const index = a.pick % a.trails.length;
        const withDry = a.trails.map((t, i) => (i === index ? { ...t, surfaces: [...new Set<Surface>(["dry", ...t.surfaces])] } : t));
        const replaced = withDry.map((t, i) => (i === index ? { ...t, surfaces: [...new Set(t.surfaces.map((s) => (s === "dry" ? a.surface : s)))] } : t));
        const base = { riderMassKg: a.riderMassKg, bikeMassKg: a.bikeMassKg, pace: a.pace, front: wheel, rear: wheel, baseline: a.baseline };
        const before = computePressureBand({ ...base, today: { trails: withDry } });
        const after = computePressureBand({ ...base, today: { trails: replaced } });
        for (const w of WHEELS) expect(after[w].targetKpa).toBeLessThanOrEqual(before[w].targetKpa);
      }),
      { numRuns: 400 },
    );
  });
});
