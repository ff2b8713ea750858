// Database lifecycle for the set-up scripts: `tsx server/db/cli.ts migrate|setup [--seed-demo]`.
import { acquireDatabase } from './sequelize';
import { migrate } from './migrate';
import { isEmpty, seedDemo } from './seeders/demo';

const [command, ...flags] = process.argv.slice(2);
const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is not set');

const database = acquireDatabase(url, 2);
const { sequelize } = database;
try {
  if (command === 'migrate' || command === 'setup') {
    const applied = await migrate(sequelize);
    if (applied.length) console.log(`larderly: applied ${applied.length} migration(s): ${applied.join(', ')}`);
  }
  if (command === 'setup' && flags.includes('--seed-demo') && (await isEmpty())) {
    await seedDemo(sequelize);
    console.log('larderly: seeded the demo households');
  }
} finally {
  await database.release();
}
