import "server-only";
import { recordAccountEvent } from "@/lib/audit/account-events";
import { consumeLink, issueLink } from "@/lib/accounts/account-links";
import { sendAccountMail } from "@/lib/accounts/account-mail";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { hashPassword, passwordSchema, verifyPassword } from "@/lib/server/auth/password";
import { endAllSessions } from "@/lib/server/auth/sessions";
import { AppError } from "@/lib/shared/errors";
import { Park, ParkMembership, PushSubscription, RideLog, Setup, Subscription, User, sequelize } from "@/models";
import { changeEmailFields, changePasswordFields, passwordOnlyFields, tokenFields } from "./pure/schemas";

/**
 * The signed-in person's own account: password, address, sessions, their data and deleting it.
 * Each sensitive change asks for the current password again (ASVS v5.0.0 6.2.3, 7.5.1).
 */
async function ownAccount(actor: Actor | null, password: string) {
  authorize(actor, "own:account", { ownerId: actor?.id });
  const user = await User.findByPk(actor.id, { useMaster: true });
  if (!user || !(await verifyPassword(password, user.passwordHash))) {
    await recordAccountEvent("account.reauth.failed", actor.id);
    throw new AppError(400, "That is not your current password.", "password");
  }
  return user;
}

export async function changePassword(actor: Actor | null, input: unknown) {
  const fields = changePasswordFields.parse(input);
  const next = passwordSchema.safeParse(fields.newPassword);
  if (!next.success) throw new AppError(400, next.error.issues[0].message, "newPassword");
  const user = await ownAccount(actor, fields.currentPassword).catch(relabel("currentPassword"));
  const passwordHash = await hashPassword(next.data);
  await sequelize.transaction(async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    await endAllSessions(user.id, transaction);
    await recordAccountEvent("account.password-changed", user.id, {}, transaction);
  });
  await sendAccountMail(user.email, "password-changed");
  return { message: "Password changed. Every device, this one included, was signed out: sign in with the new password." };
}

/** Ends every session of the account, this one included. */
export async function signOutEverywhere(actor: Actor | null, input: unknown) {
  const { password } = passwordOnlyFields.parse(input);
  const user = await ownAccount(actor, password);
  await endAllSessions(user.id);
  await recordAccountEvent("account.signed-out-everywhere", user.id);
}

/** A new address counts once the link sent there is opened; the old address hears of it at once. */
export async function requestEmailChange(actor: Actor | null, input: unknown) {
  const fields = changeEmailFields.parse(input);
  const user = await ownAccount(actor, fields.password);
  if (fields.newEmail === user.email) throw new AppError(400, "That is already your address.", "newEmail");
  const link = await issueLink(user.id, "change-email", { newEmail: fields.newEmail });
  // The same answer whether the new address is taken: that is found out when the link is opened.
  await sendAccountMail(fields.newEmail, "change-email", { link });
  await sendAccountMail(user.email, "email-changed-notice", { newEmail: fields.newEmail });
  await recordAccountEvent("account.email-change.requested", user.id);
  return { message: `Open the link we sent to ${fields.newEmail} to finish the change.` };
}

export async function confirmEmailChange(input: unknown) {
  const { token } = tokenFields.parse(input);
  return sequelize.transaction(async (transaction) => {
    const link = await consumeLink(token, "change-email", transaction);
    const taken = await User.count({ where: { email: link.newEmail! }, transaction });
    if (taken > 0) throw new AppError(409, "Another account uses that address now. Nothing was changed.", "token");
    await User.update({ email: link.newEmail!, emailVerifiedAt: new Date() }, { where: { id: link.userId }, transaction });
    await endAllSessions(link.userId, transaction);
    await recordAccountEvent("account.email-changed", link.userId, {}, transaction);
    return { message: "Address changed. Sign in with the new address." };
  });
}

/** Everything the account holds about its owner, for "download my data" (GDPR art. 20 portability). */
export async function exportMyData(actor: Actor | null) {
  authorize(actor, "own:account", { ownerId: actor?.id });
  const where = { userId: actor.id };
  const [user, setups, rideLogs, subscriptions, browserAlerts, memberships] = await Promise.all([
    User.findByPk(actor.id, { attributes: ["id", "email", "name", "siteRole", "units", "emailVerifiedAt", "createdAt", "updatedAt"] }),
    Setup.findAll({ where, order: [["createdAt", "ASC"]] }),
    RideLog.findAll({ where, order: [["createdAt", "ASC"]] }),
    Subscription.findAll({ where, include: [{ model: Park, as: "park", attributes: ["slug", "name"] }], order: [["createdAt", "ASC"]] }),
    // The browser's keys are left out: they are its secret with the push service, of no use elsewhere.
    PushSubscription.findAll({ where, attributes: ["id", "parkId", "endpoint", "trailIds", "kinds", "createdAt"], order: [["createdAt", "ASC"]] }),
    ParkMembership.findAll({ where, attributes: ["parkId", "role", "createdAt"] }),
  ]);
  return {
    exportedAt: new Date().toISOString(),
    account: user?.toJSON(),
    parkRoles: memberships.map((m) => m.toJSON()),
    setups: setups.map((s) => s.toJSON()),
    rideLogs: rideLogs.map((r) => r.toJSON()),
    subscriptions: subscriptions.map((s) => s.toJSON()),
    browserAlerts: browserAlerts.map((b) => b.toJSON()),
  };
}

/**
 * Deletes the account: setups, ride logs, subscriptions, browser alerts and memberships go with it (foreign keys
 * cascade); reports and audit entries written as staff stay, their author shown as a former staff
 * member. The last manager of a park must hand over first (409).
 */
export async function deleteMyAccount(actor: Actor | null, input: unknown) {
  const { password } = passwordOnlyFields.parse(input);
  const user = await ownAccount(actor, password);
  await sequelize.transaction(async (transaction) => {
    const managed = await ParkMembership.findAll({ where: { userId: user.id, role: "manager" }, include: [{ model: Park, as: "park", attributes: ["name"] }], transaction });
    for (const membership of managed) {
      const others = await ParkMembership.count({ where: { parkId: membership.parkId, role: "manager" }, transaction });
      if (others <= 1) {
        const name = (membership as ParkMembership & { park?: Park }).park?.name ?? "a park";
        throw new AppError(409, `You are the last manager of ${name}. Make another team member manager before you delete your account.`);
      }
    }
    await recordAccountEvent("account.deleted", null, { userId: user.id }, transaction);
    await user.destroy({ transaction });
  });
}

const relabel = (field: string) => (error: unknown) => {
  if (error instanceof AppError && error.status === 400) throw new AppError(400, error.message, field);
  throw error;
};
