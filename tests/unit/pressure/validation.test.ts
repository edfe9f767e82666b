// Input schemas: ISO 5775 bead-seat diameters (published); ranges and messages are our own contract.
import { describe, expect, it } from "vitest";
import { BEAD_SEAT_DIAMETERS_MM, pressureInputSchema, pressureRequestSchema } from "@/lib/pressure/pure/schemas";
import { inputFromRequest } from "@/lib/pressure/pure/conditions";
import { adult, trailWheel29 } from "./fixtures";

const firstIssue = (result: { success: boolean; error?: { issues: Array<{ path: PropertyKey[]; message: string }> } }) => {
  expect(result.success).toBe(false);
  const issue = result.error!.issues[0];
  return { field: issue.path.join("."), message: issue.message };
};

describe("pressure request schema", () => {
  it("accepts the documented request shape and fills defaults", () => {
    const parsed = pressureRequestSchema.parse({
      ...adult(),
      baseline: { frontKpa: 131, rearKpa: 159, temperatureC: 18 },
      today: { parkSlug: "pine-hollow", trailIds: ["t1", "t2"], surfaces: ["wet"], features: ["berm", "jump"], airTemperatureC: 6, pumpTemperatureC: 20, rideElevationM: 1400, pumpElevationM: 800 },
    });
    expect(parsed.unit).toBe("psi");
    expect(parsed.baseline?.surfaces).toEqual(["dry"]);
  });

  it("ISO 5775 bead-seat diameters: 406 (20\"), 507 (24\"), 559 (26\"), 584 (27.5\"), 622 (29\") mm", () => {
    expect(BEAD_SEAT_DIAMETERS_MM).toEqual([406, 507, 559, 584, 622]);
    for (const bsdMm of BEAD_SEAT_DIAMETERS_MM) {
      expect(pressureInputSchema.safeParse(adult({ front: { ...trailWheel29, bsdMm } })).success).toBe(true);
    }
    expect(firstIssue(pressureInputSchema.safeParse(adult({ front: { ...trailWheel29, bsdMm: 700 as never } })))).toEqual({
      field: "front.bsdMm",
      message: expect.stringContaining("406, 507, 559, 584, 622"),
    });
  });

  it("rejects unknown keys at every level (strict objects)", () => {
    expect(firstIssue(pressureInputSchema.safeParse({ ...adult(), colour: "red" })).message).toContain("colour");
    expect(firstIssue(pressureInputSchema.safeParse(adult({ rear: { ...trailWheel29, psi: 20 } as never }))).field).toBe("rear");
    expect(firstIssue(pressureRequestSchema.safeParse(adult({ today: { trails: [] } as never }))).field).toBe("today");
  });

  it.each([
    [{ riderMassKg: 5 }, "riderMassKg", "at least 10 kg"],
    [{ bikeMassKg: 90 }, "bikeMassKg", "at most 60 kg"],
    [{ pace: "fast" }, "pace", "easy, steady, hard"],
    [{ riderMassKg: "72" }, "riderMassKg", "must be a number"],
    [{ riderMassKg: Number.NaN }, "riderMassKg", "must be a number"],
  ])("refuses %j with a clear message", (override, field, message) => {
    const issue = firstIssue(pressureInputSchema.safeParse({ ...adult(), ...override }));
    expect(issue.field).toBe(field);
    expect(issue.message).toContain(message);
  });

  it("refuses unknown surfaces and features, duplicates, and a bad park slug", () => {
    expect(firstIssue(pressureInputSchema.safeParse(adult({ today: { surfaces: ["sticky" as never] } }))).message).toContain("Surface must be one of");
    expect(firstIssue(pressureInputSchema.safeParse(adult({ today: { features: ["jump", "jump"] } }))).message).toContain("only once");
    expect(firstIssue(pressureRequestSchema.safeParse(adult({ today: { parkSlug: "Pine Hollow" } } as never))).field).toBe("today.parkSlug");
  });

  it("takes per-trail conditions in the engine input, with nullable report age", () => {
    const ok = pressureInputSchema.safeParse(adult({ today: { trails: [{ name: "Lynx Flow", surfaces: ["wet"], features: [], lastReportAgeHours: null }] } }));
    expect(ok.success).toBe(true);
    expect(firstIssue(pressureInputSchema.safeParse(adult({ today: { trails: [{ name: " ", surfaces: [], features: [] }] } }))).field).toBe("today.trails.0.name");
  });
});

describe("from the public request to the engine input", () => {
  it("replaces parkSlug and trailIds by the looked-up trails, keeping whole-day conditions", () => {
    const request = pressureRequestSchema.parse({
      ...adult(),
      today: { parkSlug: "pine-hollow", trailIds: ["t1"], surfaces: ["wet"], airTemperatureC: 6 },
    });
    const trails = [{ name: "Lynx Flow", surfaces: ["dry" as const], features: [], lastReportAgeHours: 3 }];
    const input = inputFromRequest(request, trails);
    expect(input.today).toEqual({ surfaces: ["wet"], airTemperatureC: 6, trails });
    expect(pressureInputSchema.safeParse(input).success).toBe(true);
    expect(inputFromRequest(pressureRequestSchema.parse(adult())).today).toBeUndefined();
  });
});
