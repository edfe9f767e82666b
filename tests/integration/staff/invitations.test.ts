import { afterAll, describe, expect, it } from "vitest";
import { loadActor } from "@/lib/server/auth/actor";
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
