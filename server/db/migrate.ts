import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

const migrationsDir = path.join(path.dirname(fileURLToPath(import.meta.url)), 'migrations');

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: { glob: ['*.ts', { cwd: migrationsDir }] },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

// Any fixed number: the advisory lock that lets one process migrate while the others wait.
const MIGRATION_LOCK = 7_420_001;

/** Brings the schema up to date; safe to run on every start, from several processes at once. */
export async function migrate(sequelize: Sequelize) {
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(:lock)', {
      replacements: { lock: MIGRATION_LOCK },
      transaction,
    });
    const applied = await createMigrator(sequelize).up();
    return applied.map((m) => m.name);
  });
}
