import { afterAll, describe, expect, it } from "vitest";
import { signUpRider } from "@/lib/accounts/sign-up";
import { loadActor } from "@/lib/server/auth/actor";
import { verifyPassword } from "@/lib/server/auth/password";
import { AppError } from "@/lib/shared/errors";
import { acceptInvitation, inviteStaff } from "@/lib/staff/invitations";
import { ParkMembership, User, sequelize } from "@/models";
import { addStaff, capturedMessages, createPark, createUser, uniqueEmail } from "../helpers";

afterAll(() => sequelize.close());

async function managerOfNewPark() {
  const park = await createPark();
  const manager = await createUser();
  await addStaff(park.id, manager.id, "manager");
  return { park, actor: (await loadActor(manager.id))! };
}

describe("staff invitations", () => {
  it("a manager invites a ranger by e-mail; the link creates the account and the membership", async () => {
    const { park, actor } = await managerOfNewPark();
    const email = uniqueEmail("invitee");
    const invitation = await inviteStaff(actor, park.id, { email, role: "ranger" });
    const mail = (await capturedMessages()).find((m) => m.to.includes(email));
    expect(mail?.raw).toContain("/invitations/");
    const token = invitation.link.split("/invitations/")[1];
    expect(mail?.raw.replace(/=\r?\n/g, "")).toContain(token);

    const joined = await acceptInvitation({ token, name: "Rae", password: "ridge-runner-44" });
    expect(joined.role).toBe("ranger");
    const user = await User.findOne({ where: { email } });
    expect(await ParkMembership.findOne({ where: { parkId: park.id, userId: user!.id } })).toMatchObject({ role: "ranger" });
    // Used once only.
    await expect(acceptInvitation({ token, name: "Rae", password: "ridge-runner-44" })).rejects.toThrow(/not valid/);
  });

  it("a tampered token changes nothing", async () => {
    const { park, actor } = await managerOfNewPark();
    const email = uniqueEmail("tamper");
    const invitation = await inviteStaff(actor, park.id, { email, role: "ranger" });
    const token = invitation.link.split("/invitations/")[1];
    const tampered = token.slice(0, -3) + (token.endsWith("AAA") ? "BBB" : "AAA");
    const error = await acceptInvitation({ token: tampered, name: "Eve", password: "ridge-runner-44" }).catch((e) => e);
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).field).toBe("token");
    expect(await User.count({ where: { email } })).toBe(0);
  });

  it("a weak password on acceptance is refused and the invitation stays usable", async () => {
    const { park, actor } = await managerOfNewPark();
    const email = uniqueEmail("weakpw");
    const token = (await inviteStaff(actor, park.id, { email, role: "manager" })).link.split("/invitations/")[1];
    await expect(acceptInvitation({ token, name: "Kim", password: "short" })).rejects.toThrow(/at least 8/);
    expect(await User.count({ where: { email } })).toBe(0);
    await expect(acceptInvitation({ token, name: "Kim", password: "long-enough-pass-1" })).resolves.toMatchObject({ role: "manager" });
  });

  it("a ranger, a rider or another park's manager cannot invite", async () => {
    const { park } = await managerOfNewPark();
    const ranger = await createUser();
    await addStaff(park.id, ranger.id, "ranger");
    const other = await managerOfNewPark();
    const rider = await createUser();
    for (const actor of [await loadActor(ranger.id), await loadActor(rider.id), other.actor]) {
      const error = await inviteStaff(actor, park.id, { email: uniqueEmail(), role: "ranger" }).catch((e) => e);
      expect((error as AppError).status).toBe(403);
    }
    expect(((await inviteStaff(null, park.id, { email: uniqueEmail(), role: "ranger" }).catch((e) => e)) as AppError).status).toBe(401);
  });

  it("a role change takes effect at once (re-read from the database, ASVS 8.3.2)", async () => {
    const { park } = await managerOfNewPark();
    const user = await createUser();
    const membership = await addStaff(park.id, user.id, "manager");
    expect((await loadActor(user.id))!.memberships[0].role).toBe("manager");
    await membership.update({ role: "ranger" });
    const actor = await loadActor(user.id);
    const error = await inviteStaff(actor, park.id, { email: uniqueEmail(), role: "ranger" }).catch((e) => e);
    expect((error as AppError).status).toBe(403);
  });
});

describe("an invitation never hands a role to someone else's account (issue #12 finding 1)", () => {
  // ASVS v5.0.0 6.4.x / 8.2.2: the link proves the address, not the right to an existing account.
  it("an attacker's unproven sign-up for the invitee's address is taken over: new password, earlier sessions end", async () => {
    const { park, actor } = await managerOfNewPark();
    const email = uniqueEmail("squatted");
    await signUpRider({ name: "Mallory", email, password: "attacker-owns-this-9" }, "198.51.100.66");
    const squatter = (await User.findOne({ where: { email } }))!;
    expect(squatter.emailVerifiedAt).toBeNull();
    const token = (await inviteStaff(actor, park.id, { email, role: "ranger" })).link.split("/invitations/")[1];
    // Before the fix the real invitee joined with no password and the role landed on Mallory's account.
    await expect(acceptInvitation({ token, name: "Real Invitee", password: "" })).rejects.toThrow(/at least 8/);
    await acceptInvitation({ token, name: "Real Invitee", password: "the-real-invitee-7" });
    const claimed = (await User.findByPk(squatter.id))!;
    expect(claimed.name).toBe("Real Invitee");
    expect(claimed.emailVerifiedAt).not.toBeNull();
    expect(claimed.sessionVersion).toBe(squatter.sessionVersion + 1);
    expect(await verifyPassword("attacker-owns-this-9", claimed.passwordHash)).toBe(false);
    expect(await verifyPassword("the-real-invitee-7", claimed.passwordHash)).toBe(true);
  });

  it("a proven account joins only when signed in as it or with its password; the link alone is refused", async () => {
    const { park, actor } = await managerOfNewPark();
    const owner = await createUser({ password: "owner-knows-this-5" });
    const token = (await inviteStaff(actor, park.id, { email: owner.email, role: "manager" })).link.split("/invitations/")[1];
    const refused = await acceptInvitation({ token, name: "Whoever", password: "" }).catch((e) => e);
    expect((refused as AppError).status).toBe(400);
    await expect(acceptInvitation({ token, name: "Whoever", password: "not-the-password-1" }, await loadActor((await createUser()).id))).rejects.toThrow(/already has an account/);
    expect(await ParkMembership.count({ where: { parkId: park.id, userId: owner.id } })).toBe(0);
    // Signed in as the owner: no password needed.
    await expect(acceptInvitation({ token, name: "Owner", password: "" }, await loadActor(owner.id))).resolves.toMatchObject({ role: "manager", existingAccount: true });
  });

  it("an account made by an invitation link is proven by it", async () => {
    const { park, actor } = await managerOfNewPark();
    const email = uniqueEmail("invited-new");
    const token = (await inviteStaff(actor, park.id, { email, role: "ranger" })).link.split("/invitations/")[1];
    await acceptInvitation({ token, name: "New Ranger", password: "new-ranger-pass-3" });
    expect((await User.findOne({ where: { email } }))!.emailVerifiedAt).not.toBeNull();
  });
});
