import type { QueryInterface } from 'sequelize';

// Request counts of the rate limits, shared by every app process behind a balancer.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(
    `CREATE TABLE rate_limit_hits (
       key text PRIMARY KEY,
       hits integer NOT NULL CHECK (hits >= 0),
       reset_at timestamptz NOT NULL
     )`,
  );
  await qi.sequelize.query('CREATE INDEX rate_limit_hits_reset_at ON rate_limit_hits (reset_at)');
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('rate_limit_hits');
}
