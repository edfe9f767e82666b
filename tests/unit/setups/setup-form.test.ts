// The setup form: what a rider types (their units) → the stored setup (SI) and back.
// Conversions: NIST SP 811 (2008) App. B.8 (in = 25.4 mm, lb = 0.453 592 37 kg, psi = 6.894 757 kPa).
import { describe, expect, it } from "vitest";
import {
  convertDraftUnits,
  convertWidth,
  draftFromSetup,
  emptySetupDraft,
  numberFrom,
  parseSetupDraft,
  setupDraftSchema,
  type SetupDraft,
} from "@/lib/setups/pure/setup-form";

const filled = (overrides: Partial<SetupDraft> = {}): SetupDraft => {
  const base = emptySetupDraft({ pressure: "psi", mass: "kg" });
  return {
    ...base,
    name: "Hardpack 29er",
    riderMass: "72",
    bikeMass: "15,5",
    front: { ...base.front, max: "40" },
    rear: { ...base.rear, max: "40", rimMax: "44" },
    baselineFront: "19",
    baselineRear: "23",
    ...overrides,
  };
};

describe("setup form", () => {
  it("converts inches to mm, psi to kPa and reads a decimal comma (NIST SP 811)", () => {
    const result = parseSetupDraft(filled());
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.front.widthMm).toBe(61); // 2.4 in = 60.96 mm, kept to 0.1 mm
    expect(result.value.bikeMassKg).toBe(15.5);
    expect(result.value.front.maxKpa).toBeCloseTo(275.790, 3); // 40 psi
    expect(result.value.rear.rimMaxKpa).toBeCloseTo(303.369, 3); // 44 psi
    expect(result.value.baseline).toMatchObject({ frontKpa: expect.closeTo(131.000, 3), surfaces: ["dry"] });
    expect(result.value.suspension).toBeNull();
  });

  it("converts pounds to kilograms (lb = 0.453 592 37 kg)", () => {
    const result = parseSetupDraft(filled({ massUnit: "lb", riderMass: "160", bikeMass: "33" }));
    expect(result.ok && result.value.riderMassKg).toBeCloseTo(72.5748, 4);
  });

  it("leaves the baseline out when both pressures are blank, and asks for the missing one otherwise", () => {
    const none = parseSetupDraft(filled({ baselineFront: "", baselineRear: "" }));
    expect(none.ok && none.value.baseline).toBeNull();
    const half = parseSetupDraft(filled({ baselineRear: "" }));
    expect(half.ok).toBe(false);
    if (!half.ok) expect(Object.keys(half.errors)).toEqual(["baselineRear"]);
  });

  it("names each problem by its form field, in the units the rider typed", () => {
    const result = parseSetupDraft(filled({ name: " ", riderMass: "seventy", front: { ...filled().front, width: "1.2" } }));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.name).toBe("Give the setup a name.");
    expect(result.errors.riderMass).toBe("Rider mass (with kit) must be a number.");
    expect(result.errors["front.width"]).toBe("Tyre width must be at least 1.38 in."); // 35 mm
    // Checks across fields run once every field is valid on its own.
    const aboveMax = parseSetupDraft(filled({ baselineFront: "45" }));
    expect(!aboveMax.ok && aboveMax.errors).toEqual({ baselineFront: "The front baseline is above the printed maximum of the front tyre or rim." });
    const psi = parseSetupDraft(filled({ front: { ...filled().front, max: "10" } }));
    expect(!psi.ok && psi.errors["front.max"]).toBe("The tyre's printed maximum must be at least 14.5 psi."); // 100 kPa
  });

  it("checks sag against its stroke and asks for the stroke", () => {
    const over = parseSetupDraft(filled({ rearStroke: "55", rearSag: "60" }));
    expect(!over.ok && over.errors.rearSag).toBe("Sag cannot be more than the shock stroke.");
    const noStroke = parseSetupDraft(filled({ frontSag: "30" }));
    expect(!noStroke.ok && noStroke.errors.forkTravel).toBe("Enter the fork travel to check this sag.");
    const ok = parseSetupDraft(filled({ rearStroke: "60", rearSag: "17" }));
    expect(ok.ok && ok.value.suspension).toEqual({ rearStrokeMm: 60, rearSagMm: 17 });
  });

  it("shows a saved setup in the rider's units and reads it back unchanged", () => {
    const first = parseSetupDraft(filled());
    if (!first.ok) throw new Error("fixture should be valid");
    for (const units of [{ pressure: "psi", mass: "kg" }, { pressure: "bar", mass: "lb" }, { pressure: "kPa", mass: "kg" }] as const) {
      const draft = draftFromSetup(first.value, units);
      expect(draft.front).toMatchObject({ width: "2.4", widthUnit: "in" });
      const again = parseSetupDraft(draft);
      expect(again.ok).toBe(true);
      if (!again.ok) return;
      expect(again.value.front.maxKpa).toBeCloseTo(first.value.front.maxKpa, 0);
      expect(again.value.riderMassKg).toBeCloseTo(72, 1);
    }
  });

  it("switching units re-expresses typed numbers, so nothing is lost", () => {
    const bar = convertDraftUnits(filled(), { pressure: "bar", mass: "lb" });
    expect([bar.baselineFront, bar.front.max, bar.riderMass]).toEqual(["1.31", "2.758", "158.7"]);
    expect(convertWidth(filled().front, "mm").width).toBe("61");
    expect(convertWidth({ ...filled().front, width: "wide" }, "mm").width).toBe("wide");
  });

  it("reads numbers strictly", () => {
    expect([numberFrom(""), numberFrom(" 2.4 "), numberFrom("19,5"), numberFrom(".5")]).toEqual([undefined, 2.4, 19.5, 0.5]);
    expect(numberFrom("2.4in")).toBeNaN();
    expect(numberFrom("1e3")).toBeNaN();
  });

  it("a draft kept in the browser is read back only when it has the draft's shape", () => {
    expect(setupDraftSchema.safeParse(JSON.parse(JSON.stringify(filled()))).data).toEqual(filled());
    expect(setupDraftSchema.safeParse({ ...filled(), front: "29er" }).success).toBe(false);
    expect(setupDraftSchema.safeParse(null).success).toBe(false);
  });
});
