// Ride logs on the real database: one suggestion per log (priority and step sizes are common
// practice, no published source: docs/pressure-rules.md §6), applied to the baseline once.
import { afterAll, describe, expect, it } from "vitest";
import { listRideLogs } from "@/lib/setups/ride-log-queries";
import { AppError } from "@/lib/shared/errors";
import { applyRideLogSuggestion, createRideLog } from "@/lib/setups/ride-logs";
import { psiToKpa } from "@/lib/shared/units";
import { Setup, sequelize } from "@/models";
import { createPark } from "../helpers";
import { createTrail, newRider, riderWithSetup } from "../pressure/fixtures";

afterAll(() => sequelize.close());

const today = () => new Date().toISOString().slice(0, 10);
const ride = (setupId: string, extra: Record<string, unknown> = {}) => ({
  setupId,
  riddenOn: today(),
  frontKpa: psiToKpa(19),
  rearKpa: psiToKpa(23),
  symptoms: { front: ["sliding"], rear: ["rim-strike"] },
  ...extra,
});

async function refusal(promise: Promise<unknown>): Promise<AppError> {
  const error = await promise.then(() => undefined, (e: unknown) => e);
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

describe("ride logs", () => {
  it("a log gives exactly one suggestion, safety first; applying it changes only that wheel, once", async () => {
    const park = await createPark();
    const trail = await createTrail(park, "Cinderline", ["rock-garden"]);
    const { actor, setup } = await riderWithSetup();
    const { rideLog, suggestion } = await createRideLog(actor, ride(setup.id, { parkSlug: park.slug, trailIds: [trail.id], note: "Rocky top section" }));
    // Rim strike (rear) outranks sliding (front): +7 % of the 23 psi run on the rear.
    expect(suggestion).toMatchObject({ wheel: "rear", symptom: "rim-strike", appliesTo: "baseline" });
    expect(suggestion.deltaKpa).toBeCloseTo(0.07 * psiToKpa(23), 9);
    expect(suggestion.reason).toMatch(/^Rear rim strike: \+1\.6 psi rear from what you ran/);
    expect(rideLog.suggestion).toEqual(suggestion);

    const applied = await applyRideLogSuggestion(actor, rideLog.id);
    expect(applied.setup.baseline?.rearKpa).toBeCloseTo(psiToKpa(23) * 1.07, 9);
    expect(applied.setup.baseline?.frontKpa).toBeCloseTo(psiToKpa(19), 9);
    expect(applied.setup.lockVersion).toBe(1);
    expect(applied.rideLog.appliedAt).not.toBeNull();
    expect((await refusal(applyRideLogSuggestion(actor, rideLog.id))).status).toBe(409);
    expect((await Setup.findByPk(setup.id))?.baseline).toMatchObject({ rearKpa: psiToKpa(23) * 1.07 });

    const [listed] = await listRideLogs(actor);
    expect(listed).toMatchObject({ id: rideLog.id, park: { slug: park.slug }, trails: [{ name: "Cinderline" }], setup: { name: "Test 29er" } });
  });

  it("a setup without a baseline gets one from what was run, on the ground it was run on", async () => {
    const { actor, setup } = await riderWithSetup({ baseline: null });
    const { rideLog, suggestion } = await createRideLog(actor, ride(setup.id, { symptoms: { front: ["fine"], rear: [] }, surfaces: ["wet"] }));
    expect(suggestion).toMatchObject({ wheel: null, deltaKpa: 0, appliesTo: "ran" });
    const applied = await applyRideLogSuggestion(actor, rideLog.id);
    expect(applied.setup.baseline).toEqual({ frontKpa: psiToKpa(19), rearKpa: psiToKpa(23), surfaces: ["wet"] });
  });

  it("a suggestion never goes above the printed maximum", async () => {
    const { actor, setup } = await riderWithSetup({ baseline: { frontKpa: psiToKpa(19), rearKpa: psiToKpa(40), surfaces: ["dry"] } });
    const { suggestion } = await createRideLog(actor, ride(setup.id, { rearKpa: psiToKpa(40), symptoms: { front: [], rear: ["burp"] } }));
    expect(suggestion.deltaKpa).toBe(0);
    expect(suggestion.reason).toContain("already at its printed maximum");
  });

  it("refuses another rider's setup or log (404), trails of another park (422), dates ahead (422)", async () => {
    const { actor, setup } = await riderWithSetup();
    const other = await newRider();
    expect((await refusal(createRideLog(other, ride(setup.id)))).status).toBe(404);
    const { rideLog } = await createRideLog(actor, ride(setup.id));
    expect((await refusal(applyRideLogSuggestion(other, rideLog.id))).status).toBe(404);
    expect(await listRideLogs(other)).toEqual([]);

    const [parkA, parkB] = [await createPark(), await createPark()];
    const trailB = await createTrail(parkB, "Elsewhere");
    const wrongPark = await refusal(createRideLog(actor, ride(setup.id, { parkSlug: parkA.slug, trailIds: [trailB.id] })));
    expect([wrongPark.status, wrongPark.field]).toEqual([422, "trailIds"]);
    const ahead = await refusal(createRideLog(actor, ride(setup.id, { riddenOn: "2999-01-01" })));
    expect([ahead.status, ahead.field]).toEqual([422, "riddenOn"]);
    const mixed = await refusal(createRideLog(actor, ride(setup.id, { symptoms: { front: ["fine", "burp"], rear: [] } })));
    expect([mixed.status, mixed.field]).toEqual([400, "symptoms.front"]);
    expect((await refusal(createRideLog(null, ride(setup.id)))).status).toBe(401);
  });
});
