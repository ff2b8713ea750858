// Database lifecycle for the set-up scripts: `tsx server/setup.ts migrate|setup [--seed-demo]`.
import { acquireDatabase } from './db/sequelize';
import { migrate } from './db/migrate';
import { isEmpty, seedDemo } from './demo/demo';

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
