import "server-only";
import { Op, type Transaction } from "sequelize";
import { authorize, type Actor, type ParkRole } from "@/lib/server/auth/permissions";
import { hashPassword, passwordSchema, verifyPassword } from "@/lib/server/auth/password";
import { hashToken, newToken } from "@/lib/server/auth/tokens";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";
import { sendMail } from "@/lib/server/mail/transport";
import { acceptInvitationFields, invitationFields } from "@/lib/accounts/pure/schemas";
import { Invitation, Park, ParkMembership, User, sequelize } from "@/models";
import { recordAudit } from "@/lib/audit/record";

const INVITATION_DAYS = 7;

/** A manager invites someone to their park as manager or ranger; the link goes by e-mail. */
export async function inviteStaff(actor: Actor | null, parkId: string, input: unknown) {
  authorize(actor, "staff:invite", { parkId });
  const { email, role } = invitationFields.parse(input);
  const park = await Park.findByPk(parkId);
  if (!park) throw new AppError(404, "Park not found.");
  const { invitation, token } = await sequelize.transaction((transaction) => createInvitation({ parkId, email, role, invitedBy: actor }, transaction));
  const link = await mailInvitation(park, invitation, token, actor.name);
  return { id: invitation.id, email, role, expiresAt: invitation.expiresAt, link };
}

/**
 * Writes an invitation and its audit event inside the caller's transaction (creating a park
 * writes its first manager's invitation in the same one). The token is returned, never stored.
 */
export async function createInvitation(
  { parkId, email, role, invitedBy }: { parkId: string; email: string; role: ParkRole; invitedBy: Actor },
  transaction: Transaction,
) {
  const token = newToken();
  const invitation = await Invitation.create(
    { parkId, email, role, tokenHash: hashToken(token), invitedBy: invitedBy.id, expiresAt: invitationExpiry(), acceptedAt: null },
    { transaction },
  );
  await recordAudit({ parkId, actorId: invitedBy.id, action: "staff.invite", subjectType: "invitation", subjectId: invitation.id, data: { email, role } }, transaction);
  return { invitation, token };
}

export const invitationExpiry = (from = Date.now()) => new Date(from + INVITATION_DAYS * 86_400_000);

/** Sends the invitation e-mail (after the transaction committed) and returns the link. */
export async function mailInvitation(park: Park, invitation: Invitation, token: string, inviterName: string) {
  const link = `${env().APP_URL}/invitations/${token}`;
  await sendMail({
    to: invitation.email,
    subject: `You're invited to join ${park.name} on Loamcast`,
    text: `${inviterName} invited you to join ${park.name} on Loamcast as ${invitation.role}.\n\nAccept within ${INVITATION_DAYS} days: ${link}\n\nIf you were not expecting this, ignore this e-mail.`,
  });
  return link;
}

/** True when the link belongs to an invitation a manager withdrew: its page says so. */
export async function isWithdrawnInvitation(token: string): Promise<boolean> {
  return (await Invitation.count({ where: { tokenHash: hashToken(token), revokedAt: { [Op.ne]: null } }, useMaster: true })) > 0;
}

export async function findOpenInvitation(token: string) {
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token), acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [{ model: Park, as: "park", attributes: ["name", "slug"] }],
    useMaster: true, // the link is often opened seconds after it was sent
  });
  return invitation as (Invitation & { park?: Park }) | null;
}

/** What the invitation page must ask for: nothing more than a name for a new address. */
export type InviteeAccount = "none" | "unproven" | "proven";

export async function inviteeAccount(email: string): Promise<InviteeAccount> {
  const user = await User.findOne({ where: { email }, attributes: ["emailVerifiedAt"], useMaster: true });
  return !user ? "none" : user.emailVerifiedAt ? "proven" : "unproven";
}

/**
 * Accepting creates the account (or uses the existing one with that address) and the membership,
 * in one transaction; a used, expired or tampered token changes nothing. The link proves the
 * address (it was mailed there), but it never speaks for an account someone already proved: that
 * account's owner must be signed in or give its password (ASVS v5.0.0 6.4.x, 8.2.2). An account
 * that was never proven is claimed by the link's holder: new name and password, and every earlier
 * session ends.
 */
export async function acceptInvitation(input: unknown, actor: Actor | null = null) {
  const fields = acceptInvitationFields.parse(input);
  const invitation = await findOpenInvitation(fields.token);
  if (!invitation) throw new AppError(400, "This invitation link is not valid any more. Ask your manager for a new one.", "token");
  const existing = await User.findOne({ where: { email: invitation.email }, useMaster: true });
  let passwordHash: string | null = null;
  if (existing?.emailVerifiedAt) {
    const signedInAsOwner = actor?.id === existing.id;
    if (!signedInAsOwner && !(fields.password && (await verifyPassword(fields.password, existing.passwordHash)))) {
      await recordAudit({ parkId: invitation.parkId, actorId: actor?.id ?? null, action: "staff.join.refused", subjectType: "invitation", subjectId: invitation.id });
      throw new AppError(400, "This address already has an account: sign in as that account, or enter its password, to join.", "password");
    }
  } else {
    const password = passwordSchema.safeParse(fields.password);
    if (!password.success) throw new AppError(400, password.error.issues[0].message, "password");
    passwordHash = await hashPassword(password.data);
  }
  return sequelize.transaction(async (transaction) => {
    const [claimed] = await Invitation.update(
      { acceptedAt: new Date() },
      { where: { id: invitation.id, acceptedAt: null, revokedAt: null }, transaction },
    );
    if (claimed !== 1) throw new AppError(409, "This invitation was already used.");
    let user: User;
    if (existing?.emailVerifiedAt) user = existing;
    else if (existing) {
      user = await existing.update({ name: fields.name, passwordHash: passwordHash!, emailVerifiedAt: new Date(), sessionVersion: existing.sessionVersion + 1 }, { transaction });
    } else {
      user = await User.create(
        { email: invitation.email, name: fields.name, passwordHash: passwordHash!, siteRole: "rider", disabledAt: null, emailVerifiedAt: new Date() },
        { transaction },
      );
    }
    const membership = await ParkMembership.findOne({ where: { parkId: invitation.parkId, userId: user.id }, transaction });
    if (membership) await membership.update({ role: invitation.role }, { transaction });
    else await ParkMembership.create({ parkId: invitation.parkId, userId: user.id, role: invitation.role }, { transaction });
    await recordAudit({ parkId: invitation.parkId, actorId: user.id, action: "staff.join", subjectType: "invitation", subjectId: invitation.id, data: { role: invitation.role, claimedUnproven: Boolean(existing && !existing.emailVerifiedAt) } }, transaction);
    return { userId: user.id, email: user.email, role: invitation.role, parkSlug: invitation.park?.slug, existingAccount: Boolean(existing?.emailVerifiedAt) };
  });
}
