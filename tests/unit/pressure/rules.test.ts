// Today's tweak rules. The sizes are common practice, no published source; these tests check
// directions, the share weighting, the reference comparison and the bound.
import { describe, expect, it } from "vitest";
import { planDay } from "@/lib/pressure/pure/conditions";
import { todaysTweak, type TweakInput } from "@/lib/pressure/pure/rules";
import { leastGrippy } from "@/lib/pressure/pure/rules-grip";
import { vulnerability } from "@/lib/pressure/pure/rules-load";
import { SURFACE_GRIP_KPA, TWEAK_BOUND_KPA } from "@/lib/pressure/pure/settings";
import type { DayConditions } from "@/lib/pressure/pure/schemas";
import { sum, trailWheel29 } from "./fixtures";

const trail = (name: string, surfaces: DayConditions["surfaces"] = [], features: DayConditions["features"] = []) => ({
  name, surfaces: surfaces ?? [], features: features ?? [], lastReportAgeHours: 2,
});

const tweak = (today: DayConditions, overrides: Partial<TweakInput> = {}) =>
  todaysTweak({ day: planDay(today), referenceSurfaces: ["dry"], front: trailWheel29, rear: trailWheel29, pace: "steady", unit: "psi", ...overrides });

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
    expect(wet?.frontKpa).toBeCloseTo(SURFACE_GRIP_KPA.wet[0] * 0.75, 9);
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

describe("support rules", () => {
  it("jumps and berms ask for more, rear most; a trail counts once by its biggest feature", () => {
    const t = tweak({ trails: [trail("Jump line", ["dry"], ["jump", "berm"]), trail("Flow", ["dry"], ["berm"])] });
    expect(t.rearKpa).toBeGreaterThan(t.frontKpa);
    expect(t.frontKpa).toBeGreaterThan(0);
    expect(t.reasons.map((r) => r.id)).toEqual(["support-jump-drop", "support-berm"]);
    expect(t.reasons[0].text).toMatch(/on 1 of 2 trails \(Jump line\)/);
  });

  it("a hard pace scales support up and says so", () => {
    const steady = tweak({ features: ["berm"] });
    const hard = tweak({ features: ["berm"] }, { pace: "hard" });
    expect(hard.rearKpa).toBeCloseTo(steady.rearKpa * 1.5, 9);
    expect(hard.reasons[0].text).toContain("hard pace");
  });
});

describe("protection rules", () => {
  it("rocks push tubes and light casings up; inserts soften it; downhill tubeless casing needs none", () => {
    const rocky = { surfaces: ["rocky" as const] };
    const tubeless = tweak(rocky).rearKpa;
    const tubes = tweak(rocky, { rear: { ...trailWheel29, tubeless: false } }).rearKpa;
    const light = tweak(rocky, { rear: { ...trailWheel29, casing: "light" } }).rearKpa;
    const insert = tweak(rocky, { rear: { ...trailWheel29, insert: true } }).rearKpa;
    expect(tubes).toBeGreaterThan(tubeless);
    expect(light).toBeGreaterThan(tubeless);
    expect(insert).toBeLessThan(tubeless);
    expect(vulnerability({ ...trailWheel29, casing: "downhill" })).toBe(0);
    expect(tweak({ features: ["rock-garden"] }, { front: { ...trailWheel29, casing: "downhill" }, rear: { ...trailWheel29, casing: "downhill" } }).reasons).toEqual([]);
  });
});

describe("the bound on today's tweak", () => {
  it(`is ±${TWEAK_BOUND_KPA} kPa per wheel, with a reason for the part removed`, () => {
    const t = tweak({ surfaces: ["snow", "muddy"], features: ["roots", "wooden-feature"] }, { referenceSurfaces: ["dry"] });
    const raw = tweak({ surfaces: ["dry"], features: ["jump", "rock-garden"] }, { pace: "hard", referenceSurfaces: ["snow"], rear: { ...trailWheel29, casing: "light", tubeless: false } });
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
