// Learning a rider's range from their ride logs: interval censoring (a too-soft symptom is a
// lower bound, a too-firm one an upper bound, a fine ride a point inside). Our own rule
// (docs/pressure-rules.md); the directions are common practice, no published source.
import { describe, expect, it } from "vitest";
import { computePressureBand } from "@/lib/pressure/pure";
import { learnFromRides, onReferenceGround } from "@/lib/pressure/pure/learning";
import type { RideEvidence, Symptom } from "@/lib/pressure/pure/schemas";
import { kpaToPsi, psiToKpa } from "@/lib/shared/units";
import { adult, withBaseline } from "./fixtures";

const ride = (front: number, rear: number, f: Symptom[] = ["fine"], r: Symptom[] = ["fine"], surfaces: RideEvidence["surfaces"] = ["dry"]): RideEvidence => ({
  frontKpa: psiToKpa(front), rearKpa: psiToKpa(rear), symptoms: { front: f, rear: r }, surfaces,
});
const learn = (logs: RideEvidence[]) => learnFromRides(logs, ["dry"], "psi");

describe("learning from ride logs", () => {
  it("one log is not enough: the band stays with the baseline or the estimate", () => {
    expect(learn([ride(20, 24)])).toBeNull();
    expect(computePressureBand(adult({ rides: [ride(20, 24)] })).basis).toBe("estimate");
  });

  it("rim strikes set a lower bound, harsh an upper bound; the guess sits inside and the reason shows both", () => {
    const l = learn([ride(21, 24, ["rim-strike"]), ride(27, 27, ["harsh"], ["harsh"])])!;
    expect(kpaToPsi(l.front.lowKpa!)).toBeCloseTo(21, 9);
    expect(kpaToPsi(l.front.highKpa!)).toBeCloseTo(27, 9);
    expect(kpaToPsi(l.front.centreKpa)).toBeCloseTo(24, 9);
    expect(l.reasons[0].text).toMatch(/^From 2 of your rides on this setup \(front rim strikes at 21.0 psi, harsh at 27.0 psi/);
  });

  it("fine rides sit inside the bracket; five rides give a band narrower than the estimate", () => {
    const logs = [ride(19, 23), ride(19.5, 23.5), ride(18, 22, ["rim-strike"]), ride(21.5, 25.5, ["harsh"], ["harsh"]), ride(19, 23)];
    const l = learn(logs)!;
    expect(kpaToPsi(l.front.centreKpa)).toBeCloseTo((19 + 19.5 + 19) / 3, 9);
    const learned = computePressureBand(adult({ rides: logs }));
    const estimate = computePressureBand(adult());
    expect(learned.basis).toBe("rides");
    expect(learned.front.highKpa - learned.front.lowKpa).toBeLessThan(estimate.front.highKpa - estimate.front.lowKpa);
    expect(learned.rear.highKpa - learned.rear.lowKpa).toBeLessThan(estimate.rear.highKpa - estimate.rear.lowKpa);
    expect(learned.reasons[0].text).toMatch(/^From 5 of your rides/);
  });

  it("the band narrows as evidence grows", () => {
    const few = learn([ride(19, 23), ride(20, 24)])!;
    const many = learn([ride(19, 23), ride(20, 24), ride(19.5, 23.5), ride(19, 23), ride(20, 24), ride(19.5, 23.5), ride(19.5, 23.5), ride(19.5, 23.5)])!;
    expect(many.front.halfKpa).toBeLessThan(few.front.halfKpa);
  });

  it("contradictory logs widen the band and say so", () => {
    const agreeing = learn([ride(20, 24, ["rim-strike"]), ride(24, 28, ["harsh"], ["harsh"])])!;
    const contradicting = learn([ride(24, 28, ["rim-strike"], ["rim-strike"]), ride(20, 24, ["harsh"], ["harsh"])])!;
    expect(contradicting.front.contradictory).toBe(true);
    expect(contradicting.front.halfKpa).toBeGreaterThan(agreeing.front.halfKpa);
    expect(contradicting.reasons[0].id).toBe("basis-rides-disagree");
    expect(contradicting.reasons[0].text).toContain("disagree");
  });

  it("a one-sided bracket moves the guess beyond the bound", () => {
    const l = learn([ride(20, 24, ["burp"], ["burp"]), ride(20, 24, ["rim-strike"], ["fine"])])!;
    expect(l.front.centreKpa).toBeGreaterThan(psiToKpa(20));
  });

  it("each log is brought to the reference ground first: a wet-day pressure counts as more on dry", () => {
    const wet = onReferenceGround(psiToKpa(18), ["wet"], ["dry"], "front");
    expect(wet).toBeGreaterThan(psiToKpa(18));
    expect(onReferenceGround(psiToKpa(18), ["dry"], ["dry"], "front")).toBe(psiToKpa(18));
  });

  it("sliding on a wet day says nothing about the dry pressure; sliding on dry ground is an upper bound", () => {
    const wetSlide = learn([ride(19, 23), ride(19, 23, ["sliding"], ["fine"], ["wet"])])!;
    expect(wetSlide.front.highKpa).toBeUndefined();
    const drySlide = learn([ride(19, 23), ride(22, 23, ["sliding"], ["fine"], ["dry"])])!;
    expect(kpaToPsi(drySlide.front.highKpa!)).toBeCloseTo(22, 9);
  });

  it("rides outrank a saved baseline, and today's tweaks still apply on top", () => {
    const logs = [ride(21, 25), ride(21, 25)];
    const dry = computePressureBand(withBaseline({ rides: logs }));
    const wet = computePressureBand(withBaseline({ rides: logs, today: { surfaces: ["wet"] } }));
    expect(kpaToPsi(dry.front.targetKpa)).toBeCloseTo(21, 1);
    expect(wet.front.targetKpa).toBeLessThan(dry.front.targetKpa);
  });
});
