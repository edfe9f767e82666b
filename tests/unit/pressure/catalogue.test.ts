// The rule catalogue behind /pressure/how-it-works: every reason the engine can give has an
// entry (id, plain words, numbers, source), and its numbers come from settings.ts.
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computePressureBand } from "@/lib/pressure/pure";
import { RULE_SECTIONS, ruleIds } from "@/lib/pressure/pure/catalogue";
import { FEEDBACK_RULES } from "@/lib/pressure/pure/feedback";
import { TWEAK_BOUND_KPA } from "@/lib/pressure/pure/settings";
import { CASINGS, FEATURES, PACES, SURFACES } from "@/lib/pressure/pure/schemas";

const wheel = fc.record({
  bsdMm: fc.constantFrom(406, 507, 559, 584, 622 as const),
  widthMm: fc.double({ min: 35, max: 120, noNaN: true }),
  casing: fc.constantFrom(...CASINGS),
  insert: fc.boolean(),
  tubeless: fc.boolean(),
  maxKpa: fc.double({ min: 100, max: 400, noNaN: true }),
});
const trail = fc.record({
  name: fc.constantFrom("Cedar Skip", "Gnarlroot"),
  surfaces: fc.uniqueArray(fc.constantFrom(...SURFACES), { maxLength: 2 }),
  features: fc.uniqueArray(fc.constantFrom(...FEATURES), { maxLength: 3 }),
  lastReportAgeHours: fc.constantFrom(1, null),
});
const input = fc.record({
  riderMassKg: fc.double({ min: 10, max: 200, noNaN: true }),
  bikeMassKg: fc.double({ min: 3, max: 60, noNaN: true }),
  pace: fc.constantFrom(...PACES),
  front: wheel,
  rear: wheel,
  baseline: fc.option(fc.record({ frontKpa: fc.double({ min: 20, max: 400, noNaN: true }), rearKpa: fc.double({ min: 20, max: 400, noNaN: true }), surfaces: fc.constantFrom(...SURFACES).map((s) => [s]) }), { nil: undefined }),
  today: fc.record({
    trails: fc.array(trail, { maxLength: 3 }),
    airTemperatureC: fc.double({ min: -10, max: 35, noNaN: true }),
    pumpTemperatureC: fc.double({ min: -10, max: 35, noNaN: true }),
    rideElevationM: fc.double({ min: 0, max: 3000, noNaN: true }),
    pumpElevationM: fc.double({ min: 0, max: 3000, noNaN: true }),
  }),
});

describe("rule catalogue", () => {
  it("has unique ids, and every entry has plain words, numbers and a source", () => {
    const ids = ruleIds();
    expect(new Set(ids).size).toBe(ids.length);
    for (const rule of RULE_SECTIONS.flatMap((s) => s.rules)) {
      expect(rule.plain.length).toBeGreaterThan(10);
      expect(rule.numbers.length).toBeGreaterThan(0);
      expect(rule.source.text.length).toBeGreaterThan(5);
    }
  });

  it("lists every reason id the engine gives", () => {
    const known = new Set(ruleIds());
    const seen = new Set<string>();
    fc.assert(
      fc.property(input, (raw) => {
        for (const reason of computePressureBand(raw).reasons) {
          seen.add(reason.id);
          expect(known.has(reason.id), reason.id).toBe(true);
        }
      }),
      { numRuns: 400 },
    );
    // The sample reached the grip, support, protection and pump rules at least.
    for (const id of ["grip-wet", "support-jump-drop", "protection-rocks", "pump-temperature", "pump-elevation"]) expect(seen.has(id), id).toBe(true);
  });

  it("every rule id is named in docs/pressure-rules.md", () => {
    const doc = readFileSync("docs/pressure-rules.md", "utf8");
    expect(ruleIds().filter((id) => !doc.includes(`\`${id}\``))).toEqual([]);
  });

  it("takes its numbers from the engine's settings", () => {
    const rules = RULE_SECTIONS.flatMap((s) => s.rules);
    const wet = rules.find((r) => r.id === "grip-wet");
    expect(wet?.numbers).toContain("front \u22125.5\u00a0%, rear \u22123.2\u00a0%");
    expect(rules.some((r) => /from memory/i.test(r.source.text))).toBe(false);
    expect(rules.find((r) => r.id === "tweak-bound")?.numbers).toContain(`${TWEAK_BOUND_KPA} kPa`);
    expect(rules.filter((r) => r.id.startsWith("feedback-")).length).toBe(FEEDBACK_RULES.length);
  });
});
