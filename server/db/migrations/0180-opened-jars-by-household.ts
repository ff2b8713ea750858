import type { QueryInterface } from 'sequelize';

// The reminder sweep claims one range of households at a time (two processes share the ranges): a partial index
// of the opened jars by household and use-by reads one range's jars near their use-by without the others.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query(
    "CREATE INDEX jars_opened_household_use_by ON jars (household_id, use_by) WHERE state = 'opened'",
  );
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP INDEX IF EXISTS jars_opened_household_use_by');
}
