// Today's tweak rules. The sizes are common practice, no published source; these tests check
// directions, the share weighting, the reference comparison and the bound.
import { describe, expect, it } from "vitest";
import { planDay } from "@/lib/pressure/pure/conditions";
import { todaysTweak, type TweakInput } from "@/lib/pressure/pure/rules";
import { leastGrippy } from "@/lib/pressure/pure/rules-grip";
import { vulnerability } from "@/lib/pressure/pure/rules-load";
import { STEP_MAX_KPA, STEP_MIN_KPA, SURFACE_GRIP, TWEAK_BOUND_KPA } from "@/lib/pressure/pure/settings";
import { relativeStepKpa } from "@/lib/pressure/pure/steps";
import type { DayConditions } from "@/lib/pressure/pure/schemas";
import { sum, trailWheel29 } from "./fixtures";

const trail = (name: string, surfaces: DayConditions["surfaces"] = [], features: DayConditions["features"] = []) => ({
  name, surfaces: surfaces ?? [], features: features ?? [], lastReportAgeHours: 2,
});

/** An adult's basis, kPa (about 18.9 / 22.5 psi). */
const BASIS = { frontKpa: 130, rearKpa: 155 };
const tweak = (today: DayConditions, overrides: Partial<TweakInput> = {}) =>
  todaysTweak({ day: planDay(today), referenceSurfaces: ["dry"], front: trailWheel29, rear: trailWheel29, basis: BASIS, unit: "psi", ...overrides });

describe("grip rules", () => {
  it("wet roots on 3 of 4 trails lower both wheels, front most, and say the share", () => {
    const t = tweak({
      trails: [trail("A", ["wet"], ["roots"]), trail("B", ["wet"], ["roots"]), trail("C", ["wet"], ["roots"]), trail("D", ["dry"])],
    });
    expect(t.frontKpa).toBeLessThan(t.rearKpa);
    expect(t.rearKpa).toBeLessThan(0);
    const roots = t.reasons.find((r) => r.id === "grip-slick-roots");
    expect(roots?.text).toMatch(/^Wet roots on 3 of 4 trails \(A, B, C\), .*: −0\.\d psi front/);
    const wet = t.reasons.find((r) => r.id === "grip-wet");
    expect(wet?.frontKpa).toBeCloseTo(SURFACE_GRIP.wet[0] * BASIS.frontKpa * 0.75, 9);
  });

  it("names at most three trails in a reason, then says how many more", () => {
    const wet = ["A", "B", "C", "D", "E"].map((name) => trail(name, ["wet"]));
    const t = tweak({ trails: [...wet, trail("F", ["dry"])] });
    expect(t.reasons.find((r) => r.id === "grip-wet")?.text).toMatch(/^Wet on 5 of 6 trails \(A, B, C and 2 more\), less grip/);
  });

  it("a trail counts by its least grippy surface", () => {
    expect(leastGrippy(["rocky", "muddy", "damp"])).toBe("muddy");
    expect(leastGrippy([])).toBeUndefined();
  });

  it("a baseline set in the wet and ridden dry moves up", () => {
    const t = tweak({ surfaces: ["dry"] }, { referenceSurfaces: ["wet"] });
    expect(t.frontKpa).toBeGreaterThan(0);
    expect(t.rearKpa).toBeGreaterThan(0);
    expect(t.reasons[0].text).toContain("wet ground your baseline was set on");
  });

  it("the same surface as the baseline's gives no change and no reason", () => {
    const t = tweak({ surfaces: ["wet"] }, { referenceSurfaces: ["wet"] });
    expect(t.reasons).toEqual([]);
    expect([t.frontKpa, t.rearKpa]).toEqual([0, 0]);
  });
});

describe("support rules: the most demanding planned trail sets it", () => {
  it("jumps outrank berms, rear most, and the reason names the trail", () => {
    const t = tweak({ trails: [trail("Flow", ["dry"], ["berm"]), trail("Jump line", ["dry"], ["jump", "berm"])] });
    expect(t.rearKpa).toBeGreaterThan(t.frontKpa);
    expect(t.frontKpa).toBeGreaterThan(0);
    expect(t.reasons.map((r) => r.id)).toEqual(["support-jump-drop"]);
    expect(t.reasons[0].text).toMatch(/^Jumps on Jump line, more support/);
  });

  it("adding flow trails to a plan with one jump line does not dilute its support", () => {
    const one = tweak({ trails: [trail("Jump line", ["dry"], ["jump"])] });
    const many = tweak({ trails: [trail("Jump line", ["dry"], ["jump"]), ...["A", "B", "C", "D", "E"].map((n) => trail(n, ["dry"]))] });
    expect(many.rearKpa).toBeCloseTo(one.rearKpa, 12);
  });

  it("berms on many trails count once and say how many", () => {
    const t = tweak({ trails: ["A", "B", "C"].map((n) => trail(n, ["dry"], ["berm"])) });
    expect(t.reasons[0].text).toMatch(/^Berms on A \(and 2 more planned trails like it\)/);
  });
});

