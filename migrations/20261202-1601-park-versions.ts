import { DataTypes, type QueryInterface } from "sequelize";

/**
 * One version number per park, raised by PostgreSQL itself whenever a row that the board or the
 * map shows changes: the park, its trails, reports, park states, hazards, hazard photos and trail
 * features. Every app instance compares its cached answer's version with this row (one indexed
 * read on the primary), so a cached board never outlives a write, whichever instance or script
 * made it. The triggers are deferred to commit: the version row is locked last, after every
 * other row the transaction touched, so two writers cannot deadlock on it.
 * No foreign key: a deleted park's row is harmless, and the delete trigger must not fail on it.
 */
const WATCHED: Array<{ table: string; args: string; events: string }> = [
  { table: "parks", args: "'id'", events: "UPDATE" },
  { table: "trails", args: "'park_id'", events: "INSERT OR UPDATE OR DELETE" },
  { table: "trail_reports", args: "'park_id'", events: "INSERT OR UPDATE OR DELETE" },
  { table: "park_states", args: "'park_id'", events: "INSERT OR UPDATE OR DELETE" },
  { table: "hazards", args: "'park_id'", events: "INSERT OR UPDATE OR DELETE" },
  { table: "photos", args: "'hazard_id', 'hazards'", events: "INSERT OR UPDATE OR DELETE" },
  { table: "trail_features", args: "'trail_id', 'trails'", events: "INSERT OR UPDATE OR DELETE" },
];

export const BUMP_FUNCTION = `
CREATE OR REPLACE FUNCTION loamcast_bump_park_version() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  ref text;
  park uuid;
BEGIN
  -- TG_ARGV[0]: the column naming the park (or the row that leads to it); TG_ARGV[1]: that row's table.
  FOR ref IN
    SELECT DISTINCT r FROM (VALUES
      (CASE WHEN TG_OP <> 'INSERT' THEN to_jsonb(OLD) ->> TG_ARGV[0] END),
      (CASE WHEN TG_OP <> 'DELETE' THEN to_jsonb(NEW) ->> TG_ARGV[0] END)) AS refs(r)
    WHERE r IS NOT NULL
  LOOP
    IF TG_NARGS > 1 THEN
      EXECUTE format('SELECT park_id FROM %I WHERE id = $1', TG_ARGV[1]) INTO park USING ref::uuid;
    ELSE
      park := ref::uuid;
    END IF;
    IF park IS NOT NULL THEN
      INSERT INTO park_versions (park_id, version, changed_at) VALUES (park, 1, now())
      ON CONFLICT (park_id) DO UPDATE SET version = park_versions.version + 1, changed_at = now();
    END IF;
  END LOOP;
  RETURN NULL;
END $$`;

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      "park_versions",
      {
        park_id: { type: DataTypes.UUID, primaryKey: true },
        version: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
        changed_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.sequelize.query(BUMP_FUNCTION, { transaction });
    for (const { table, args, events } of WATCHED) {
      await qi.sequelize.query(
        `CREATE CONSTRAINT TRIGGER ${table}_bump_park_version AFTER ${events} ON ${table}
         DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION loamcast_bump_park_version(${args})`,
        { transaction },
      );
    }
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    for (const { table } of WATCHED) await qi.sequelize.query(`DROP TRIGGER IF EXISTS ${table}_bump_park_version ON ${table}`, { transaction });
    await qi.sequelize.query("DROP FUNCTION IF EXISTS loamcast_bump_park_version()", { transaction });
    await qi.dropTable("park_versions", { transaction });
  });
}
