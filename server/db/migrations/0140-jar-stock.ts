import type { QueryInterface } from 'sequelize';

/**
 * Empty jars by size and new lids by mouth, one count per household and kind; every change to a count is a row of
 * jar_stock_changes (why, by how much, by whom). A batch keeps the mouth of its jars, which its reprocess takes lids for.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run(`CREATE TABLE jar_stock (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      household_id uuid NOT NULL REFERENCES households(id) ON DELETE CASCADE,
      item varchar(4) NOT NULL CHECK (item IN ('jar', 'lid')),
      size varchar(20) NOT NULL,
      count integer NOT NULL DEFAULT 0 CHECK (count >= 0),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT jar_stock_one_count UNIQUE (household_id, item, size),
      CONSTRAINT jar_stock_size CHECK (
        (item = 'lid' AND size IN ('regular', 'wide')) OR
        (item = 'jar' AND size IN ('quarter-pint', 'half-pint', 'twelve-ounce', 'pint', 'pint-and-half', 'quart', 'half-gallon'))
      )
    )`);
    await run(`CREATE TABLE jar_stock_changes (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      household_id uuid NOT NULL REFERENCES households(id) ON DELETE CASCADE,
      item varchar(4) NOT NULL CHECK (item IN ('jar', 'lid')),
      size varchar(20) NOT NULL,
      reason varchar(12) NOT NULL CHECK (reason IN ('record', 'finish', 'discard', 'reprocess', 'correction', 'undo')),
      delta integer NOT NULL,
      count_after integer NOT NULL CHECK (count_after >= 0),
      short integer NOT NULL DEFAULT 0 CHECK (short >= 0),
      note varchar(200) NOT NULL DEFAULT '',
      user_id uuid REFERENCES users(id) ON DELETE SET NULL,
      batch_id uuid REFERENCES batches(id) ON DELETE SET NULL,
      jar_event_id uuid REFERENCES jar_events(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await run('CREATE INDEX jar_stock_changes_household ON jar_stock_changes (household_id, created_at DESC)');
    await run('CREATE INDEX jar_stock_changes_user ON jar_stock_changes (user_id)');
    await run('CREATE INDEX jar_stock_changes_batch ON jar_stock_changes (batch_id)');
    await run('CREATE INDEX jar_stock_changes_jar_event ON jar_stock_changes (jar_event_id)');
    await run(`CREATE CONSTRAINT TRIGGER jar_stock_data_version AFTER INSERT OR UPDATE OR DELETE ON jar_stock
               DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION household_rows_changed()`);
    // Null for batches recorded before stock was kept: their jars take the size's usual mouth.
    await run(`ALTER TABLE batches ADD COLUMN mouth varchar(7) CHECK (mouth IN ('regular', 'wide'))`);
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run('ALTER TABLE batches DROP COLUMN mouth');
    await run('DROP TABLE jar_stock_changes');
    await run('DROP TABLE jar_stock');
  });
}
