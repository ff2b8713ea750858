import type { QueryInterface } from 'sequelize';

// A reminder's claim records when it was taken, when its sends finished and how often it was tried,
// so a claim whose process died before sending is taken again by a later sweep.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query(
      `ALTER TABLE reminder_deliveries
         ADD COLUMN claimed_at timestamptz,
         ADD COLUMN sent_at timestamptz,
         ADD COLUMN attempts integer NOT NULL DEFAULT 1 CHECK (attempts >= 0)`,
      { transaction },
    );
    // Every claim made before this change went through its sends in the same step.
    await qi.sequelize.query('UPDATE reminder_deliveries SET claimed_at = created_at, sent_at = updated_at', {
      transaction,
    });
    await qi.sequelize.query(
      'ALTER TABLE reminder_deliveries ALTER COLUMN claimed_at SET NOT NULL, ALTER COLUMN claimed_at SET DEFAULT now()',
      { transaction },
    );
    await qi.sequelize.query(
      'CREATE INDEX reminder_deliveries_unsent ON reminder_deliveries (claimed_at) WHERE sent_at IS NULL',
      { transaction },
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP INDEX IF EXISTS reminder_deliveries_unsent');
  await qi.sequelize.query(
    'ALTER TABLE reminder_deliveries DROP COLUMN claimed_at, DROP COLUMN sent_at, DROP COLUMN attempts',
  );
}
