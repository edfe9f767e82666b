import { describe, expect, it } from "vitest";
import { applyChange, draftFromStart, entryFromDraft, markRestUnchanged, restToMark } from "@/lib/conditions/pure/check-draft";

const ID = "00000000-0000-4000-8000-000000000001";
const yesterday = { status: "caution" as const, reason: "Soft berms", surfaces: ["damp"], features: { berms: "soft" as const }, note: null };

describe("check drafts", () => {
  it("start from the last report, unmarked, and send nothing until touched", () => {
    const draft = draftFromStart(yesterday, 0);
    expect(draft).toMatchObject({ mode: "untouched", status: "caution", reason: "Soft berms", surfaces: ["damp"], features: { berms: "soft" }, note: "" });
    expect(entryFromDraft(ID, draft)).toBeNull();
  });

  it("unchanged sends one flag with the base revision", () => {
    expect(entryFromDraft(ID, { ...draftFromStart(yesterday, 2), mode: "unchanged" })).toEqual({ trailId: ID, baseRevision: 2, unchanged: true });
  });

  it("any change marks the trail edited; opening it clears the reason", () => {
    let draft = applyChange(draftFromStart(yesterday, 0), { type: "status", status: "open" });
    draft = applyChange(draft, { type: "surface", surface: "tacky", on: true });
    draft = applyChange(draft, { type: "surface", surface: "damp", on: false });
    draft = applyChange(draft, { type: "feature", feature: "berms", state: null });
    draft = applyChange(draft, { type: "feature", feature: "jumps", state: "good" });
    expect(entryFromDraft(ID, draft)).toEqual({ trailId: ID, baseRevision: 0, report: { status: "open", surfaces: ["tacky"], features: { jumps: "good" } } });
  });

  it("sends a trimmed reason and note only when there is text", () => {
    let draft = applyChange(draftFromStart(null, 0), { type: "status", status: "closed" });
    draft = applyChange(draft, { type: "reason", reason: "  Tree down  " });
    draft = applyChange(draft, { type: "note", note: "   " });
    expect(entryFromDraft(ID, draft)).toEqual({ trailId: ID, baseRevision: 0, report: { status: "closed", reason: "Tree down", surfaces: [], features: {} } });
  });

  it("Mark the rest unchanged keeps the ranger's marks, skips trails checked today and trails with nothing to keep (common practice, no published source)", () => {
    const trails = [
      { id: "edited", inspectedToday: false, hasStart: true },
      { id: "rest", inspectedToday: false, hasStart: true },
      { id: "done-earlier", inspectedToday: true, hasStart: true },
      { id: "new-trail", inspectedToday: false, hasStart: false },
    ];
    const drafts = {
      edited: applyChange(draftFromStart(yesterday, 0), { type: "status", status: "closed" }),
      rest: draftFromStart(yesterday, 0),
      "done-earlier": draftFromStart(yesterday, 1),
      "new-trail": draftFromStart(null, 0),
    };
    expect(restToMark(trails, drafts)).toBe(1);
    const marked = markRestUnchanged(trails, drafts);
    expect(Object.fromEntries(Object.entries(marked).map(([id, d]) => [id, d.mode]))).toEqual({ edited: "edited", rest: "unchanged", "done-earlier": "untouched", "new-trail": "untouched" });
    expect(marked.edited).toBe(drafts.edited);
    expect(restToMark(trails, marked)).toBe(0);
  });
});
