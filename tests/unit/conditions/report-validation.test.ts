import { describe, expect, it } from "vitest";
import { hazardInputSchema, hazardPatchSchema } from "@/lib/hazards/pure/schemas";
import { parkStateSchema, reportInputSchema, reportPostSchema, morningCheckSchema } from "@/lib/conditions/pure/schemas";

const issues = (result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  (result.error?.issues ?? []).map((i) => `${i.path.join(".")}: ${i.message}`);

describe("trail report validation", () => {
  it("accepts the documented API body and fills defaults", () => {
    const parsed = reportInputSchema.parse({ status: "caution", reason: "Roots slick after rain", surfaces: ["wet", "loose"], features: { berms: "soft", jumps: "good", wood: "slick" }, note: "Walk the bridge." });
    expect(parsed).toEqual({ status: "caution", reason: "Roots slick after rain", surfaces: ["wet", "loose"], features: { berms: "soft", jumps: "good", wood: "slick" }, note: "Walk the bridge." });
    expect(reportInputSchema.parse({ status: "open" })).toEqual({ status: "open", reason: null, surfaces: [], features: {}, note: null });
  });

  it("requires a reason when not open, and refuses one when open", () => {
    expect(issues(reportInputSchema.safeParse({ status: "closed" }))).toEqual(["reason: Give a reason when a trail is closed."]);
    expect(issues(reportInputSchema.safeParse({ status: "caution", reason: "   " }))).toEqual(["reason: Give a reason when a trail is caution."]);
    expect(issues(reportInputSchema.safeParse({ status: "open", reason: "dry" }))[0]).toMatch(/^reason: A reason is only for caution or closed/);
  });

  it("refuses unknown statuses, surfaces, feature states and keys (strict)", () => {
    expect(issues(reportInputSchema.safeParse({ status: "shut" }))[0]).toMatch(/^status: Status must be open, caution or closed/);
    expect(issues(reportInputSchema.safeParse({ status: "open", surfaces: ["slushy"] }))[0]).toMatch(/^surfaces.0: Surface must be one of/);
    expect(issues(reportInputSchema.safeParse({ status: "open", surfaces: ["wet", "wet"] }))).toEqual(["surfaces: Name each surface only once."]);
    expect(issues(reportInputSchema.safeParse({ status: "open", features: { berms: "mushy" } }))[0]).toMatch(/^features.berms: berms must be one of: firm, soft, rutted/);
    expect(issues(reportInputSchema.safeParse({ status: "open", features: { drops: "good" } }))[0]).toMatch(/^features/);
    expect(reportInputSchema.safeParse({ status: "open", colour: "green" }).success).toBe(false);
  });

  it("caps text and refuses control characters", () => {
    expect(reportInputSchema.safeParse({ status: "closed", reason: "x".repeat(201) }).success).toBe(false);
    expect(reportInputSchema.safeParse({ status: "open", note: "ok\u0007" }).success).toBe(false);
    expect(reportInputSchema.parse({ status: "open", note: "two\nlines" }).note).toBe("two\nlines");
  });

  it("the POST body carries the base revision (0 when absent) and stays strict", () => {
    expect(reportPostSchema.parse({ status: "open", baseRevision: 3 })).toMatchObject({ status: "open", baseRevision: 3 });
    expect(reportPostSchema.parse({ status: "open" }).baseRevision).toBe(0);
    expect(reportPostSchema.safeParse({ status: "open", baseRevision: -1 }).success).toBe(false);
    expect(reportPostSchema.safeParse({ status: "open", baseRevision: 1.5 }).success).toBe(false);
    expect(reportPostSchema.safeParse({ status: "open", revision: 2 }).success).toBe(false);
    expect(issues(reportPostSchema.safeParse({ status: "closed", baseRevision: 1 }))).toEqual(["reason: Give a reason when a trail is closed."]);
  });
});

describe("check validation", () => {
  const id = (n: number) => `00000000-0000-4000-8000-00000000000${n}`;
  it("takes unchanged or a report per trail, never both or neither", () => {
    expect(morningCheckSchema.safeParse({ entries: [{ trailId: id(1), baseRevision: 0, unchanged: true }, { trailId: id(2), report: { status: "open" } }] }).success).toBe(true);
    expect(morningCheckSchema.safeParse({ entries: [{ trailId: id(1), unchanged: true, report: { status: "open" } }] }).success).toBe(false);
    expect(morningCheckSchema.safeParse({ entries: [{ trailId: id(1) }] }).success).toBe(false);
  });
  it("refuses an empty check and a trail twice", () => {
    expect(issues(morningCheckSchema.safeParse({ entries: [] }))).toEqual(["entries: Mark at least one trail before saving."]);
    expect(issues(morningCheckSchema.safeParse({ entries: [{ trailId: id(1), unchanged: true }, { trailId: id(1), unchanged: true }] }))).toEqual(["entries: Each trail only once per check."]);
  });
  it("points at the trail and field that failed", () => {
    expect(issues(morningCheckSchema.safeParse({ entries: [{ trailId: id(1), unchanged: true }, { trailId: id(2), report: { status: "closed" } }] }))).toEqual([
      "entries.1.report.reason: Give a reason when a trail is closed.",
    ]);
  });
});

describe("park state validation", () => {
  it("needs a message and an end after the start", () => {
    expect(parkStateSchema.safeParse({ state: "closed", message: "Lightning on the ridge" }).success).toBe(true);
    expect(parkStateSchema.safeParse({ state: "closed", message: "" }).success).toBe(false);
    expect(parkStateSchema.safeParse({ state: "party", message: "x" }).success).toBe(false);
    expect(issues(parkStateSchema.safeParse({ state: "delayed", message: "Opens at 10:00", startsAt: "2026-12-02T08:00:00-08:00", endsAt: "2026-12-02T07:00:00-08:00" }))).toEqual([
      "endsAt: The end must come after the start.",
    ]);
  });
});

describe("hazard validation", () => {
  it("takes form strings for coordinates", () => {
    expect(hazardInputSchema.parse({ kind: "washout", lon: "-121.94", lat: "47.3", note: "" })).toEqual({ kind: "washout", lon: -121.94, lat: 47.3 });
  });
  it("needs a position: both coordinates, or a trail and a distance, not both", () => {
    expect(issues(hazardInputSchema.safeParse({ kind: "washout" }))[0]).toMatch(/^lon: Give the hazard's position/);
    expect(issues(hazardInputSchema.safeParse({ kind: "washout", lon: "8" }))).toEqual(["lat: Give both longitude and latitude."]);
    expect(issues(hazardInputSchema.safeParse({ kind: "washout", distanceAlongM: "120" }))).toEqual(["trailId: Choose the trail the distance is measured along."]);
    expect(issues(hazardInputSchema.safeParse({ kind: "washout", lon: 8, lat: 46, trailId: "00000000-0000-4000-8000-000000000001", distanceAlongM: 5 }))[0]).toMatch(/^distanceAlongM/);
  });
  it("refuses out-of-range coordinates, unknown kinds and keys", () => {
    expect(issues(hazardInputSchema.safeParse({ kind: "washout", lon: 200, lat: 47 }))[0]).toMatch(/^lon: Longitude must be between -180 and 180/);
    expect(issues(hazardInputSchema.safeParse({ kind: "washout", lon: "abc", lat: 47 }))[0]).toMatch(/^lon: Longitude must be a number/);
    expect(hazardInputSchema.safeParse({ kind: "bear", lon: 8, lat: 46 }).success).toBe(false);
    expect(hazardInputSchema.safeParse({ kind: "washout", lon: 8, lat: 46, reportedBy: "me" }).success).toBe(false);
  });
  it("a patch names its lockVersion and changes something", () => {
    expect(hazardPatchSchema.safeParse({ lockVersion: 0, resolved: true }).success).toBe(true);
    expect(hazardPatchSchema.safeParse({ resolved: true }).success).toBe(false);
    expect(hazardPatchSchema.safeParse({ lockVersion: 0 }).success).toBe(false);
  });
});

describe("one vocabulary", () => {
  it("reports name surfaces exactly as the pressure engine reads them", async () => {
    const { SURFACES: pressureSurfaces } = await import("@/lib/pressure/pure/schemas");
    const { SURFACES: reportSurfaces } = await import("@/lib/conditions/pure/vocabulary");
    expect([...reportSurfaces]).toEqual([...pressureSurfaces]);
  });
});
