/**
 * Database lifecycle: `tsx scripts/db.ts <prepare|migrate|seed|reset|create>`.
 * prepare = create the database if missing, migrate, seed the demo park if there are no users yet.
 */
import pg from "pg";
import { env } from "@/lib/server/env";
import { migrator, seeder } from "@/models/migrator";

async function createDatabaseIfMissing(dropFirst = false) {
  const url = new URL(env().DATABASE_URL);
  const name = url.pathname.slice(1);
  if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`Refusing odd database name "${name}"`);
  url.pathname = "/postgres";
  const client = new pg.Client({ connectionString: url.toString() });
  await client.connect();
  try {
    if (dropFirst) await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    const found = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [name]);
    if (found.rowCount === 0) {
      await client.query(`CREATE DATABASE ${name}`);
      console.log(`› Created database ${name}`);
    }
  } finally {
    await client.end();
  }
}

async function main() {
  const command = process.argv[2];
  if (command === "create" || command === "prepare" || command === "fresh") {
    await createDatabaseIfMissing(command === "fresh");
  }
  if (command === "reset") await createDatabaseIfMissing(true);

  const { sequelize, User } = await import("@/models");
  try {
    if (["migrate", "prepare", "reset", "fresh"].includes(command)) {
      const done = await migrator(sequelize).up();
      console.log(`› Migrations: ${done.length} applied`);
    }
    if (command === "seed" || command === "reset" || command === "fresh") {
      const done = await seeder(sequelize).up();
      console.log(`› Seeders: ${done.length} applied`);
    } else if (command === "prepare") {
      if ((await User.count()) === 0) {
        const done = await seeder(sequelize).up();
        console.log(`› Empty database: demo park seeded (${done.length} seeders)`);
      } else {
        console.log("› Database has data: not seeding");
      }
    }
    if (!["create", "prepare", "migrate", "seed", "reset", "fresh"].includes(command)) {
      throw new Error("usage: tsx scripts/db.ts <prepare|migrate|seed|reset|fresh|create>");
    }
  } finally {
    await sequelize.close();
  }
}

main().catch((error) => {
  console.error(`✗ ${error instanceof Error ? error.message : error}`);
  process.exit(1);
});
