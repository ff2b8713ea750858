import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The seal check: each processing of a batch's jars (the first, and a reprocess of jars that did not seal),
 * the jars whose seals are still to be checked, and a reminder claim per processing and person.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    const run = (sql: string) => qi.sequelize.query(sql, t);
    await qi.createTable(
      'batch_processings',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'households', key: 'id' },
          onDelete: 'CASCADE',
        },
        batch_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'batches', key: 'id' },
          onDelete: 'CASCADE',
        },
        number: { type: DataTypes.INTEGER, allowNull: false },
        processed_at: { type: DataTypes.DATE, allowNull: false },
        method: { type: DataTypes.STRING(20), allowNull: false },
        altitude_ft: { type: DataTypes.INTEGER, allowNull: false },
        minutes: { type: DataTypes.INTEGER, allowNull: true },
        pressure_psi: { type: DataTypes.INTEGER, allowNull: true },
        jars: { type: DataTypes.INTEGER, allowNull: false },
        created_by: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'users', key: 'id' },
          onDelete: 'SET NULL',
        },
        created_at: { type: DataTypes.DATE, allowNull: false },
        updated_at: { type: DataTypes.DATE, allowNull: false },
      },
      t,
    );
    await qi.addIndex('batch_processings', ['household_id'], t);
    await qi.addIndex('batch_processings', ['batch_id', 'number'], { unique: true, ...t });
    await qi.addIndex('batch_processings', ['created_by'], t);
    await run(
      'ALTER TABLE batch_processings ADD CONSTRAINT batch_processings_number CHECK (number BETWEEN 1 AND 2), ADD CONSTRAINT batch_processings_jars CHECK (jars >= 1)',
    );
    await run(`CREATE CONSTRAINT TRIGGER batch_processings_data_version AFTER INSERT OR UPDATE OR DELETE ON batch_processings
               DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION household_rows_changed()`);

    // 'checked' is every jar recorded before this change, and every jar whose seal was checked at recording.
    await run(`ALTER TABLE jars ADD COLUMN seal varchar(10) NOT NULL DEFAULT 'checked' CHECK (seal IN ('checked','to-check')),
               ADD COLUMN processing_id uuid REFERENCES batch_processings(id) ON DELETE SET NULL`);
    await qi.addIndex('jars', ['processing_id'], t);
    await run(`CREATE INDEX jars_seal_to_check ON jars (processing_id) WHERE seal = 'to-check'`);

    // A seal-check reminder belongs to a processing, not to one jar.
    await run(`ALTER TABLE reminder_deliveries ALTER COLUMN jar_id DROP NOT NULL, ALTER COLUMN use_by DROP NOT NULL,
               ADD COLUMN processing_id uuid REFERENCES batch_processings(id) ON DELETE CASCADE`);
    await run('ALTER TABLE reminder_deliveries DROP CONSTRAINT reminder_deliveries_kind');
    await run(`ALTER TABLE reminder_deliveries ADD CONSTRAINT reminder_deliveries_kind CHECK (kind IN ('soon','today','seal-check')),
               ADD CONSTRAINT reminder_deliveries_subject CHECK ((jar_id IS NULL) <> (processing_id IS NULL))`);
    await qi.addIndex('reminder_deliveries', ['processing_id', 'kind', 'user_id'], {
      unique: true,
      name: 'reminder_deliveries_processing_once',
      ...t,
    });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run('DELETE FROM reminder_deliveries WHERE processing_id IS NOT NULL');
    await run(
      'ALTER TABLE reminder_deliveries DROP CONSTRAINT reminder_deliveries_subject, DROP CONSTRAINT reminder_deliveries_kind',
    );
    await run(
      `ALTER TABLE reminder_deliveries ADD CONSTRAINT reminder_deliveries_kind CHECK (kind IN ('soon','today'))`,
    );
    await run(
      'ALTER TABLE reminder_deliveries DROP COLUMN processing_id, ALTER COLUMN jar_id SET NOT NULL, ALTER COLUMN use_by SET NOT NULL',
    );
    await run('ALTER TABLE jars DROP COLUMN processing_id, DROP COLUMN seal');
    await run('DROP TABLE batch_processings');
  });
}
