import "server-only";
import { recordAccountEvent } from "@/lib/audit/account-events";
import { consumeLink, issueLink } from "@/lib/accounts/account-links";
import { sendAccountMail } from "@/lib/accounts/account-mail";
import { hashPassword, passwordSchema, verifyAgainstNothing } from "@/lib/server/auth/password";
import { endAllSessions } from "@/lib/server/auth/sessions";
import { LIMITS, takeRequestSlot } from "@/lib/server/auth/throttle";
import { AppError } from "@/lib/shared/errors";
import { User, sequelize } from "@/models";
import { emailOnlyFields, resetConfirmFields } from "./pure/schemas";

/** The one answer to a reset request, known address or not (ASVS v5.0.0 6.3.8). */
export const RESET_REQUEST_ANSWER = { message: "If an account uses that address, a link to choose a new password is on its way. It works for 1 hour." } as const;

/** "Forgot your password?": mails a single-use link valid 1 hour; answers the same for any address. */
export async function requestPasswordReset(input: unknown, from = "unknown") {
  const { email } = emailOnlyFields.parse(input);
  await takeRequestSlot([
    { limit: LIMITS.resetPerAddress, key: from },
    { limit: LIMITS.resetPerEmail, key: email },
  ]);
  const user = await User.findOne({ where: { email }, useMaster: true });
  if (user && !user.disabledAt) {
    const link = await issueLink(user.id, "password-reset");
    await sendAccountMail(email, "password-reset", { link });
    await recordAccountEvent("account.password-reset.requested", user.id, { from });
  } else {
    await verifyAgainstNothing(email); // about the same work either way
  }
  return RESET_REQUEST_ANSWER;
}

/**
 * A new password by the link: checked first, written in one transaction with the link's use, so a
 * refused password leaves both the old password and the link working. Every session ends, and
 * the address counts as proven (only its owner could open the link).
 */
export async function confirmPasswordReset(input: unknown) {
  const fields = resetConfirmFields.parse(input);
  const password = passwordSchema.safeParse(fields.password);
  if (!password.success) throw new AppError(400, password.error.issues[0].message, "password");
  const passwordHash = await hashPassword(password.data);
  return sequelize.transaction(async (transaction) => {
    const link = await consumeLink(fields.token, "password-reset", transaction);
    const user = await User.findByPk(link.userId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!user || user.disabledAt) throw new AppError(400, "This account cannot be used.", "token");
    await user.update({ passwordHash, emailVerifiedAt: user.emailVerifiedAt ?? new Date() }, { transaction });
    await endAllSessions(user.id, transaction);
    await recordAccountEvent("account.password-reset", user.id, {}, transaction);
    return { message: "Password changed. Sign in with the new one; every other device was signed out." };
  });
}
