import pg from "pg";
import { DEFAULT_DATABASE_URL } from "./database-url";
import { ConnectionRefusedError, ConnectionTimedOutError, HostNotReachableError, Sequelize, type Options } from "sequelize";

/**
 * The one Sequelize instance. Cached on globalThis so hot reload in development
 * does not open a new pool on every edit.
 */
const globalForDb = globalThis as unknown as { loamcastSequelize?: Sequelize };

const asConfig = (url: string) => {
  const u = new URL(url);
  return {
    host: u.hostname,
    port: Number(u.port || 5432),
    username: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.slice(1),
  };
};

/**
 * Which failed queries Sequelize may try again (its `retry.match`): only those that never reached
 * the server, because the connection could not be opened. A query that did reach it may have
 * done its work, and inside a transaction a retry would only hide the first error behind "current
 * transaction is aborted". (A `retry` option without `match` retries every error.)
 */
export const RETRY_WHEN_NOT_SENT = [ConnectionRefusedError, ConnectionTimedOutError, HostNotReachableError, /the database system is (starting up|shutting down|in recovery mode)/];

export const replicaUrlsFrom = (list: string | undefined) => (list ?? "").split(",").map((s) => s.trim()).filter(Boolean);

/**
 * A Sequelize for a primary and any number of read replicas. With replicas, Sequelize sends a
 * SELECT outside a transaction to a replica (round robin) and everything else to the primary:
 * writes, every query of a transaction, and finds with `useMaster: true` (docs/operations.md, Scaling out).
 * The pool drops a connection as soon as it reports an error, so a restarted server is simply
 * reconnected to; a query is retried only when its connection could not be opened.
 */
export function sequelizeFor(primaryUrl: string, replicaUrls: string[] = []): Sequelize {
  const common: Options = {
    dialect: "postgres",
    dialectModule: pg,
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 20_000 },
    retry: { max: 3, match: RETRY_WHEN_NOT_SENT },
  };
  if (replicaUrls.length === 0) return new Sequelize(primaryUrl, common);
  const primary = asConfig(primaryUrl);
  return new Sequelize(primary.database, primary.username, primary.password, {
    ...common,
    replication: { write: primary, read: replicaUrls.map(asConfig) },
  });
}


function createSequelize(): Sequelize {
  const url = process.env.DATABASE_URL || DEFAULT_DATABASE_URL;
  return sequelizeFor(url, replicaUrlsFrom(process.env.DATABASE_REPLICA_URLS));
}

export const sequelize: Sequelize = globalForDb.loamcastSequelize ?? createSequelize();
if (process.env.NODE_ENV !== "production") globalForDb.loamcastSequelize = sequelize;

type RawConnection = { query(sql: string, params: unknown[]): Promise<{ rows: unknown[] }> };
type PoolAccess = { getConnection(options: { type: "write"; useMaster: true }): Promise<RawConnection>; releaseConnection(connection: RawConnection): void };

/**
 * Rows of one read on the primary, through Sequelize's own pool but past its query machinery
 * (options, hooks, result building): for the per-park version check every cached request makes
 * (lib/parks/park-cache.ts), where that machinery cost more CPU than the query itself. Errors are
 * node-postgres's own; lib/shared/db-errors.ts recognises the ones that mean "database away".
 */
export async function primaryRows<T>(sql: string, params: unknown[]): Promise<T[]> {
  const pool = sequelize.connectionManager as unknown as PoolAccess;
  const connection = await pool.getConnection({ type: "write", useMaster: true });
  try {
    return (await connection.query(sql, params)).rows as T[];
  } finally {
    pool.releaseConnection(connection);
  }
}
