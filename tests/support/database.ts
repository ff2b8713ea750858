import { randomBytes } from 'node:crypto';
import pg from 'pg';

export function adminUrl() {
  const url = process.env.LARDERLY_TEST_ADMIN_URL;
  if (!url)
    throw new Error('Run the tests with `npm test`: it starts PostgreSQL and prepares the test template database.');
  return url;
}

export function databaseUrl(name: string) {
  const url = new URL(adminUrl());
  url.pathname = `/${name}`;
  return url.toString();
}

async function asAdmin(sql: string) {
  const client = new pg.Client({ connectionString: adminUrl() });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/** A fresh, migrated database of its own for one test file, copied from the template `npm test` migrated. */
export async function createTestDatabase(prefix = 't') {
  const name = `larderly_${prefix}_${process.pid}_${randomBytes(4).toString('hex')}`;
  await asAdmin(`CREATE DATABASE "${name}" TEMPLATE "${process.env.LARDERLY_TEST_TEMPLATE}"`);
  return { name, url: databaseUrl(name), drop: () => asAdmin(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`) };
}
