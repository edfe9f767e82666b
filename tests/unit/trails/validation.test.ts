import { describe, expect, it } from "vitest";
import { trailMetadataSchema, trailMetadataUpdateSchema, trailStatsSchema } from "@/lib/trails/pure/schemas";
import { computeTrailStats } from "@/lib/trails/pure";
import { meridianLine } from "./helpers";

const valid = { name: "  Cedar Skip  ", difficulty: "easy", kind: "flow", direction: "downhill" };

describe("trail metadata schema", () => {
  it("trims the name and accepts the enums", () => {
    expect(trailMetadataSchema.parse(valid)).toEqual({ ...valid, name: "Cedar Skip" });
  });

  it.each([
    [{ ...valid, name: "   " }, "name"],
    [{ ...valid, name: "x".repeat(81) }, "name"],
    [{ ...valid, difficulty: "black" }, "difficulty"],
    [{ ...valid, kind: "enduro" }, "kind"],
    [{ ...valid, direction: "sideways" }, "direction"],
    [{ ...valid, parkId: "someone-else" }, ""], // no mass assignment (ASVS v5.0.0-15.3.3)
  ])("refuses %o", (input, field) => {
    const result = trailMetadataSchema.safeParse(input);
    expect(result.success).toBe(false);
    if (field) expect(result.error!.issues[0].path).toEqual([field]);
  });

  it("accepts an 80-character name and partial updates", () => {
    expect(trailMetadataSchema.safeParse({ ...valid, name: "x".repeat(80) }).success).toBe(true);
    expect(trailMetadataUpdateSchema.parse({ direction: "both" })).toEqual({ direction: "both" });
  });

  it("describes computed stats, with and without elevation", () => {
    expect(trailStatsSchema.safeParse(computeTrailStats([meridianLine(5, 10, (i) => 900 - i)])).success).toBe(true);
    expect(trailStatsSchema.safeParse(computeTrailStats([meridianLine(5, 10)])).success).toBe(true);
  });
});
