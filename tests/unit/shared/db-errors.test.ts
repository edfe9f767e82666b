import { ConnectionAcquireTimeoutError, ConnectionError, ConnectionRefusedError, DatabaseError, HostNotFoundError, UniqueConstraintError } from "sequelize";
import { describe, expect, it } from "vitest";
import { errorResponse } from "@/lib/server/api/errors";
import { isDatabaseUnavailable } from "@/lib/shared/db-errors";

/** What node-postgres hands Sequelize: an Error with the server's SQLSTATE in `code` (or none). */
const pgError = (message: string, code?: string) => Object.assign(new Error(message), code ? { code } : {}, { sql: "SELECT 1" });
const dbError = (message: string, code?: string) => new DatabaseError(pgError(message, code) as Error & { sql: string; parameters: object });

// The errors below are the ones seen when PostgreSQL was restarted under load
// (tests/integration/proof/postgres-restart.test.ts prints them); SQLSTATEs from the
// PostgreSQL 15 documentation, Appendix A "PostgreSQL Error Codes".
describe("the database being away is told apart from other errors", () => {
  it.each([
    ["a refused connection", new ConnectionRefusedError(pgError("connect ECONNREFUSED 127.0.0.1:55433", "ECONNREFUSED"))],
    ["a reset while connecting", new ConnectionError(pgError("read ECONNRESET", "ECONNRESET"))],
    ["no free connection in time", new ConnectionAcquireTimeoutError(new Error("Operation timeout"))],
    ["an unknown host", new HostNotFoundError(pgError("getaddrinfo ENOTFOUND db", "ENOTFOUND"))],
    ["57P01 admin_shutdown", dbError("terminating connection due to administrator command", "57P01")],
    ["57P03 cannot_connect_now", dbError("the database system is starting up", "57P03")],
    ["08006 connection_failure", dbError("connection failure", "08006")],
    ["a connection dropped under a query", dbError("Connection terminated unexpectedly")],
    ["a query on a connection that already failed", dbError("Client has encountered a connection error and is not queryable")],
  ])("%s → 503 in the API's error shape, with Retry-After", async (_label, error) => {
    expect(isDatabaseUnavailable(error)).toBe(true);
    const response = errorResponse(error);
    expect(response.status).toBe(503);
    expect(response.headers.get("retry-after")).toBe("5");
    expect(await response.json()).toEqual({ error: { message: "The service is briefly unavailable. Try again in a moment." } });
  });

  it.each([
    ["division by zero (22012)", dbError("division by zero", "22012")],
    ["a transaction already aborted (25P02)", dbError("current transaction is aborted, commands ignored until end of transaction block", "25P02")],
    ["a unique violation", new UniqueConstraintError({ message: "duplicate key value violates unique constraint" })],
    ["a plain error", new Error("boom")],
    ["not an error at all", "boom"],
  ])("%s is not an outage (500)", (_label, error) => {
    expect(isDatabaseUnavailable(error)).toBe(false);
    expect(errorResponse(error).status).toBe(500);
  });
});
