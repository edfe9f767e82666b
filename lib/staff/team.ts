import "server-only";
import { z } from "zod";
import type { Transaction } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { hashToken, newToken } from "@/lib/server/auth/tokens";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { Invitation, Park, ParkMembership, User, sequelize } from "@/models";
import { invitationExpiry, mailInvitation } from "./invitations";
import { recordAudit } from "@/lib/audit/record";

/** A park's team as its staff see it: members with who invited them, and invitations still open. */
export async function listTeam(actor: Actor | null, park: Park) {
  authorize(actor, "team:read", { parkId: park.id });
  const [members, invitations] = await Promise.all([
    ParkMembership.findAll({ where: { parkId: park.id }, include: [{ model: User, as: "user", attributes: ["name", "email"] }], order: [["createdAt", "ASC"]] }),
    Invitation.findAll({ where: { parkId: park.id }, include: [{ model: User, as: "inviter", attributes: ["name"] }], order: [["createdAt", "DESC"]] }),
  ]);
  // Who invited a member: the invitation to their address that was accepted last.
  const acceptedBy = new Map<string, string | null>();
  for (const i of invitations) if (i.acceptedAt && !acceptedBy.has(i.email)) acceptedBy.set(i.email, inviterName(i));
  const now = Date.now();
  return {
    members: members.map((m) => {
      const user = (m as ParkMembership & { user: User }).user;
      return { userId: m.userId, name: user.name, email: user.email, role: m.role, joinedAt: m.createdAt.toISOString(), invitedBy: acceptedBy.get(user.email) ?? null };
    }),
    invitations: invitations
      .filter((i) => !i.acceptedAt && !i.revokedAt && i.expiresAt.getTime() > now)
      .map((i) => ({ id: i.id, email: i.email, role: i.role, invitedBy: inviterName(i), sentAt: i.updatedAt.toISOString(), expiresAt: i.expiresAt.toISOString() })),
  };
}
const inviterName = (i: Invitation) => (i as Invitation & { inviter?: User | null }).inviter?.name ?? null;

const roleSchema = z.object({ role: z.enum(["manager", "ranger"], { message: "Choose manager or ranger." }) }).strict();

/** The membership, locked; and the park's managers, locked too, so two managers cannot demote each other at once. */
async function lockedMember(park: Park, userId: string, transaction: Transaction) {
  const members = isUuid(userId) ? await ParkMembership.findAll({ where: { parkId: park.id, role: "manager" }, transaction, lock: transaction.LOCK.UPDATE }) : [];
  const member = isUuid(userId) ? await ParkMembership.findOne({ where: { parkId: park.id, userId }, transaction, lock: transaction.LOCK.UPDATE }) : null;
  if (!member) throw new AppError(404, "This person is not on the park's team.");
  const lastManager = member.role === "manager" && members.length <= 1;
  return { member, lastManager };
}

const LAST_MANAGER = "This is the park's last manager. Make someone else manager first, so the park is never left without one.";

export async function changeMemberRole(actor: Actor | null, park: Park, userId: string, input: unknown) {
  authorize(actor, "team:manage", { parkId: park.id });
  const { role } = roleSchema.parse(input);
  return sequelize.transaction(async (transaction) => {
    const { member, lastManager } = await lockedMember(park, userId, transaction);
    if (member.role === role) return { userId, role };
    if (lastManager) throw new AppError(409, LAST_MANAGER, "role");
    const from = member.role;
    await member.update({ role }, { transaction });
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "staff.role", subjectType: "user", subjectId: userId, data: { from, to: role } }, transaction);
    return { userId, role };
  });
}

/**
 * Removes someone from the team. Roles are re-read from the database on every request
 * (lib/server/auth/actor.ts), so their very next staff request is refused, whatever session they hold.
 */
export async function removeMember(actor: Actor | null, park: Park, userId: string) {
  authorize(actor, "team:manage", { parkId: park.id });
  await sequelize.transaction(async (transaction) => {
    const { member, lastManager } = await lockedMember(park, userId, transaction);
    if (lastManager) throw new AppError(409, LAST_MANAGER);
    await member.destroy({ transaction });
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "staff.remove", subjectType: "user", subjectId: userId, data: { role: member.role } }, transaction);
  });
}

/** An invitation of this park still waiting for an answer, locked for the change. */
async function openInvitation(park: Park, id: string, transaction: Transaction) {
  const invitation = isUuid(id) ? await Invitation.findOne({ where: { id, parkId: park.id }, transaction, lock: transaction.LOCK.UPDATE }) : null;
  if (!invitation) throw new AppError(404, "Invitation not found.");
  if (invitation.acceptedAt) throw new AppError(409, "This invitation was already accepted; manage the member in the team list instead.");
  if (invitation.revokedAt) throw new AppError(409, "This invitation was already withdrawn.");
  return invitation;
}

/** Withdraws an invitation: its link then says so, and it can no longer be accepted. */
export async function revokeInvitation(actor: Actor | null, park: Park, id: string) {
  authorize(actor, "staff:invite", { parkId: park.id });
  await sequelize.transaction(async (transaction) => {
    const invitation = await openInvitation(park, id, transaction);
    await invitation.update({ revokedAt: new Date() }, { transaction });
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "staff.invite-revoke", subjectType: "invitation", subjectId: id, data: { email: invitation.email } }, transaction);
  });
}

/** Sends an invitation again with a new link and a new week to answer; the old link stops working. */
export async function resendInvitation(actor: Actor | null, park: Park, id: string) {
  authorize(actor, "staff:invite", { parkId: park.id });
  const token = newToken();
  const invitation = await sequelize.transaction(async (transaction) => {
    const invitation = await openInvitation(park, id, transaction);
    await invitation.update({ tokenHash: hashToken(token), expiresAt: invitationExpiry(), invitedBy: actor.id }, { transaction });
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "staff.invite-resend", subjectType: "invitation", subjectId: id, data: { email: invitation.email } }, transaction);
    return invitation;
  });
  await mailInvitation(park, invitation, token, actor.name);
  return { id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt.toISOString() };
}
