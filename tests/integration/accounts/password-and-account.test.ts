import { afterAll, describe, expect, it } from "vitest";
import { changePassword, confirmEmailChange, deleteMyAccount, exportMyData, requestEmailChange, signOutEverywhere } from "@/lib/accounts/my-account";
import { confirmPasswordReset, requestPasswordReset, RESET_REQUEST_ANSWER } from "@/lib/accounts/password-reset";
import { loadActor } from "@/lib/server/auth/actor";
import { verifyPassword } from "@/lib/server/auth/password";
import { AppError } from "@/lib/shared/errors";
import { AccountLink, AuditEvent, ParkMembership, PushSubscription, Setup, Subscription, TrailReport, User, sequelize } from "@/models";
import { createTrail, reportToday, riderWithSetup } from "../pressure/fixtures";
import { addStaff, capturedMessages, createPark, createUser, tokenMailedTo, uniqueEmail } from "../helpers";

afterAll(() => sequelize.close());

const OLD = "gravel-and-roots-42"; // createUser's password
const NEW = "fresh-loam-after-rain-8";
const from = () => `198.18.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;
const status = async (promise: Promise<unknown>) => ((await promise.catch((e) => e)) as AppError).status;
const versionOf = async (id: string) => (await User.findByPk(id))!.sessionVersion;

describe("password reset (ASVS v5.0.0 6.4.1, 6.4.2)", () => {
  it("the same answer for a known and an unknown address; only the owner gets a link", async () => {
    const user = await createUser();
    const stranger = uniqueEmail("stranger");
    expect(await requestPasswordReset({ email: user.email }, from())).toEqual(RESET_REQUEST_ANSWER);
    expect(await requestPasswordReset({ email: stranger }, from())).toEqual(RESET_REQUEST_ANSWER);
    expect((await capturedMessages()).some((m) => m.to.includes(stranger))).toBe(false);
    expect(await tokenMailedTo(user.email, "/account/reset")).toMatch(/^[A-Za-z0-9_-]{43}$/);
  });

  it("a link sets a new password once and ends every session; used and altered links get 400", async () => {
    const user = await createUser();
    const before = await versionOf(user.id);
    await requestPasswordReset({ email: user.email }, from());
    const token = await tokenMailedTo(user.email, "/account/reset");
    await confirmPasswordReset({ token, password: NEW });
    const after = (await User.findByPk(user.id))!;
    expect(await verifyPassword(NEW, after.passwordHash)).toBe(true);
    expect(await loadActor(user.id, before)).toBeNull();
    expect(await status(confirmPasswordReset({ token, password: "another-new-one-9" }))).toBe(400);
    const altered = token.slice(0, -2) + (token.endsWith("AA") ? "BB" : "AA");
    expect(await status(confirmPasswordReset({ token: altered, password: "another-new-one-9" }))).toBe(400);
    expect(await AuditEvent.count({ where: { action: "account.password-reset", actorId: user.id } })).toBe(1);
  });

  it("an expired link gets 400 with a clear message", async () => {
    const user = await createUser();
    await requestPasswordReset({ email: user.email }, from());
    const token = await tokenMailedTo(user.email, "/account/reset");
    await AccountLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    await expect(confirmPasswordReset({ token, password: NEW })).rejects.toThrow(/not valid any more/);
  });

  it("a refused new password leaves the old one and the link working (nothing half-written)", async () => {
    const user = await createUser();
    await requestPasswordReset({ email: user.email }, from());
    const token = await tokenMailedTo(user.email, "/account/reset");
    const refused = (await confirmPasswordReset({ token, password: "password123" }).catch((e) => e)) as AppError;
    expect([refused.status, refused.field]).toEqual([400, "password"]);
    expect(await verifyPassword(OLD, (await User.findByPk(user.id))!.passwordHash)).toBe(true);
    await expect(confirmPasswordReset({ token, password: NEW })).resolves.toMatchObject({ message: expect.any(String) });
  });

  it("reset requests are limited per e-mail: the 4th in an hour is refused with 429 (ASVS 2.4.1)", async () => {
    const user = await createUser();
    for (let i = 0; i < 3; i++) await requestPasswordReset({ email: user.email }, from());
    expect(await status(requestPasswordReset({ email: user.email }, from()))).toBe(429);
  });
});

describe("the account page's actions", () => {
  it("changing the password needs the current one and ends every session", async () => {
    const user = await createUser();
    const actor = await loadActor(user.id);
    const wrong = (await changePassword(actor, { currentPassword: "not-mine-at-all", newPassword: NEW }).catch((e) => e)) as AppError;
    expect([wrong.status, wrong.field]).toEqual([400, "currentPassword"]);
    const before = await versionOf(user.id);
    await changePassword(actor, { currentPassword: OLD, newPassword: NEW });
    expect(await loadActor(user.id, before)).toBeNull();
    expect(await verifyPassword(NEW, (await User.findByPk(user.id))!.passwordHash)).toBe(true);
    expect(await status(changePassword(null, { currentPassword: OLD, newPassword: NEW }))).toBe(401);
  });

  it("sign out everywhere moves the session version", async () => {
    const user = await createUser();
    await signOutEverywhere(await loadActor(user.id), { password: OLD });
    expect(await loadActor(user.id, 0)).toBeNull();
  });

  it("a new address counts once its link is opened; the old address is told", async () => {
    const user = await createUser();
    const next = uniqueEmail("moved");
    await requestEmailChange(await loadActor(user.id), { newEmail: next, password: OLD });
    expect((await User.findByPk(user.id))!.email).toBe(user.email);
    expect((await capturedMessages()).some((m) => m.to.includes(user.email) && m.raw.includes("is changing"))).toBe(true);
    await confirmEmailChange({ token: await tokenMailedTo(next, "/account/new-address") });
    expect((await User.findByPk(user.id))!.email).toBe(next);
  });

  it("download my data holds the account, setups, ride logs, subscriptions and browser alerts, and never the password hash or a browser's keys", async () => {
    const { actor, setup } = await riderWithSetup();
    const park = await createPark();
    const secret = "S".repeat(22);
    await PushSubscription.create({ userId: actor.id, parkId: park.id, endpoint: "https://push.example-service.test/x", p256dh: `B${"K".repeat(86)}`, auth: secret, trailIds: null, kinds: ["closure"] });
    const data = await exportMyData(actor);
    expect(data.browserAlerts).toEqual([expect.objectContaining({ parkId: park.id, endpoint: "https://push.example-service.test/x", kinds: ["closure"] })]);
    expect(JSON.stringify(data)).not.toContain(secret);
    expect(data.account).toMatchObject({ id: actor.id, email: actor.email });
    expect(data.setups.map((s) => (s as { id: string }).id)).toEqual([setup.id]);
    expect(Object.keys(data)).toEqual(expect.arrayContaining(["rideLogs", "subscriptions"]));
    expect(JSON.stringify(data)).not.toMatch(/passwordHash|\$2[aby]\$/);
    expect(await status(exportMyData(null))).toBe(401);
  });

  it("deleting the account removes its setups and cannot sign in; reports written as staff remain", async () => {
    const park = await createPark();
    const { actor, setup } = await riderWithSetup();
    await addStaff(park.id, actor.id, "ranger");
    const trail = await createTrail(park, "Deleted Author Line");
    const report = await reportToday(park, trail, "open", ["tacky"]);
    await report.update({ reporterId: actor.id });
    expect(await status(deleteMyAccount(actor, { password: "not-the-password" }))).toBe(400);
    await deleteMyAccount(actor, { password: OLD });
    expect(await User.findByPk(actor.id)).toBeNull();
    expect(await Setup.findByPk(setup.id)).toBeNull();
    expect(await Subscription.count({ where: { userId: actor.id } })).toBe(0);
    expect((await TrailReport.findByPk(report.id))!.reporterId).toBeNull();
    expect(await AuditEvent.count({ where: { action: "account.deleted" } })).toBeGreaterThan(0);
  });

  it("the last manager of a park cannot delete the account until another manager exists (409)", async () => {
    const park = await createPark();
    const user = await createUser();
    await addStaff(park.id, user.id, "manager");
    const refused = (await deleteMyAccount(await loadActor(user.id), { password: OLD }).catch((e) => e)) as AppError;
    expect(refused.status).toBe(409);
    expect(refused.message).toMatch(/last manager/);
    const second = await createUser();
    await addStaff(park.id, second.id, "manager");
    await deleteMyAccount(await loadActor(user.id), { password: OLD });
    expect(await ParkMembership.count({ where: { parkId: park.id } })).toBe(1);
  });
});
