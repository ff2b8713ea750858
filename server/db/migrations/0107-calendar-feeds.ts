import type { QueryInterface } from 'sequelize';

// A person's private calendar address for one household: only a SHA-256 fingerprint of its secret is kept.
// The household's meal times place its planned meals in that calendar.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query(
      `CREATE TABLE calendar_feeds (
         id uuid PRIMARY KEY,
         household_id uuid NOT NULL REFERENCES households(id) ON DELETE CASCADE,
         user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
         token_hash char(64) NOT NULL UNIQUE,
         last_fetched_at timestamptz,
         created_at timestamptz NOT NULL DEFAULT now(),
         updated_at timestamptz NOT NULL DEFAULT now(),
         UNIQUE (household_id, user_id)
       )`,
      { transaction },
    );
    await qi.sequelize.query('CREATE INDEX calendar_feeds_household_id ON calendar_feeds (household_id)', {
      transaction,
    });
    await qi.sequelize.query('CREATE INDEX calendar_feeds_user_id ON calendar_feeds (user_id)', { transaction });
    await qi.sequelize.query(
      `ALTER TABLE households ADD COLUMN meal_times jsonb NOT NULL
         DEFAULT '{"breakfast":"08:00","lunch":"12:30","snack":"15:30","dinner":"18:30"}'::jsonb`,
      { transaction },
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP TABLE IF EXISTS calendar_feeds');
  await qi.sequelize.query('ALTER TABLE households DROP COLUMN IF EXISTS meal_times');
}
