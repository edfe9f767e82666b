// Learning a rider's range from their ride logs: interval censoring (a too-soft symptom is a
// lower bound, a too-firm one an upper bound, a fine ride a point inside). Our own rule
// (docs/pressure-rules.md); the directions are common practice, no published source.
import { describe, expect, it } from "vitest";
import { computePressureBand } from "@/lib/pressure/pure";
import { learnFromRides, onReferenceGround, slickGroundReason } from "@/lib/pressure/pure/learning";
import { ONE_SIDED_STEP } from "@/lib/pressure/pure/settings";
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

  it("sliding on a wet day does not lower the dry range; sliding on dry ground is an upper bound", () => {
    const wetSlide = learn([ride(19, 23), ride(19, 23, ["sliding"], ["fine"], ["wet"])])!;
    expect(wetSlide.front.highKpa).toBeUndefined();
    expect(wetSlide.front.slickHighs).toEqual([{ kpa: onReferenceGround(psiToKpa(19), ["wet"], ["dry"], "front"), surface: "wet" }]);
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

  // A slide on wet ground is wet-ground evidence: an upper bound for ground that slick, converted
  // with the wet grip step. Common practice, no published source (docs/pressure-rules.md).
  describe("sliding on slick ground bounds the slick-ground pressure only", () => {
    // Fine at 22/26 on dry ground twice; slid at the front at 20/26 on a wet day.
    const logs = [ride(22, 26), ride(22, 26), ride(20, 26, ["sliding"], ["fine"], ["wet"])];
    const wetBoundKpa = onReferenceGround(psiToKpa(20), ["wet"], ["dry"], "front");

    it("a dry day keeps the dry range: the band is the one without the wet slide", () => {
      const withSlide = computePressureBand(adult({ rides: logs, today: { surfaces: ["dry"] } }));
      const without = computePressureBand(adult({ rides: logs.slice(0, 2), today: { surfaces: ["dry"] } }));
      expect(withSlide.front.targetKpa).toBe(without.front.targetKpa);
      expect(withSlide.reasons.some((r) => r.id === "basis-rides-slick")).toBe(false);
    });

    it("a wet day holds the front under the slide (less a one-sided step) and says why; the rear is untouched", () => {
      const wet = computePressureBand(adult({ rides: logs, today: { surfaces: ["wet"] } }));
      const wetWithout = computePressureBand(adult({ rides: logs.slice(0, 2), today: { surfaces: ["wet"] } }));
      const slick = wet.reasons.find((r) => r.id === "basis-rides-slick")!;
      // Basis 22 psi on dry ground; held at the wet bound on the reference ground less 5 %.
      expect(slick.frontKpa).toBeCloseTo(wetBoundKpa * (1 - ONE_SIDED_STEP) - psiToKpa(22), 1);
      expect(slick.rearKpa).toBe(0);
      expect(slick.text).toMatch(/^Your rides slid on wet ground/);
      expect(wet.front.targetKpa).toBeLessThan(wetWithout.front.targetKpa);
      // The same wet-day log felt fine at the rear: the rear is what that log gives without a front slide.
      const frontFine = computePressureBand(adult({ rides: [...logs.slice(0, 2), ride(20, 26, ["fine"], ["fine"], ["wet"])], today: { surfaces: ["wet"] } }));
      expect(wet.rear.targetKpa).toBe(frontFine.rear.targetKpa);
      // On the wet day itself the target lands under what slid.
      expect(wet.front.targetKpa).toBeLessThan(psiToKpa(20));
    });

    it("applies to ground at least as slick (muddy) but not to grippier ground (damp)", () => {
      const learned = learn(logs)!;
      const day = (surfaces: RideEvidence["surfaces"]) => ({ scope: "day" as const, trails: [{ name: "today", surfaces, features: [], reportAgeHours: undefined, hasReport: true }] });
      expect(slickGroundReason(learned, day(["muddy"]), "psi")!.frontKpa).toBeLessThan(0);
      expect(slickGroundReason(learned, day(["damp"]), "psi")).toBeNull();
      expect(slickGroundReason(learned, day(["dry"]), "psi")).toBeNull();
    });

    it("counts by the share of planned trails that are that slick, like every grip rule", () => {
      const learned = learn(logs)!;
      const trail = (name: string, surfaces: RideEvidence["surfaces"]) => ({ name, surfaces, features: [], reportAgeHours: 1, hasReport: true });
      const allWet = slickGroundReason(learned, { scope: "trails", trails: [trail("A", ["wet"]), trail("B", ["wet"])] }, "psi")!;
      const halfWet = slickGroundReason(learned, { scope: "trails", trails: [trail("A", ["wet"]), trail("B", ["dry"])] }, "psi")!;
      expect(halfWet.frontKpa).toBeCloseTo(allWet.frontKpa / 2, 9);
    });

    it("never holds a wheel below a rim-strike bound", () => {
      const learned = learn([ride(21, 26, ["rim-strike"]), ride(22, 26), ride(17, 26, ["sliding"], ["fine"], ["wet"])])!;
      const reason = slickGroundReason(learned, { scope: "day", trails: [{ name: "today", surfaces: ["wet"], features: [], reportAgeHours: undefined, hasReport: true }] }, "psi")!;
      expect(learned.front.centreKpa + reason.frontKpa).toBeCloseTo(learned.front.lowKpa!, 9);
    });
  });
});
