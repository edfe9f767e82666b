import "server-only";
import type { Transaction } from "sequelize";
import { User } from "@/models";

/**
 * Ends every session of an account at once (ASVS v5.0.0 7.4.1, 7.4.3): each session carries the
 * version it was issued under and getActor refuses any other.
 */
export async function endAllSessions(userId: string, transaction?: Transaction) {
  await User.increment("sessionVersion", { by: 1, where: { id: userId }, transaction });
}
