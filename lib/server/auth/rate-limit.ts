import "server-only";
import { Op } from "sequelize";
import { SignInAttempt } from "@/models";

/**
 * Sign-in throttling (ASVS v5.0.0 6.1.1, 6.3.1). Failures are counted per (account, address)
 * and per address, never per account alone, so an attacker elsewhere cannot lock a rider out.
 */
export const SIGN_IN_WINDOW_MINUTES = 15;
export const MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS = 5;
export const MAX_FAILURES_PER_ADDRESS = 30;

export async function signInBlocked(email: string, ip: string): Promise<boolean> {
  const since = new Date(Date.now() - SIGN_IN_WINDOW_MINUTES * 60_000);
  const [pair, address] = await Promise.all([
    // From the primary: a replica a moment behind would miss the latest failures.
    SignInAttempt.count({ where: { email, ip, succeeded: false, attemptedAt: { [Op.gte]: since } }, useMaster: true }),
    SignInAttempt.count({ where: { ip, succeeded: false, attemptedAt: { [Op.gte]: since } }, useMaster: true }),
  ]);
  return pair >= MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS || address >= MAX_FAILURES_PER_ADDRESS;
}

export async function recordSignIn(email: string, ip: string, succeeded: boolean) {
  await SignInAttempt.create({ email, ip, succeeded });
  if (succeeded) {
    // A success clears this pair's failures so a rider who mistyped is not held back later.
    await SignInAttempt.destroy({ where: { email, ip, succeeded: false } });
  }
}
