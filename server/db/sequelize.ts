import { Sequelize } from 'sequelize';

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
