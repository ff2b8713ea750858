import type { QueryInterface } from 'sequelize';

// A use-by reminder has no processing, yet every one of them was written into the seal checks' unique index as a
// (null, kind, person) entry, an index write per reminder that keeps nothing unique (nulls never conflict). Only the
// seal checks' rows belong there; the index still serves the processing foreign key's cascade.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run('DROP INDEX reminder_deliveries_processing_once');
    await run(`CREATE UNIQUE INDEX reminder_deliveries_processing_once ON reminder_deliveries (processing_id, kind, user_id)
               WHERE processing_id IS NOT NULL`);
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run('DROP INDEX reminder_deliveries_processing_once');
    await run(
      'CREATE UNIQUE INDEX reminder_deliveries_processing_once ON reminder_deliveries (processing_id, kind, user_id)',
    );
  });
}
