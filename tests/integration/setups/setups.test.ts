// Setups CRUD through lib/ on the real database: scoped to the owner (another rider gets 404,
// ASVS v5.0.0 8.2.2), optimistic locking (409), validation errors naming the field.
import { afterAll, describe, expect, it } from "vitest";
import { findOwnSetup, listSetups } from "@/lib/setups/setup-queries";
import { AppError } from "@/lib/shared/errors";
import { createSetup, deleteSetup, updateSetup } from "@/lib/setups/setup-writes";
import { psiToKpa } from "@/lib/shared/units";
import { Setup, sequelize } from "@/models";
import { newRider, riderWithSetup, trailBike, wheel29 } from "../pressure/fixtures";

afterAll(() => sequelize.close());

async function refusal(promise: Promise<unknown>): Promise<AppError> {
  const error = await promise.then(() => undefined, (e: unknown) => e);
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

describe("setups are the rider's own", () => {
  it("a rider creates, lists, reads, updates and deletes a setup", async () => {
    const { actor, setup } = await riderWithSetup({ suspension: { rearStrokeMm: 60, rearSagMm: 17, forkTravelMm: 150, frontSagMm: 30 } });
    expect(setup).toMatchObject({ name: "Test 29er", lockVersion: 0, front: { widthMm: 61 } });
    expect(setup.sag.rear).toMatchObject({ verdict: "in-range" }); // 17/60 = 28 %
    expect(setup.sag.fork).toMatchObject({ verdict: "in-range" }); // 30/150 = 20 %
    expect((await listSetups(actor)).map((s) => s.id)).toEqual([setup.id]);

    const updated = await updateSetup(actor, setup.id, { lockVersion: 0, name: "Renamed", baseline: null });
    expect(updated).toMatchObject({ name: "Renamed", baseline: null, lockVersion: 1 });
    expect(updated.front).toEqual(setup.front);

    await deleteSetup(actor, setup.id);
    expect(await Setup.findByPk(setup.id)).toBeNull();
  });

  it("another rider gets 404 for every operation, and the setup is untouched", async () => {
    const { setup } = await riderWithSetup();
    const other = await newRider();
    for (const attempt of [
      findOwnSetup(other, setup.id),
      updateSetup(other, setup.id, { lockVersion: 0, name: "Mine now" }),
      deleteSetup(other, setup.id),
    ]) {
      const error = await refusal(attempt);
      expect([error.status, error.message]).toEqual([404, "Setup not found."]);
    }
    expect(await listSetups(other)).toEqual([]);
    expect((await Setup.findByPk(setup.id))?.name).toBe("Test 29er");
  });

  it("anonymous callers get 401; ids that are not UUIDs get 404", async () => {
    expect((await refusal(listSetups(null))).status).toBe(401);
    expect((await refusal(createSetup(null, trailBike()))).status).toBe(401);
    const actor = await newRider();
    expect((await refusal(findOwnSetup(actor, "not-a-uuid"))).status).toBe(404);
  });

  it("a stale lockVersion is a 409 and changes nothing", async () => {
    const { actor, setup } = await riderWithSetup();
    await updateSetup(actor, setup.id, { lockVersion: 0, riderMassKg: 74 });
    const error = await refusal(updateSetup(actor, setup.id, { lockVersion: 0, riderMassKg: 90 }));
    expect(error.status).toBe(409);
    expect(error.details).toEqual({ lockVersion: 1 });
    expect((await Setup.findByPk(setup.id))?.riderMassKg).toBe(74);
  });

  it("refuses bad input with the failing field, and writes nothing", async () => {
    const actor = await newRider();
    const narrow = await refusal(createSetup(actor, trailBike({ front: { ...wheel29, widthMm: 20 } })));
    expect([narrow.status, narrow.field]).toEqual([400, "front.widthMm"]);
    const aboveMax = await refusal(createSetup(actor, trailBike({ baseline: { frontKpa: psiToKpa(45), rearKpa: psiToKpa(23) } })));
    expect([aboveMax.status, aboveMax.field]).toEqual([400, "baseline.frontKpa"]);
    const sag = await refusal(createSetup(actor, trailBike({ suspension: { rearStrokeMm: 55, rearSagMm: 60 } })));
    expect([sag.status, sag.field]).toEqual([400, "suspension.rearSagMm"]);
    const mass = await refusal(createSetup(actor, { ...trailBike(), ownerId: "someone" } as never));
    expect(mass.status).toBe(400); // unknown keys are refused: no mass assignment (ASVS v5.0.0 15.3.3)
    expect(await listSetups(actor)).toEqual([]);
  });
});
