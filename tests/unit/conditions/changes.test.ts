import { describe, expect, it } from "vitest";
import { changesSinceYesterday } from "@/lib/conditions/pure/changes";
import { effectiveStatus, isStateActive } from "@/lib/conditions/pure/effective-status";

describe("what changed since yesterday", () => {
  it("a status change is a change", () => {
    const changes = changesSinceYesterday({ status: "closed", surfaces: ["muddy"] }, { status: "open", surfaces: ["muddy"] });
    expect(changes).toEqual({ changed: true, status: { from: "open", to: "closed" }, surfacesAdded: [], surfacesRemoved: [] });
  });
  it("surfaces are compared as a set: order alone is no change", () => {
    expect(changesSinceYesterday({ status: "open", surfaces: ["wet", "rocky"] }, { status: "open", surfaces: ["rocky", "wet"] }).changed).toBe(false);
  });
  it("lists surfaces added and removed", () => {
    const changes = changesSinceYesterday({ status: "open", surfaces: ["tacky", "rocky"] }, { status: "open", surfaces: ["wet", "rocky"] });
    expect(changes).toMatchObject({ changed: true, status: null, surfacesAdded: ["tacky"], surfacesRemoved: ["wet"] });
  });
  it("with no report today or none yesterday there is nothing to compare", () => {
    expect(changesSinceYesterday(null, { status: "open", surfaces: [] }).changed).toBe(false);
    expect(changesSinceYesterday({ status: "open", surfaces: [] }, null).changed).toBe(false);
  });
});

describe("park-wide state over trail status", () => {
  it("a closed park or a delayed opening shows every trail closed; an advisory changes nothing", () => {
    expect(effectiveStatus("open", { state: "closed", message: "Lightning" })).toBe("closed");
    expect(effectiveStatus(null, { state: "delayed", message: "Opens at 10:00" })).toBe("closed");
    expect(effectiveStatus("caution", { state: "advisory", message: "Frost up top" })).toBe("caution");
    expect(effectiveStatus("open", null)).toBe("open");
    expect(effectiveStatus(null, null)).toBeNull();
  });
  it("a state is in force from its start until its end or until cleared", () => {
    const now = new Date("2026-12-02T15:00:00Z");
    const at = (iso: string) => new Date(iso);
    expect(isStateActive({ startsAt: at("2026-12-02T14:00:00Z"), endsAt: null, clearedAt: null }, now)).toBe(true);
    expect(isStateActive({ startsAt: at("2026-12-02T16:00:00Z"), endsAt: null, clearedAt: null }, now)).toBe(false);
    expect(isStateActive({ startsAt: at("2026-12-02T14:00:00Z"), endsAt: at("2026-12-02T15:00:00Z"), clearedAt: null }, now)).toBe(false);
    expect(isStateActive({ startsAt: at("2026-12-02T14:00:00Z"), endsAt: null, clearedAt: at("2026-12-02T14:30:00Z") }, now)).toBe(false);
  });
});
