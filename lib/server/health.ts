import "server-only";
import { sequelize } from "@/models";

/** True when PostgreSQL answers a trivial query (the health route's database check). */
export async function databaseReachable(): Promise<boolean> {
  try {
    await sequelize.query("SELECT 1");
    return true;
  } catch {
    return false;
  }
}
