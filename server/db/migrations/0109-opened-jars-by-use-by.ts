import type { QueryInterface } from 'sequelize';

// The reminder sweep reads every opened jar whose use-by is within the next two weeks, across all households:
// a partial index holds only the opened jars, ordered by use-by.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query("CREATE INDEX jars_opened_use_by ON jars (use_by) WHERE state = 'opened'");
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP INDEX IF EXISTS jars_opened_use_by');
}
