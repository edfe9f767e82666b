import "server-only";
import type { Transaction } from "sequelize";
import type { AppError } from "@/lib/shared/errors";
import { sequelize } from "@/models";

export const HOUR_MS = 60 * 60 * 1000;

/** How much of a limit the last window used: how many, and the oldest (when it leaves the window). */
export type WindowUse = { count: number; oldest: Date | null };

/**
 * Anti-automation (ASVS v5.0.0 2.4.1) counted in PostgreSQL, so it holds across app instances.
 * Callers sharing `key` queue behind each other for the rest of the transaction (an advisory lock),
 * so parallel requests cannot both slip under the limit; then `used` counts the window and, at the
 * limit, `refuse` says no, told how many minutes until a slot frees.
 */
export async function claimWithinLimit(
  transaction: Transaction,
  options: { key: string; limit: number; windowMs?: number; now?: Date; used: (since: Date) => Promise<WindowUse>; refuse: (use: WindowUse & { retryInMinutes: number }) => AppError },
): Promise<void> {
  const { key, limit, windowMs = HOUR_MS, now = new Date() } = options;
  await sequelize.query("SELECT pg_advisory_xact_lock(hashtext($1))", { bind: [key], transaction });
  const use = await options.used(new Date(now.getTime() - windowMs));
  if (use.count < limit) return;
  const freesAt = (use.oldest?.getTime() ?? now.getTime()) + windowMs;
  throw options.refuse({ ...use, retryInMinutes: Math.max(1, Math.ceil((freesAt - now.getTime()) / 60_000)) });
}
