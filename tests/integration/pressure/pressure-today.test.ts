// POST /api/pressure's logic on the real database: today's reports (surfaces, status, age) and
// mapped trail features feed the engine; trail names appear in the reasons; bad trails are 422.
import { afterAll, describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { pressureForRequest } from "@/lib/pressure/pressure-today";
import { createRideLog } from "@/lib/setups/ride-logs";
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
    // Under 0.2 psi on both wheels, the wet roots are folded into the small adjustments.
    expect(text).toMatch(/small-adjustments: Small adjustments \(wet roots on 1 of 3 trails \(Fernwash\)/);
    // Support takes the most demanding planned trail, by name; berms elsewhere do not add to it.
    expect(text).toMatch(/support-jump-drop: Jumps on Skylark Jumps, more support on landings/);
    expect(text).not.toMatch(/support-berm/);
    expect(answer.cautions).toContain("No report today for Quiet Climb: the ground there is unknown and left out (its mapped features still count). Check the conditions board.");
    expect(answer.basis).toBe("baseline");
    // Test trails run 900–920 m (Quiet Climb too): the day rides at their midpoint unless told otherwise.
    expect(answer.conditions).toMatchObject({ park: { slug: park.slug }, rideElevationM: 910 });
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

  it("a saved setup with five logged rides gets a band from its own rides, narrower than the estimate", async () => {
    const { actor, setup } = await riderWithSetup({ baseline: null });
    const log = (front: number, rear: number, f: string[], r: string[]) =>
      createRideLog(actor, { setupId: setup.id, riddenOn: "2026-11-20", frontKpa: psiToKpa(front), rearKpa: psiToKpa(rear), symptoms: { front: f, rear: r }, surfaces: ["dry"] });
    await log(17.5, 21.5, ["rim-strike"], ["rim-strike"]);
    await log(21.5, 25.5, ["harsh"], ["harsh"]);
    await log(19, 23, ["fine"], ["fine"]);
    await log(19.5, 23.5, ["fine"], ["fine"]);
    await log(19, 23, ["fine"], ["fine"]);
    const learned = await pressureForRequest(actor, { setupId: setup.id, unit: "psi", today: { surfaces: ["dry"] } });
    const estimate = await pressureForRequest(null, { ...inlineSetup, baseline: undefined, today: { surfaces: ["dry"] } });
    expect(learned.basis).toBe("rides");
    expect(learned.reasons[0].text).toMatch(/^From 5 of your rides on this setup \(front rim strikes at 17.5 psi, harsh at 21.5 psi/);
    expect(learned.front.highKpa - learned.front.lowKpa).toBeLessThan(estimate.front.highKpa - estimate.front.lowKpa);
    expect(learned.front.targetKpa).toBeCloseTo(psiToKpa((19 + 19.5 + 19) / 3), 0);
  });
});
