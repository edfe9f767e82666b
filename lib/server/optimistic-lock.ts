import "server-only";
import { OptimisticLockError } from "sequelize";

/**
 * Runs a write on a versioned row (Sequelize `version: true`). When the version check finds that
 * someone saved first, the write changed nothing and the caller gets `stale()` — typically a 409
 * carrying the current values, read again from the primary — instead of Sequelize's error.
 */
export async function unlessStale<T>(write: () => Promise<T>, stale: () => Error | Promise<Error>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (error instanceof OptimisticLockError) throw await stale();
    throw error;
  }
}
