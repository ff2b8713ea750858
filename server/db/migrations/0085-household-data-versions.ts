import type { QueryInterface } from 'sequelize';

/** The household tables whose rows the cached reads (GET /week, /today, /fridge, /restock, /jars) are made from. */
export const VERSIONED_TABLES = [
  'products',
  'recipes',
  'batches',
  'jars',
  'jar_events',
  'meals',
  'meal_products',
  'plan_entries',
  'pairings',
  'memberships',
  'todos',
];

/**
 * households.data_version changes in the same transaction as any write to the household's data,
 * so an app process can keep a computed answer until the version it reads with the guard moves,
 * whichever process wrote. The bump runs at commit (a deferred trigger), once per transaction and
 * household, so the households row is locked only for that instant.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run('ALTER TABLE households ADD COLUMN data_version bigint NOT NULL DEFAULT 1');
    await run(`
      CREATE FUNCTION bump_household_data_version(household uuid) RETURNS void LANGUAGE sql AS $$
        -- xmin equal to this transaction's id: already bumped (or written) in it.
        UPDATE households SET data_version = data_version + 1 WHERE id = household AND xmin <> pg_current_xact_id()::xid;
      $$`);
    await run(`
      CREATE FUNCTION household_rows_changed() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF TG_OP <> 'INSERT' THEN PERFORM bump_household_data_version(OLD.household_id); END IF;
        IF TG_OP <> 'DELETE' THEN PERFORM bump_household_data_version(NEW.household_id); END IF;
        RETURN NULL;
      END $$`);
    for (const table of VERSIONED_TABLES) {
      await run(`CREATE CONSTRAINT TRIGGER ${table}_data_version AFTER INSERT OR UPDATE OR DELETE ON ${table}
                 DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION household_rows_changed()`);
    }
    // The household's own settings (time zone, week start, best-quality months) change answers too.
    await run(`
      CREATE FUNCTION household_settings_changed() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF NEW.data_version = OLD.data_version AND NEW IS DISTINCT FROM OLD THEN NEW.data_version := OLD.data_version + 1; END IF;
        RETURN NEW;
      END $$`);
    await run(
      'CREATE TRIGGER households_data_version BEFORE UPDATE ON households FOR EACH ROW EXECUTE FUNCTION household_settings_changed()',
    );
    // A member's name shows on the week board of every household they belong to.
    await run(`
      CREATE FUNCTION member_name_changed() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        PERFORM bump_household_data_version(m.household_id) FROM memberships m WHERE m.user_id = NEW.id;
        RETURN NULL;
      END $$`);
    await run(`CREATE CONSTRAINT TRIGGER users_data_version AFTER UPDATE OF name, email ON users
               DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION member_name_changed()`);
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    for (const table of VERSIONED_TABLES) await run(`DROP TRIGGER ${table}_data_version ON ${table}`);
    await run('DROP TRIGGER users_data_version ON users');
    await run('DROP TRIGGER households_data_version ON households');
    await run(
      'DROP FUNCTION member_name_changed(), household_settings_changed(), household_rows_changed(), bump_household_data_version(uuid)',
    );
    await run('ALTER TABLE households DROP COLUMN data_version');
  });
}
