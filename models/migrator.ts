import path from "node:path";
import { SequelizeStorage, Umzug } from "umzug";
import type { QueryInterface, Sequelize } from "sequelize";

/** Migrations and seeders are both run by umzug; each keeps its own ledger table. */
export function migrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: { glob: path.join(process.cwd(), "migrations/*.ts").replaceAll("\\", "/") },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, modelName: "SchemaMigration", tableName: "schema_migrations" }),
    logger: undefined,
  });
}

export function seeder(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: { glob: path.join(process.cwd(), "seeders/*.ts").replaceAll("\\", "/") },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, modelName: "SeedRun", tableName: "seed_runs" }),
    logger: undefined,
  });
}
