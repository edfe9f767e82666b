import "server-only";
import { Op, type Transaction } from "sequelize";
import { hashToken, newToken } from "@/lib/server/auth/tokens";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";
import { AccountLink } from "@/models";
import type { AccountLinkPurpose } from "@/models/account-link";

/** How long each kind of e-mailed link works (the issue's 24 h for address proof, 1 h for a reset). */
export const LINK_LIFETIME_MS: Record<AccountLinkPurpose, number> = {
  "prove-address": 24 * 3600_000,
  "password-reset": 3600_000,
  "change-email": 24 * 3600_000,
};

const PAGE: Record<AccountLinkPurpose, string> = {
  "prove-address": "/account/prove",
  "password-reset": "/account/reset",
  "change-email": "/account/new-address",
};

/**
 * A fresh single-use link for one account; earlier unused links of the same purpose stop working,
 * so only the newest mail counts. Returns the URL to e-mail (the token is stored only as a hash).
 */
export async function issueLink(userId: string, purpose: AccountLinkPurpose, options: { newEmail?: string; transaction?: Transaction } = {}) {
  const token = newToken();
  const { transaction } = options;
  await AccountLink.update({ usedAt: new Date() }, { where: { userId, purpose, usedAt: null }, transaction });
  await AccountLink.create(
    { userId, purpose, tokenHash: hashToken(token), newEmail: options.newEmail ?? null, expiresAt: new Date(Date.now() + LINK_LIFETIME_MS[purpose]), usedAt: null },
    { transaction },
  );
  return `${env().APP_URL}${PAGE[purpose]}?token=${encodeURIComponent(token)}`;
}

const INVALID: Record<AccountLinkPurpose, string> = {
  "prove-address": "This link is not valid any more (used, expired or altered). Sign in to have a new one sent.",
  "password-reset": "This reset link is not valid any more (used, expired or altered). Ask for a new one.",
  "change-email": "This link is not valid any more (used, expired or altered). Change the address again from your account page.",
};

/** Uses up a link inside the caller's transaction (row-locked, so two clicks cannot both count); 400 if it is not valid. */
export async function consumeLink(token: string, purpose: AccountLinkPurpose, transaction: Transaction) {
  const link = await AccountLink.findOne({
    where: { tokenHash: hashToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: new Date() } },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  if (!link) throw new AppError(400, INVALID[purpose], "token");
  await link.update({ usedAt: new Date() }, { transaction });
  return link;
}
