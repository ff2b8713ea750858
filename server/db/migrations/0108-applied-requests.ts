import type { QueryInterface } from 'sequelize';

// Changes a device made offline are sent again when the network returns; each carries an idempotency key,
// and the answer the server gave the first time is kept under it, so a replay never applies twice.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query(
      `CREATE TABLE applied_requests (
         user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
         key varchar(100) NOT NULL,
         household_id uuid NOT NULL REFERENCES households(id) ON DELETE CASCADE,
         fingerprint char(64) NOT NULL,
         status integer,
         body jsonb,
         created_at timestamptz NOT NULL DEFAULT now(),
         PRIMARY KEY (user_id, key)
       )`,
      { transaction },
    );
    await qi.sequelize.query('CREATE INDEX applied_requests_household_id ON applied_requests (household_id)', {
      transaction,
    });
    await qi.sequelize.query('CREATE INDEX applied_requests_created_at ON applied_requests (created_at)', {
      transaction,
    });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP TABLE IF EXISTS applied_requests');
}
