import { describe, expect, it } from "vitest";
import { parkCreateSchema, parkPatchSchema, parseParkFields } from "@/lib/parks/pure/schemas";

const valid = {
  name: "A park of our own",
  slug: "own-park",
  timeZone: "America/Denver",
  location: { lon: -105.6, lat: 39.7 },
  baseElevationM: 2600,
  summitElevationM: 3300,
  managerEmail: "first@manager.test",
};
const fieldOf = (input: unknown, schema: typeof parkCreateSchema | typeof parkPatchSchema = parkCreateSchema) => {
  const result = parseParkFields(schema as typeof parkCreateSchema, input);
  return result.ok ? null : result.field;
};

describe("park settings schema", () => {
  it("accepts a complete park and treats blank optional fields as none", () => {
    const result = parseParkFields(parkCreateSchema, { ...valid, contactEmail: " ", websiteUrl: "" });
    expect(result).toMatchObject({ ok: true, data: { contactEmail: null, websiteUrl: null } });
  });

  // IANA time zone names as ECMA-402 Intl.supportedValuesOf("timeZone") lists them (tz database, tzdata).
  it("takes IANA zone names only", () => {
    expect(fieldOf({ ...valid, timeZone: "Europe/Zurich" })).toBeNull();
    expect(fieldOf({ ...valid, timeZone: "UTC" })).toBeNull();
    for (const zone of ["Mars/Olympus", "+02:00", "CET-ish", ""]) expect(fieldOf({ ...valid, timeZone: zone })).toBe("timeZone");
  });

  it("refuses slugs outside [a-z0-9-]{3,60}", () => {
    for (const slug of ["ab", "Upper", "with space", "x".repeat(61), "ünï"]) expect(fieldOf({ ...valid, slug })).toBe("slug");
    expect(fieldOf({ ...valid, slug: "a-1" })).toBeNull();
  });

  // WGS 84 longitude and latitude ranges (RFC 7946 §4).
  it("keeps the location on Earth and the summit above the base", () => {
    expect(fieldOf({ ...valid, location: { lon: 180.1, lat: 0 } })).toBe("location.lon");
    expect(fieldOf({ ...valid, location: { lon: 0, lat: -90.5 } })).toBe("location.lat");
    expect(fieldOf({ ...valid, summitElevationM: 2600 })).toBe("summitElevationM");
    expect(fieldOf({ ...valid, baseElevationM: 9500, summitElevationM: 9600 })).toBe("baseElevationM");
  });

  it("a patch needs its lockVersion and names no unknown field", () => {
    expect(fieldOf({ name: "New name" }, parkPatchSchema)).toBe("lockVersion");
    expect(fieldOf({ lockVersion: 2, parkId: "x" }, parkPatchSchema)).toBeUndefined(); // refused, naming no field of the form
    expect(fieldOf({ lockVersion: 2, timeZone: "Asia/Tokyo" }, parkPatchSchema)).toBeNull();
  });
});

describe("rain caution level", () => {
  it("is optional on create, and from 0.5 to 500 mm when given (a blank field asks for a number)", () => {
    expect(fieldOf(valid)).toBeNull();
    expect(fieldOf({ rainThresholdMm: "12.5", lockVersion: 0 }, parkPatchSchema)).toBeNull();
    expect(parseParkFields(parkPatchSchema, { rainThresholdMm: " ", lockVersion: 0 })).toMatchObject({ ok: false, field: "rainThresholdMm", message: "Enter the rain caution level in millimetres." });
    for (const bad of [-5, 0, 0.4, 501, "lots"]) expect(fieldOf({ rainThresholdMm: bad, lockVersion: 0 }, parkPatchSchema)).toBe("rainThresholdMm");
  });
});
