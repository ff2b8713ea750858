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

/** Brings the schema up to date; safe to run on every start. */
export async function migrate(sequelize: Sequelize) {
  const applied = await createMigrator(sequelize).up();
  return applied.map((m) => m.name);
}
