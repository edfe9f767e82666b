// A rider's display units on their own account (User.units), validated with zod.
import { afterAll, describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { unitsFor, updateUnits } from "@/lib/accounts/units";
import { User, sequelize } from "@/models";
import { newRider } from "../pressure/fixtures";

afterAll(() => sequelize.close());

describe("unit preferences", () => {
  it("are stored on the rider's own account and read back", async () => {
    const actor = await newRider();
    expect(await unitsFor(actor)).toEqual({ pressure: "psi", mass: "kg", distance: "metric" });
    await updateUnits(actor, { pressure: "bar", mass: "lb", distance: "imperial" });
    expect((await User.findByPk(actor.id))?.units).toEqual({ pressure: "bar", mass: "lb", distance: "imperial" });
    expect(await unitsFor(actor)).toEqual({ pressure: "bar", mass: "lb", distance: "imperial" });
  });

  it("refuses unknown units (400, with the field) and anonymous callers (401)", async () => {
    const actor = await newRider();
    const bad = await updateUnits(actor, { pressure: "atm", mass: "kg", distance: "metric" }).catch((e: unknown) => e);
    expect(bad).toBeInstanceOf(AppError);
    expect([(bad as AppError).status, (bad as AppError).field]).toEqual([400, "pressure"]);
    const anonymous = await updateUnits(null, { pressure: "psi", mass: "kg", distance: "metric" }).catch((e: unknown) => e);
    expect((anonymous as AppError).status).toBe(401);
    expect(await unitsFor(actor)).toEqual({ pressure: "psi", mass: "kg", distance: "metric" });
  });
});
