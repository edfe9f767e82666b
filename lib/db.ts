import pg from "pg";
import { Sequelize } from "sequelize";
import { env } from "./env";

/**
 * The one Sequelize instance. Cached on globalThis so hot reload in development
 * does not open a new pool on every edit.
 */
const globalForDb = globalThis as unknown as { loamcastSequelize?: Sequelize };

function createSequelize(): Sequelize {
  const { DATABASE_URL, DATABASE_REPLICA_URLS } = env();
  const replicas = (DATABASE_REPLICA_URLS ?? "").split(",").map((s) => s.trim()).filter(Boolean);
  const common = {
    dialect: "postgres" as const,
    dialectModule: pg,
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 20_000 },
    retry: { max: 3 },
  };
  if (replicas.length === 0) return new Sequelize(DATABASE_URL, common);
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
  const primary = asConfig(DATABASE_URL);
  return new Sequelize(primary.database, primary.username, primary.password, {
    ...common,
    replication: { write: primary, read: replicas.map(asConfig) },
  });
}

export const sequelize: Sequelize = globalForDb.loamcastSequelize ?? createSequelize();
if (process.env.NODE_ENV !== "production") globalForDb.loamcastSequelize = sequelize;
