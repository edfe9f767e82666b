import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { signUpRider } from "@/lib/accounts/sign-up";
import { readJson } from "@/lib/server/api/body";
import { loadActor } from "@/lib/server/auth/actor";
import type { Actor } from "@/lib/server/auth/permissions";
import { setParkState } from "@/lib/conditions/park-state";
import { AppError } from "@/lib/shared/errors";
import { saveSubscription } from "@/lib/notices/subscriptions";
import { updateUnits } from "@/lib/accounts/units";
import { acceptInvitation, inviteStaff } from "@/lib/staff/invitations";
import { Invitation, Park, ParkMembership, ParkState, Subscription, User, sequelize } from "@/models";
import { addStaff, createPark, createUser, uniqueEmail } from "../helpers";

/**
 * Hostile input where the proof of "nothing written" is a row count read straight from the models:
 * accounts, invitations, subscriptions, park-wide states, units (OWASP ASVS v5.0.0 2.2.1, 15.3.3,
 * 1.3.11). The HTTP corpus is tests/e2e/hostile-input.spec.ts.
 */
let park: Park;
let otherPark: Park;
let manager: Actor;
let rider: Actor;
beforeAll(async () => {
  park = await createPark();
  otherPark = await createPark();
  const managerUser = await createUser();
  await addStaff(park.id, managerUser.id, "manager");
  manager = (await loadActor(managerUser.id))!;
  rider = (await loadActor((await createUser()).id))!;
});
afterAll(async () => {
  await Park.destroy({ where: { id: [park.id, otherPark.id] } });
  await sequelize.close();
});

const statusOf = (error: unknown) => (error instanceof AppError ? error.status : error instanceof ZodError ? 400 : `unexpected ${String(error)}`);
const PASSWORD = "switchback-dawn-patrol-8";
const signUp = (fields: Record<string, unknown>) => () => signUpRider({ name: "Hostile Rider", email: uniqueEmail("hostile"), password: PASSWORD, ...fields });
const users = () => User.count();

type Case = { name: string; run: () => Promise<unknown>; status: number; rows: () => Promise<unknown> };
const CASES: Case[] = [
  { name: "sign-up: mass assignment of siteRole", run: signUp({ siteRole: "admin" }), status: 400, rows: users },
  { name: "sign-up: a Cyrillic і in the local part (homoglyph of rider@)", run: signUp({ email: "r\u0456der@demo.loamcast.test" }), status: 400, rows: users },
  { name: "sign-up: a Cyrillic е in the domain", run: signUp({ email: "rider@d\u0435mo.loamcast.test" }), status: 400, rows: users },
  { name: "sign-up: CR/LF and a Bcc header in the e-mail", run: signUp({ email: "a@tests.loamcast.test\r\nBcc: all@evil.example" }), status: 400, rows: users },
  { name: "sign-up: a right-to-left override in the name", run: signUp({ name: "Ada \u202Enimda" }), status: 400, rows: users },
  { name: "sign-up: a NUL byte in the name (was stored as a literal \\0)", run: signUp({ name: "Ada\u0000Admin" }), status: 400, rows: users },
  { name: "sign-up: a line break in the name", run: signUp({ name: "Ada\nAdmin" }), status: 400, rows: users },
  { name: "sign-up: a 100,000-character password", run: signUp({ password: "x".repeat(100_000) }), status: 400, rows: users },
  { name: "sign-up: a __proto__ key", run: () => signUpRider(JSON.parse(`{"__proto__":{"siteRole":"admin"},"name":"Ada","email":"${uniqueEmail("proto")}","password":"${PASSWORD}"}`)), status: 400, rows: users },
  { name: "invitation: a homoglyph e-mail", run: () => inviteStaff(manager, park.id, { email: "m\u0430nager@demo.loamcast.test", role: "ranger" }), status: 400, rows: () => Invitation.count() },
  { name: "invitation: the role admin", run: () => inviteStaff(manager, park.id, { email: uniqueEmail("invitee"), role: "admin" }), status: 400, rows: () => Invitation.count() },
  { name: "invitation: another park's id in the body", run: () => inviteStaff(manager, park.id, { email: uniqueEmail("invitee"), role: "ranger", parkId: otherPark.id }), status: 400, rows: () => Invitation.count() },
  { name: "invitation: a path-traversal token", run: () => acceptInvitation({ token: "../../../../etc/passwd/../../..", name: "Eve", password: PASSWORD }), status: 400, rows: () => ParkMembership.count() },
  { name: "invitation: a role chosen by the invitee", run: () => acceptInvitation({ token: "a".repeat(43), name: "Eve", password: PASSWORD, role: "manager" }), status: 400, rows: () => ParkMembership.count() },
  { name: "subscription: someone else's e-mail address", run: () => saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"], email: "victim@tests.loamcast.test" }), status: 400, rows: () => Subscription.count() },
  { name: "subscription: someone else's userId", run: () => saveSubscription(rider, { parkSlug: park.slug, kinds: ["closure"], userId: manager.id }), status: 400, rows: () => Subscription.count() },
  { name: "subscription: SQL in the park slug", run: () => saveSubscription(rider, { parkSlug: "' OR 1=1; --", kinds: ["closure"] }), status: 422, rows: () => Subscription.count() },
  { name: "units: a __proto__ key", run: () => updateUnits(rider, JSON.parse('{"pressure":"bar","mass":"kg","distance":"metric","__proto__":{"pressure":"psi"}}')), status: 400, rows: async () => (await User.findByPk(rider.id))!.units },
  { name: "park-wide state: a NUL byte in the message", run: () => setParkState(manager, park, { state: "closed", message: "Closed\u0000" }), status: 400, rows: () => ParkState.count() },
  { name: "park-wide state: a 100,000-character message", run: () => setParkState(manager, park, { state: "closed", message: "x".repeat(100_000) }), status: 400, rows: () => ParkState.count() },
];

describe("hostile input, counted in the database", () => {
  it.each(CASES.map((c) => [c.name, c] as const))("%s", async (_name, c) => {
    const before = await c.rows();
    const outcome = await c.run().then(() => "accepted", statusOf);
    expect(outcome).toBe(c.status);
    expect(await c.rows()).toEqual(before);
  });

  it("readJson refuses NUL anywhere in a body, and a __proto__ key pollutes nothing", async () => {
    const request = (body: string) => new Request("http://localhost/api/x", { method: "POST", headers: { "content-type": "application/json" }, body });
    const error = await readJson(request('{"a":[{"b":"ok"},{"c":"x\\u0000y"}]}')).catch((e) => e);
    expect(error).toMatchObject({ status: 400, field: "a.1.c" });
    const parsed = (await readJson(request('{"__proto__":{"siteRole":"admin"}}'))) as Record<string, unknown>;
    expect(Object.keys(parsed)).toEqual(["__proto__"]);
    expect(({} as Record<string, unknown>).siteRole).toBeUndefined();
    expect((parsed as { siteRole?: string }).siteRole).toBeUndefined();
    // 10,000 levels deep: the NUL check walks it without recursion, so the stack cannot overflow.
    expect(Array.isArray(await readJson(request(`${"[".repeat(10_000)}${"]".repeat(10_000)}`)))).toBe(true);
  });
});
