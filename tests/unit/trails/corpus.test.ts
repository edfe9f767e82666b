import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { hasElevation, parseTrailFile } from "@/lib/trails/pure";

// The corpus lives in tests/fixtures/trails (built by build-corpus.ts there). Expected statuses
// follow the refusal rules in docs/trail-geometry.md; the GPX 1.1 schema and RFC 7946 rules are
// named beside each file in the manifest's "why".
const DIR = path.resolve(__dirname, "../../fixtures/trails");
type Entry = {
  file: string;
  why: string;
  status: number;
  message?: string;
  contentType?: string;
  parkCenter?: { lon: number; lat: number } | null;
  expect?: { segments: number; waypoints: number; name?: string; warning?: string; hasElevation: boolean };
};
const manifest = JSON.parse(readFileSync(path.join(DIR, "manifest.json"), "utf8")) as { defaultParkCenter: { lon: number; lat: number }; entries: Entry[] };

function parse(entry: Entry) {
  return parseTrailFile({
    bytes: readFileSync(path.join(DIR, entry.file)),
    filename: entry.file,
    contentType: entry.contentType,
    parkCenter: entry.parkCenter === null ? undefined : (entry.parkCenter ?? manifest.defaultParkCenter),
  });
}

describe("trail file corpus (tests/fixtures/trails/manifest.json)", () => {
  it("lists every file in the folder, with at least 25 refusals", () => {
    const files = readdirSync(DIR).filter((f) => f !== "manifest.json" && f !== "build-corpus.ts").sort();
    expect(manifest.entries.map((e) => e.file).sort()).toEqual(files);
    expect(manifest.entries.filter((e) => e.status !== 200).length).toBeGreaterThanOrEqual(25);
  });

  for (const entry of manifest.entries.filter((e) => e.status !== 200)) {
    it(`refuses ${entry.file} with ${entry.status} (${entry.why})`, () => {
      let thrown: unknown;
      try {
        parse(entry);
      } catch (error) {
        thrown = error;
      }
      expect(thrown).toBeInstanceOf(AppError);
      const error = thrown as AppError;
      expect({ status: error.status, field: error.field }).toEqual({ status: entry.status, field: "file" });
      expect(error.message).toContain(entry.message);
    });
  }

  for (const entry of manifest.entries.filter((e) => e.status === 200)) {
    it(`accepts ${entry.file} (${entry.why})`, () => {
      const trail = parse(entry);
      const expected = entry.expect!;
      expect(trail.segments).toHaveLength(expected.segments);
      expect(trail.waypoints).toHaveLength(expected.waypoints);
      if (expected.name) expect(trail.name).toBe(expected.name);
      if (expected.warning) expect(trail.warnings.join(" ")).toContain(expected.warning);
      expect(hasElevation(trail.segments)).toBe(expected.hasElevation);
      expect(trail.sourceFormat).toBe(entry.file.endsWith(".gpx") ? "gpx" : "geojson");
    });
  }
});
