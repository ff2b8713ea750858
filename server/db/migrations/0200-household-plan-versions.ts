import type { QueryInterface } from 'sequelize';

/*
 * The week's plan gets a version of its own: households.plan_version moves with every write to plan_entries and
 * their pairings, households.data_version with every other write (migration 0085), so a cached answer that reads no
 * planned meal (the shelf's jars, the products, the to-dos) outlives a meal's servings edited or moved on the board.
 *
 * Each version is bumped once per transaction and household. 0085 knew "already bumped" by the households row's
 * xmin, which one bump can no longer tell the other's from: each now leaves a transaction-local setting instead.
 */

/** The planned meals and the jars' products paired with them: the rows plan_version follows. */
export const PLAN_TABLES = ['plan_entries', 'pairings'];

/** The function that moves one of the household's versions, once per transaction and household. */
const bumpFunction = (kind: 'data' | 'plan', create: string) => `
  ${create} FUNCTION bump_household_${kind}_version(household uuid) RETURNS void LANGUAGE plpgsql AS $$
  BEGIN
    IF current_setting('larderly.${kind}_bumped', true) IS DISTINCT FROM household::text THEN
      UPDATE households SET ${kind}_version = ${kind}_version + 1 WHERE id = household;
      PERFORM set_config('larderly.${kind}_bumped', household::text, true);
    END IF;
  END $$`;

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run('ALTER TABLE households ADD COLUMN plan_version bigint NOT NULL DEFAULT 1');
    await run(bumpFunction('data', 'CREATE OR REPLACE'));
    await run(bumpFunction('plan', 'CREATE'));
    await run(`
      CREATE FUNCTION household_plan_rows_changed() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP <> 'INSERT' THEN PERFORM bump_household_plan_version(OLD.household_id); END IF;
        IF TG_OP <> 'DELETE' THEN PERFORM bump_household_plan_version(NEW.household_id); END IF;
        RETURN NULL;
      END $$`);
    for (const table of PLAN_TABLES) {
      await run(`DROP TRIGGER ${table}_data_version ON ${table}`);
      await run(`CREATE CONSTRAINT TRIGGER ${table}_plan_version AFTER INSERT OR UPDATE OR DELETE ON ${table}
                 DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION household_plan_rows_changed()`);
    }
    // A settings change still moves data_version; the plan's own bump is not one.
    await run(`
      CREATE OR REPLACE FUNCTION household_settings_changed() RETURNS trigger LANGUAGE plpgsql AS $$
      DECLARE
        before households;
      BEGIN
        before := OLD;
        before.plan_version := NEW.plan_version;
        IF NEW.data_version = OLD.data_version AND NEW IS DISTINCT FROM before THEN
          NEW.data_version := OLD.data_version + 1;
        END IF;
        RETURN NEW;
      END $$`);
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    for (const table of PLAN_TABLES) {
      await run(`DROP TRIGGER ${table}_plan_version ON ${table}`);
      await run(`CREATE CONSTRAINT TRIGGER ${table}_data_version AFTER INSERT OR UPDATE OR DELETE ON ${table}
                 DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION household_rows_changed()`);
    }
    await run('DROP FUNCTION household_plan_rows_changed(), bump_household_plan_version(uuid)');
    await run(`
      CREATE OR REPLACE FUNCTION bump_household_data_version(household uuid) RETURNS void LANGUAGE sql AS $$
        UPDATE households SET data_version = data_version + 1 WHERE id = household AND xmin <> pg_current_xact_id()::xid;
      $$`);
    await run(`
      CREATE OR REPLACE FUNCTION household_settings_changed() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF NEW.data_version = OLD.data_version AND NEW IS DISTINCT FROM OLD THEN NEW.data_version := OLD.data_version + 1; END IF;
        RETURN NEW;
      END $$`);
    await run('ALTER TABLE households DROP COLUMN plan_version');
  });
}
