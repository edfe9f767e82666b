import "server-only";
import { Op } from "sequelize";
import { AppError } from "@/lib/shared/errors";
import { MailSend, RequestCount } from "@/models";

/**
 * Anti-automation for costly functions (ASVS v5.0.0 2.4.1): sign-up and reset requests per
 * address and per e-mail, and mails per recipient. Counted in PostgreSQL, so every app
 * instance sees the same numbers.
 */
export type Limit = { bucket: string; max: number; windowMinutes: number };

/** Per address generous enough for a base lodge's shared Wi-Fi on a Saturday morning; per e-mail tight. */
export const LIMITS = {
  signUpPerAddress: { bucket: "sign-up:address", max: 30, windowMinutes: 60 },
  resendPerAddress: { bucket: "resend:address", max: 30, windowMinutes: 60 },
  signUpPerEmail: { bucket: "sign-up:email", max: 3, windowMinutes: 60 },
  resetPerAddress: { bucket: "reset:address", max: 30, windowMinutes: 60 },
  resetPerEmail: { bucket: "reset:email", max: 3, windowMinutes: 60 },
  resendPerEmail: { bucket: "resend:email", max: 3, windowMinutes: 60 },
} satisfies Record<string, Limit>;

/** Mails of one kind to one address in an hour (subscription confirmations, address proof, resets). */
export const MAILS_PER_RECIPIENT_PER_HOUR = 3;

const since = (minutes: number) => new Date(Date.now() - minutes * 60_000);

/** Counts this request in each bucket; throws 429 (counting nothing) when any is full. */
export async function takeRequestSlot(entries: { limit: Limit; key: string }[]) {
  for (const { limit, key } of entries) {
    const used = await RequestCount.count({ where: { bucket: limit.bucket, key, countedAt: { [Op.gte]: since(limit.windowMinutes) } }, useMaster: true });
    if (used >= limit.max) throw new AppError(429, "Too many requests from here. Wait an hour and try again.");
  }
  await RequestCount.bulkCreate(entries.map(({ limit, key }) => ({ bucket: limit.bucket, key: key.slice(0, 254) })));
}

/**
 * True, and the send recorded, when `recipient` has had fewer than MAILS_PER_RECIPIENT_PER_HOUR
 * mails of this purpose in the last hour. Keyed on the address, not on a row that a user can
 * delete and make again.
 */
export async function claimMailToRecipient(recipient: string, purpose: string): Promise<boolean> {
  const address = recipient.trim().toLowerCase();
  const sent = await MailSend.count({ where: { recipient: address, purpose, sentAt: { [Op.gte]: since(60) } }, useMaster: true });
  if (sent >= MAILS_PER_RECIPIENT_PER_HOUR) return false;
  await MailSend.create({ recipient: address, purpose });
  return true;
}
