// Applying a ride log's suggestion (our rule: start from what was run; older logs from the baseline).
import { describe, expect, it } from "vitest";
import { proposedBaseline, type StoredSuggestion } from "@/lib/setups/pure/suggestion";

const baseline = { frontKpa: 130, rearKpa: 150, surfaces: ["dry" as const] };
const base: StoredSuggestion = { wheel: "rear", symptom: "rim-strike", deltaKpa: 10, reason: "…", appliesTo: "baseline" };

describe("proposedBaseline", () => {
  it("takes the pressure run plus the change on the wheel named, and keeps the other wheel", () => {
    const s = { ...base, proposedKpa: { frontKpa: 120, rearKpa: 162 } };
    expect(proposedBaseline(baseline, s)).toEqual({ ...baseline, rearKpa: 162 });
  });
  it("changes both wheels when both changed", () => {
    const s = { ...base, wheel: "both" as const, proposedKpa: { frontKpa: 139, rearKpa: 160 } };
    expect(proposedBaseline(baseline, s)).toEqual({ ...baseline, frontKpa: 139, rearKpa: 160 });
  });
  it("reads logs stored before proposals: baseline plus the change", () => {
    expect(proposedBaseline(baseline, base)).toEqual({ ...baseline, rearKpa: 160 });
    expect(proposedBaseline(baseline, { ...base, wheel: null })).toBe(baseline);
  });
});
