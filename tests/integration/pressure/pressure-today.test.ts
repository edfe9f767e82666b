// POST /api/pressure's logic on the real database: today's reports (surfaces, status, age) and
// mapped trail features feed the engine; trail names appear in the reasons; bad trails are 422.
import { afterAll, describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { pressureForRequest } from "@/lib/pressure/pressure-today";
import { psiToKpa } from "@/lib/shared/units";
import { sequelize } from "@/models";
import { createPark } from "../helpers";
import { createTrail, newRider, reportToday, riderWithSetup, trailBike } from "./fixtures";

afterAll(() => sequelize.close());

const { name: _name, ...inlineSetup } = trailBike();

async function refusal(promise: Promise<unknown>): Promise<AppError> {
  const error = await promise.then(() => undefined, (e: unknown) => e);
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

async function parkWithTrails() {
  const park = await createPark();
  const wet = await createTrail(park, "Fernwash", ["roots", "berm"]);
  const jumps = await createTrail(park, "Skylark Jumps", ["jump", "berm"]);
  const closed = await createTrail(park, "Rubble Run", ["rock-garden"]);
  const unreported = await createTrail(park, "Quiet Climb", []);
  await reportToday(park, wet, "open", ["wet"]);
  await reportToday(park, jumps, "caution", ["dry"]);
  await reportToday(park, closed, "closed", ["muddy"]);
  return { park, wet, jumps, closed, unreported };
}

describe("pressure band for today's trails", () => {
  it("reads today's reports and trail features, and names the trails in the reasons", async () => {
    const { park, wet, jumps, unreported } = await parkWithTrails();
    const answer = await pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug, trailIds: [wet.id, jumps.id, unreported.id] } });
    const text = answer.reasons.map((r) => `${r.id}: ${r.text}`).join("\n");
    expect(text).toMatch(/grip-wet: Wet on 1 of 3 trails \(Fernwash\)/);
    expect(text).toMatch(/grip-slick-roots: Wet roots on 1 of 3 trails \(Fernwash\)/);
    expect(text).toMatch(/support-jump-drop: Jumps or drops on 1 of 3 trails \(Skylark Jumps\)/);
    expect(text).toMatch(/support-berm: Berms on 1 of 3 trails \(Fernwash\)/);
    expect(answer.cautions).toContain("No report today for Quiet Climb: the ground there is unknown and left out (its mapped features still count). Check the conditions board.");
    expect(answer.basis).toBe("baseline");
    // Test park: base 900 m, summit 1800 m → rides at the midpoint unless told otherwise.
    expect(answer.conditions).toMatchObject({ park: { slug: park.slug }, rideElevationM: 1350 });
    expect(answer.conditions?.trails.map((t) => [t.name, t.status])).toEqual([["Fernwash", "open"], ["Skylark Jumps", "caution"], ["Quiet Climb", null]]);
    // Wet ground lowers the front; the jump line raises the rear.
    expect(answer.front.targetKpa).toBeLessThan(psiToKpa(19));
    expect(answer.rear.targetKpa).toBeGreaterThan(psiToKpa(23));
  });

  it("without trailIds, uses every trail open today (closed ones left out)", async () => {
    const { park } = await parkWithTrails();
    const answer = await pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug } });
    expect(answer.conditions?.trails.map((t) => t.name).sort()).toEqual(["Fernwash", "Skylark Jumps"]);
  });

  it("a closed trail, if chosen, gets a caution of its own", async () => {
    const { park, closed } = await parkWithTrails();
    const answer = await pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug, trailIds: [closed.id] } });
    expect(answer.cautions[0]).toMatch(/^Closed today: Rubble Run\. Do not ride closed trails/);
  });

  it("trails of another park, archived trails and unknown parks are 422", async () => {
    const { park } = await parkWithTrails();
    const other = await createPark();
    const foreign = await createTrail(other, "Far Away", ["jump"]);
    const archived = await createTrail(park, "Old Line", [], true);
    for (const trailIds of [[foreign.id], [archived.id], ["not-a-uuid"]]) {
      const error = await refusal(pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug, trailIds } }));
      expect([error.status, error.field]).toEqual([422, "today.trailIds"]);
    }
    const unknownPark = await refusal(pressureForRequest(null, { ...inlineSetup, today: { parkSlug: "no-such-park-here" } }));
    expect([unknownPark.status, unknownPark.field]).toEqual([422, "today.parkSlug"]);
    const noPark = await refusal(pressureForRequest(null, { ...inlineSetup, today: { trailIds: [foreign.id] } }));
    expect([noPark.status, noPark.field]).toEqual([422, "today.parkSlug"]);
  });

  it("a saved setup works for its owner only (404 for others, 401 signed out)", async () => {
    const { actor, setup } = await riderWithSetup();
    const answer = await pressureForRequest(actor, { setupId: setup.id, unit: "bar", today: { surfaces: ["dry"] } });
    expect(answer).toMatchObject({ basis: "baseline", unit: "bar", setupId: setup.id });
    expect(answer.reasons[0].text).toContain("1.31 bar front");
    expect((await refusal(pressureForRequest(await newRider(), { setupId: setup.id }))).status).toBe(404);
    expect((await refusal(pressureForRequest(null, { setupId: setup.id }))).status).toBe(401);
  });
});
