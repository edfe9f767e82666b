/**
 * Telling "the database is away" (a restart, a failover, the network) from every other error.
 * Pure and import-free, so every layer can use it. Checked by
 * name and SQLSTATE rather than instanceof, so it also holds for another copy of the driver.
 */

/** Sequelize's ConnectionError and its subclasses: the connection could not be opened or acquired. */
const CONNECTION_ERROR_NAMES = new Set([
  "SequelizeConnectionError",
  "SequelizeConnectionRefusedError",
  "SequelizeConnectionTimedOutError",
  "SequelizeConnectionAcquireTimeoutError",
  "SequelizeHostNotFoundError",
  "SequelizeHostNotReachableError",
  "SequelizeInvalidConnectionError",
  "SequelizeAccessDeniedError",
]);

/**
 * SQLSTATE classes and codes (PostgreSQL 15 documentation, Appendix A): 08 connection exception;
 * 57P01 admin_shutdown ("terminating connection due to administrator command"), 57P02
 * crash_shutdown, 57P03 cannot_connect_now; 53300 too_many_connections.
 */
const UNAVAILABLE_SQLSTATE = /^(08...|57P0[1-3]|53300)$/;

/** What node-postgres says when a connection died under a query (it sets no SQLSTATE). */
const DROPPED_CONNECTION = /^(Connection terminated|Client has encountered a connection error and is not queryable|Client was closed and is not queryable)/;

type MaybeDbError = { name?: unknown; code?: unknown; message?: unknown; parent?: { code?: unknown; message?: unknown } };

/** True when the error means PostgreSQL could not be reached or dropped the connection. */
export function isDatabaseUnavailable(error: unknown): boolean {
  if (!error || typeof error !== "object") return false;
  const e = error as MaybeDbError;
  if (typeof e.name === "string" && CONNECTION_ERROR_NAMES.has(e.name)) return true;
  const code = e.parent?.code ?? e.code;
  if (typeof code === "string" && UNAVAILABLE_SQLSTATE.test(code)) return true;
  const message = e.parent?.message ?? e.message;
  return typeof message === "string" && DROPPED_CONNECTION.test(message);
}