describe("steps are relative to the basis (our choice of limits)", () => {
  it("a child and a heavy rider get proportionate changes", () => {
    const child = tweak({ surfaces: ["wet"] }, { basis: { frontKpa: 70, rearKpa: 75 } });
    const heavy = tweak({ surfaces: ["wet"] }, { basis: { frontKpa: 160, rearKpa: 180 } });
    expect(heavy.frontKpa / child.frontKpa).toBeCloseTo(160 / 70, 9);
  });
  it(`each step is held between ${STEP_MIN_KPA} and ${STEP_MAX_KPA} kPa; zero stays zero`, () => {
    expect(relativeStepKpa(0.001, 100)).toBe(STEP_MIN_KPA);
    expect(relativeStepKpa(-0.5, 400)).toBe(-STEP_MAX_KPA);
    expect(relativeStepKpa(0, 100)).toBe(0);
    expect(relativeStepKpa(0.05, 100)).toBeCloseTo(5, 12);
  });
});

describe("protection and rocky ground", () => {
  it("the rockiest planned trail sets protection, named: one rock garden among flow trails keeps it", () => {
    const alone = tweak({ trails: [trail("Basalt Chute", ["dry"], ["rock-garden"])] });
    const diluted = tweak({ trails: [trail("Basalt Chute", ["dry"], ["rock-garden"]), ...["A", "B", "C", "D", "E"].map((n) => trail(n, ["dry"]))] });
    const protection = (t: typeof alone) => t.reasons.find((r) => r.id === "protection-rocks");
    expect(protection(diluted)?.rearKpa).toBeCloseTo(protection(alone)?.rearKpa ?? NaN, 12);
    expect(protection(diluted)?.text).toMatch(/^Rock garden on Basalt Chute/);
  });

  it("rocks push tubes and light casings up; an insert softens it", () => {
    const rocky = { surfaces: ["rocky" as const] };
    const tubeless = tweak(rocky).rearKpa;
    expect(tweak(rocky, { rear: { ...trailWheel29, tubeless: false } }).rearKpa).toBeGreaterThan(tubeless);
    expect(tweak(rocky, { rear: { ...trailWheel29, casing: "light" } }).rearKpa).toBeGreaterThan(tubeless);
    expect(vulnerability({ ...trailWheel29, casing: "downhill" })).toBe(0);
  });

  it("where the casing or an insert protects the rim, rocks give a small grip cut instead, with its reason", () => {
    const dh = { ...trailWheel29, casing: "downhill" as const };
    const t = tweak({ features: ["rock-garden"] }, { front: dh, rear: { ...trailWheel29, insert: true } });
    expect(t.reasons.map((r) => r.id)).toEqual(["grip-rocky-protected"]);
    expect(t.frontKpa).toBeLessThan(0);
    expect(t.rearKpa).toBeLessThan(0);
    const exposed = tweak({ features: ["rock-garden"] });
    expect(exposed.reasons.map((r) => r.id)).toEqual(["protection-rocks"]);
    expect(exposed.rearKpa).toBeGreaterThan(0);
  });
});

describe("the bound on today's tweak", () => {
  it(`is ±${TWEAK_BOUND_KPA} kPa per wheel, with a reason for the part removed`, () => {
    const t = tweak({ surfaces: ["snow", "muddy"], features: ["roots", "wooden-feature"] }, { referenceSurfaces: ["dry"] });
    const raw = tweak({ surfaces: ["dry"], features: ["jump", "rock-garden"] }, { referenceSurfaces: ["snow"], rear: { ...trailWheel29, casing: "light", tubeless: false } });
    expect(raw.rearKpa).toBe(TWEAK_BOUND_KPA);
    const bound = raw.reasons.find((r) => r.id === "tweak-bound");
    expect(bound?.rearKpa).toBeLessThan(0);
    expect(bound?.text).toContain("±2.9 psi");
    // The reasons always add up to the bounded tweak.
    for (const x of [t, raw]) {
      expect(sum(x.reasons.map((r) => r.frontKpa))).toBeCloseTo(x.frontKpa, 9);
      expect(sum(x.reasons.map((r) => r.rearKpa))).toBeCloseTo(x.rearKpa, 9);
      expect(Math.abs(x.frontKpa)).toBeLessThanOrEqual(TWEAK_BOUND_KPA);
    }
  });

  it("no conditions → no tweak", () => {
    expect(tweak({})).toEqual({ frontKpa: 0, rearKpa: 0, reasons: [] });
  });
});
