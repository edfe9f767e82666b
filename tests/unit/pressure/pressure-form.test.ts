// The "Today's pressure" form → the POST /api/pressure body, checked by the handler's own schemas.
import { describe, expect, it } from "vitest";
import { emptyDayDraft, pressureRequestFrom } from "@/lib/pressure/pure/pressure-form";
import { pressureRequestSchema } from "@/lib/pressure/pure/schemas";
import { emptySetupDraft, type SetupDraft } from "@/lib/setups/pure/setup-form";

const TRAIL = "b310ebf8-cf4e-40ee-b17f-0cfbad3f8203";
const SETUP = "6c7920ad-01a4-4645-b396-98647ecfb541";
const draft = (): SetupDraft => {
  const d = emptySetupDraft({ pressure: "psi", mass: "kg" });
  return { ...d, riderMass: "72", bikeMass: "15.5", front: { ...d.front, max: "40" }, rear: { ...d.rear, max: "40" } };
};

describe("pressure form", () => {
  it("an unsaved setup becomes a request the handler's schema accepts (no name, no suspension)", () => {
    const day = { ...emptyDayDraft("harrow-ridge", [TRAIL]), airTemperature: "-4", pumpTemperature: "18" };
    const result = pressureRequestFrom({ setupId: null, draft: draft(), day, unit: "bar" });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.body).not.toHaveProperty("name");
    expect(result.body).not.toHaveProperty("baseline");
    expect(result.body.today).toEqual({ parkSlug: "harrow-ridge", trailIds: [TRAIL], airTemperatureC: -4, pumpTemperatureC: 18 });
    expect(pressureRequestSchema.safeParse(result.body).success).toBe(true);
  });

  it("sends the ride hours only when the rider moved them off 10:00–14:00, and names a bad pair on its field", () => {
    const at = (rideFrom: string, rideTo: string) => pressureRequestFrom({ setupId: SETUP, draft: draft(), day: { ...emptyDayDraft("harrow-ridge", [TRAIL]), rideFrom, rideTo }, unit: "psi" });
    const standard = at("10", "14");
    expect(standard.ok && standard.body.today).toEqual({ parkSlug: "harrow-ridge", trailIds: [TRAIL] });
    const afternoon = at("14", "16");
    expect(afternoon.ok && afternoon.body.today).toEqual({ parkSlug: "harrow-ridge", trailIds: [TRAIL], rideHours: { from: 14, to: 16 } });
    const backwards = at("15", "10");
    expect(backwards).toEqual({ ok: false, errors: { rideTo: "Ride hours: the first hour must not be after the last." } });
    // Away from a park there is no forecast to pick hours of.
    const away = pressureRequestFrom({ setupId: SETUP, draft: draft(), day: { ...emptyDayDraft(null, []), surfaces: ["dry"], rideFrom: "14", rideTo: "16" }, unit: "psi" });
    expect(away.ok && away.body.today).toEqual({ surfaces: ["dry"] });
  });

  it("a saved setup is sent by id only", () => {
    const result = pressureRequestFrom({ setupId: SETUP, draft: emptySetupDraft({ pressure: "psi", mass: "kg" }), day: emptyDayDraft(null, []), unit: "psi" });
    expect(result).toEqual({ ok: true, body: { setupId: SETUP, unit: "psi", today: {} } });
  });

  it("names the form's own fields when something is wrong", () => {
    const day = { ...emptyDayDraft("harrow-ridge", []), airTemperature: "warm", rideElevation: "9000" };
    const result = pressureRequestFrom({ setupId: null, draft: { ...draft(), riderMass: "" }, day, unit: "psi" });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toMatchObject({
      trails: "Choose at least one trail.",
      airTemperature: "Air temperature must be a number.",
      rideElevation: "Ride elevation must be at most 5000 m.",
      riderMass: "Rider mass (with kit) is required.", // blank says "required"; "seventy" says "must be a number"
    });
  });
});
