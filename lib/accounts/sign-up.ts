import "server-only";
import { UniqueConstraintError } from "sequelize";
import { recordAccountEvent } from "@/lib/audit/account-events";
import { sendAccountMail } from "@/lib/accounts/account-mail";
import { consumeLink, issueLink } from "@/lib/accounts/account-links";
import { hashPassword, passwordSchema } from "@/lib/server/auth/password";
import { LIMITS, takeRequestSlot } from "@/lib/server/auth/throttle";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";
import { User, sequelize } from "@/models";
import { emailOnlyFields, signUpFields, tokenFields } from "./pure/schemas";

/** The one answer to every accepted sign-up, whether or not the address had an account (ASVS v5.0.0 6.3.8). */
export const SIGN_UP_ANSWER = { message: "Check your inbox: we sent a link to finish creating your account. It works for 24 hours." } as const;
export const RESEND_ANSWER = { message: "If that address has an account waiting for proof, a new link is on its way." } as const;

/**
 * Rider self sign-up with a proven address. The account cannot sign in until the e-mailed link is
 * opened. A taken address gets the same answer and its owner a note instead of a link. An address
 * whose earlier sign-up was never proven is taken over by the newest sign-up (new name, new
 * password): whoever opens the link proves the mailbox, and the earlier claimant keeps nothing.
 */
export async function signUpRider(input: unknown, from = "unknown") {
  const fields = signUpFields.parse(input);
  const password = passwordSchema.safeParse(fields.password);
  if (!password.success) throw new AppError(400, password.error.issues[0].message, "password");
  await takeRequestSlot([
    { limit: LIMITS.signUpPerAddress, key: from },
    { limit: LIMITS.signUpPerEmail, key: fields.email },
  ]);
  const passwordHash = await hashPassword(password.data); // always: the same cost whether or not the address is known
  const outcome = await sequelize.transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: fields.email }, lock: transaction.LOCK.UPDATE, transaction });
    if (existing?.emailVerifiedAt) return { kind: "taken" as const, userId: existing.id };
    const user = existing
      ? await existing.update({ name: fields.name, passwordHash, sessionVersion: existing.sessionVersion + 1 }, { transaction })
      : await User.create({ email: fields.email, name: fields.name, passwordHash, siteRole: "rider", disabledAt: null, emailVerifiedAt: null }, { transaction });
    await recordAccountEvent(existing ? "account.sign-up.replaced" : "account.sign-up", user.id, { from }, transaction);
    return { kind: "new" as const, userId: user.id, link: await issueLink(user.id, "prove-address", { transaction }) };
  }).catch((error) => {
    // Two sign-ups for one new address at the same moment: the second answers as the first did.
    if (error instanceof UniqueConstraintError) return { kind: "race" as const };
    throw error;
  });
  if (outcome.kind === "new") await sendAccountMail(fields.email, "prove-address", { link: outcome.link, name: fields.name });
  if (outcome.kind === "taken") await sendAccountMail(fields.email, "already-registered", { link: `${appUrl()}/account/forgot` });
  return SIGN_UP_ANSWER;
}

/** "Send the link again": a new proof link for an unproven account; the same answer for any address. */
export async function resendProof(input: unknown, from = "unknown") {
  const { email } = emailOnlyFields.parse(input);
  await takeRequestSlot([
    { limit: LIMITS.resendPerAddress, key: from },
    { limit: LIMITS.resendPerEmail, key: email },
  ]);
  const user = await User.findOne({ where: { email }, useMaster: true });
  if (user && !user.emailVerifiedAt && !user.disabledAt) {
    const link = await issueLink(user.id, "prove-address");
    await sendAccountMail(email, "prove-address", { link, name: user.name });
  }
  return RESEND_ANSWER;
}

/** Opening the link proves the address: the account may sign in from now on. */
export async function proveAddress(input: unknown) {
  const { token } = tokenFields.parse(input);
  return sequelize.transaction(async (transaction) => {
    const link = await consumeLink(token, "prove-address", transaction);
    await User.update({ emailVerifiedAt: new Date() }, { where: { id: link.userId }, transaction });
    await recordAccountEvent("account.address-proven", link.userId, {}, transaction);
    return { message: "Address proven. You can sign in now." };
  });
}

const appUrl = () => env().APP_URL;
