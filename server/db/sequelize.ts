import { Sequelize } from 'sequelize';
import { initModels } from './models';

export function createSequelize(databaseUrl: string, poolMax = 10) {
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: poolMax, min: 0, acquire: 5_000, idle: 10_000 },
    // Fail fast while PostgreSQL is away, so requests answer 503 instead of hanging.
    dialectOptions: { connectionTimeoutMillis: 3_000, statement_timeout: 15_000 },
    define: { underscored: true },
  });
}

// Models are bound to one connection per process; apps built on the same database share it.
const open = new Map<string, { sequelize: Sequelize; users: number }>();

/** The process's connection to a database, with the models bound to it; release() when done. */
export function acquireDatabase(databaseUrl: string, poolMax = 10) {
  let entry = open.get(databaseUrl);
  if (!entry) {
    const sequelize = createSequelize(databaseUrl, poolMax);
    initModels(sequelize);
    entry = { sequelize, users: 0 };
    open.set(databaseUrl, entry);
  }
  entry.users += 1;
  const held = entry;
  let released = false;
  return {
    sequelize: held.sequelize,
    async release() {
      if (released) return;
      released = true;
      held.users -= 1;
      if (held.users === 0) {
        open.delete(databaseUrl);
        await held.sequelize.close();
      }
    },
  };
}
