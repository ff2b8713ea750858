import type { QueryInterface } from 'sequelize';

/**
 * Shelf places: where a household keeps its jars ("Pantry", "Cellar shelf 2"). A product may name the place its
 * batches usually go, each jar knows its place, and a move is kept in the jar's history with the names it moved between.
 * GET /jars, /today and /fridge show a jar's place name, so renaming or removing a place bumps the data version.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run(`CREATE TABLE places (
      id uuid PRIMARY KEY,
      household_id uuid NOT NULL REFERENCES households(id) ON DELETE CASCADE,
      name varchar(60) NOT NULL CHECK (length(btrim(name)) > 0),
      created_at timestamptz NOT NULL,
      updated_at timestamptz NOT NULL
    )`);
    await run('CREATE INDEX places_household_id ON places (household_id)');
    await run('CREATE UNIQUE INDEX places_household_name ON places (household_id, lower(name))');
    await run(`CREATE CONSTRAINT TRIGGER places_data_version AFTER INSERT OR UPDATE OR DELETE ON places
               DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION household_rows_changed()`);

    await run('ALTER TABLE products ADD COLUMN default_place_id uuid REFERENCES places(id) ON DELETE SET NULL');
    await run('CREATE INDEX products_default_place_id ON products (default_place_id)');
    // The service moves a place's jars before it removes it; SET NULL covers finished and discarded jars.
    await run('ALTER TABLE jars ADD COLUMN place_id uuid REFERENCES places(id) ON DELETE SET NULL');
    await run('CREATE INDEX jars_place_id ON jars (place_id)');
    // A move's place names, kept as words so the history still reads after a place is renamed or removed.
    await run('ALTER TABLE jar_events ADD COLUMN place_move jsonb');
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run(`DELETE FROM jar_events WHERE kind = 'moved'`);
    await run('ALTER TABLE jar_events DROP COLUMN place_move');
    await run('ALTER TABLE jars DROP COLUMN place_id');
    await run('ALTER TABLE products DROP COLUMN default_place_id');
    await run('DROP TABLE places');
  });
}
