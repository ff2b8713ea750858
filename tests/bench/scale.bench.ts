// GET /week for one three-year household in a database of 10,000 households, against the same household
// in a database of its own; and the plans PostgreSQL chooses for the week's queries in the crowded one.
// Run: npm run bench:scale   (starts or reuses the project's PostgreSQL; BENCH_HOUSEHOLDS to change the crowd)
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { weekStartOf } from '../../shared/schemas/week';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { migrate } from '../../server/db/migrate';
import { todayIn } from '../../server/services/clock';
import { startCluster } from '../../scripts/lib/postgres.mjs';
import { dropDatabase, recreateDatabase } from '../../scripts/lib/database.mjs';
import { generateCrowd } from './crowd';
import { BENCH_EMAIL, BENCH_PASSWORD, generateHousehold } from './week-household';

const HOUSEHOLDS = Number(process.env.BENCH_HOUSEHOLDS ?? 10_000);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 40);
const cluster = startCluster();
const os = await import('node:os');

async function measure(label: string, crowd: boolean) {
  const database = `larderly_scale_${label}_${process.pid}`;
  await recreateDatabase(cluster, database);
  const built = createApp(
    loadConfig({
      ...process.env,
      NODE_ENV: 'test',
      DATABASE_URL: cluster.url(database),
      STATIC_DIR: 'no-static-in-bench',
      BCRYPT_COST: '4',
    }),
  );
  try {
    await migrate(built.sequelize);
    const today = todayIn('America/New_York');
    const { household } = await generateHousehold(today);
    let made = 'only the bench household';
    if (crowd) {
      const began = performance.now();
      const counts = await generateCrowd(built.sequelize, HOUSEHOLDS);
      made = `${counts.households} households, ${counts.jars} jars (${counts.opened} opened), ${counts.entries} plan entries, made in ${((performance.now() - began) / 1000).toFixed(1)} s`;
    } else {
      await built.sequelize.query('ANALYZE');
    }
    const path = `/api/households/${household.id}/week?start=${weekStartOf(today, household.weekStartsOn)}`;
    const agent = request.agent(built.app);
    await agent.post('/api/auth/login').send({ email: BENCH_EMAIL, password: BENCH_PASSWORD }).expect(200);
    for (let i = 0; i < 5; i += 1) await agent.get(path).expect(200);

    // Each round moves the household's data version first, so the answer is worked out anew, as after a write.
    const computed: number[] = [];
    const cached: number[] = [];
    for (let i = 0; i < ROUNDS; i += 1) {
      await built.sequelize.query('UPDATE households SET data_version = data_version + 1 WHERE id = :id', {
        replacements: { id: household.id },
      });
      let began = performance.now();
      await agent.get(path).expect(200);
      computed.push(performance.now() - began);
      began = performance.now();
      await agent.get(path).expect(200);
      cached.push(performance.now() - began);
    }
    const plans = crowd ? await explainWeek(built.sequelize, household.id, today) : [];
    return { label, made, computedMs: median(computed), cachedMs: median(cached), plans };
  } finally {
    await built.close();
    await dropDatabase(cluster, database).catch(() => {});
  }
}

/** EXPLAIN (ANALYZE, BUFFERS) of GET /week's own reads, one line of each plan that names the index used. */
async function explainWeek(sequelize: import('sequelize').Sequelize, householdId: string, today: string) {
  const queries: Record<string, string> = {
    'plan entries': `SELECT e.id FROM plan_entries e LEFT JOIN pairings p ON p.plan_entry_id = e.id WHERE e.household_id = :householdId AND e.date BETWEEN :today AND (:today::date + 7)`,
    'current jars': `SELECT id FROM jars WHERE household_id = :householdId AND (state = 'opened' OR state = 'sealed')`,
    'products with counts': `SELECT p.id, count(j.id) FROM products p LEFT JOIN jars j ON j.product_id = p.id AND j.state IN ('sealed', 'opened') WHERE p.household_id = :householdId GROUP BY p.id`,
    recipes: 'SELECT product_id FROM recipes WHERE household_id = :householdId',
    members:
      'SELECT m.user_id, u.name FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.household_id = :householdId',
  };
  const lines: string[] = [];
  for (const [name, sql] of Object.entries(queries)) {
    const plan = await sequelize.query<{ 'QUERY PLAN': string }>(`EXPLAIN (ANALYZE, BUFFERS) ${sql}`, {
      replacements: { householdId, today },
      type: QueryTypes.SELECT,
    });
    const text = plan.map((row) => row['QUERY PLAN']);
    const scans = text.filter((l) => /Scan/.test(l)).map((l) => l.trim().replace(/\s+\(cost.*$/, ''));
    lines.push(`  ${name}: ${text.find((l) => l.startsWith('Execution Time'))}; ${scans.join(' | ')}`);
  }
  return lines;
}

function median(values: number[]) {
  const sorted = [...values].sort((a, b) => a - b);
  return Number(sorted[Math.floor(sorted.length / 2)]!.toFixed(1));
}

const loadBefore = os.loadavg()[0];
try {
  const alone = await measure('alone', false);
  const crowded = await measure('crowd', true);
  console.log(
    `\nGET /week of a household with 4,000 jars and 3,000 plan entries, one request at a time, ${ROUNDS} rounds, median ms`,
  );
  console.log(
    `machine: ${os.cpus().length} cores, load average ${loadBefore.toFixed(1)} before and ${os.loadavg()[0].toFixed(1)} after`,
  );
  console.table(
    Object.fromEntries(
      [alone, crowded].map((r) => [
        r.label === 'alone' ? 'the household alone' : `among ${HOUSEHOLDS.toLocaleString('en-US')} households`,
        { computedMs: r.computedMs, cachedMs: r.cachedMs, database: r.made },
      ]),
    ),
  );
  console.log(
    `cost among the crowd / alone: worked out ${(crowded.computedMs / alone.computedMs).toFixed(2)}x, cached ${(crowded.cachedMs / alone.cachedMs).toFixed(2)}x; aim <= 1.2x`,
  );
  console.log('\nplans among the crowd:');
  for (const line of crowded.plans) console.log(line);
} finally {
  cluster.stop();
}
