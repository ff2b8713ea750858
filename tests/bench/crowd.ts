// 10,000 households made with SQL (generate_series), so a bench gets a full database in seconds:
// most are small (one to three people, three products, a few dozen jars, two weeks planned),
// one in a hundred has three years behind it (60 products, 420 batches, 4,200 jars, 3,000 planned meals).
import type { Sequelize } from 'sequelize';

export async function generateCrowd(sequelize: Sequelize, households: number) {
  const run = (sql: string) => sequelize.query(sql, { replacements: { households } });
  await sequelize.transaction(async (transaction) => {
    const q = (sql: string) => sequelize.query(sql, { replacements: { households }, transaction });
    // Bulk load: no triggers or foreign-key checks per row (the rows are made consistent here).
    await q('SET LOCAL session_replication_role = replica');
    // The app's 15 s statement limit is for requests; a bulk load on a busy machine may take longer.
    await q('SET LOCAL statement_timeout = 0');
    await q(`CREATE TEMP TABLE crowd ON COMMIT DROP AS
               SELECT n, gen_random_uuid() AS hid, n % 100 = 0 AS big FROM generate_series(1, :households) n`);
    await q(`INSERT INTO households (id, name, time_zone, created_at, updated_at)
               SELECT hid, 'Crowd household ' || n, 'America/New_York', now(), now() FROM crowd`);
    await q(`CREATE TEMP TABLE crowd_people ON COMMIT DROP AS
               SELECT c.hid, c.n, k, gen_random_uuid() AS uid FROM crowd c, generate_series(1, 1 + c.n % 3) k`);
    await q(`INSERT INTO users (id, email, name, password_hash, created_at, updated_at)
               SELECT uid, 'crowd-' || n || '-' || k || '@larderly.test', 'Crowd member ' || k, '', now(), now() FROM crowd_people`);
    await q(`INSERT INTO memberships (id, household_id, user_id, role, created_at, updated_at)
               SELECT gen_random_uuid(), hid, uid, CASE k WHEN 1 THEN 'keeper' ELSE 'cook' END, now(), now() FROM crowd_people`);
    await q(`CREATE TEMP TABLE crowd_products ON COMMIT DROP AS
               SELECT c.hid, c.big, p, gen_random_uuid() AS pid FROM crowd c, generate_series(1, CASE WHEN c.big THEN 60 ELSE 3 END) p`);
    await q(`INSERT INTO products (id, household_id, name, kind, created_at, updated_at)
               SELECT pid, hid, 'Preserve ' || p, 'relish', now(), now() FROM crowd_products`);
    // Seven batches a product over three years in the big households, two in the last year in the small ones.
    await q(`CREATE TEMP TABLE crowd_batches ON COMMIT DROP AS
               SELECT cp.hid, cp.pid, cp.big, b, gen_random_uuid() AS bid,
                      current_date - CASE WHEN cp.big THEN b * 150 + cp.p ELSE b * 120 + cp.p END AS canned_on
                 FROM crowd_products cp, generate_series(0, CASE WHEN cp.big THEN 6 ELSE 1 END) b`);
    await q(`INSERT INTO batches (id, household_id, product_id, canned_on, jar_size, jars_filled, jars_sealed, method, altitude_ft, minutes, created_at, updated_at)
               SELECT bid, hid, pid, canned_on, 'half-pint', 10, 10, 'boiling-water', 1200, 15, now(), now() FROM crowd_batches`);
    // Jars older than a year are eaten; the newest batch of each product has one jar open.
    await q(`INSERT INTO jars (id, household_id, batch_id, product_id, code, state, capacity_tbsp, remaining_tbsp, best_by, opened_on, use_by, finished_on, created_at, updated_at)
               SELECT gen_random_uuid(), hid, bid, pid, 'C' || lpad(to_hex(row_number() OVER ()), 10, '0'), state,
                      16, CASE state WHEN 'sealed' THEN 16 WHEN 'opened' THEN 8 ELSE 0 END,
                      canned_on + 365,
                      CASE WHEN state = 'opened' THEN current_date - 3 END,
                      CASE WHEN state = 'opened' THEN current_date + 18 END,
                      CASE WHEN state = 'finished' THEN canned_on + 60 END,
                      now(), now()
                 FROM (SELECT cb.*, j, CASE WHEN cb.canned_on < current_date - 365 THEN 'finished'
                                            WHEN cb.b = 0 AND j = 0 THEN 'opened' ELSE 'sealed' END AS state
                         FROM crowd_batches cb, generate_series(0, CASE WHEN cb.big THEN 9 ELSE 5 END) j) made`);
    // Three meals a day for a thousand days in the big households, one a day for two weeks in the small ones.
    await q(`CREATE TEMP TABLE crowd_entries ON COMMIT DROP AS
               SELECT c.hid, c.big, d, s, gen_random_uuid() AS eid
                 FROM crowd c, generate_series(CASE WHEN c.big THEN -986 ELSE -7 END, CASE WHEN c.big THEN 14 ELSE 7 END) d,
                      generate_series(1, CASE WHEN c.big THEN 3 ELSE 1 END) s`);
    await q(`INSERT INTO plan_entries (id, household_id, date, slot, position, title, servings, created_at, updated_at)
               SELECT eid, hid, current_date + d, (ARRAY['breakfast','lunch','dinner'])[s], 0, 'Meal ' || d, 2 + abs(d) % 3, now(), now() FROM crowd_entries`);
    await q(`INSERT INTO pairings (id, household_id, plan_entry_id, product_id, tbsp_per_serving, created_at, updated_at)
               SELECT gen_random_uuid(), e.hid, e.eid, p.pid, 1, now(), now()
                 FROM crowd_entries e JOIN crowd_products p ON p.hid = e.hid AND p.p = 1 + (abs(e.d) * 7 + e.s) % CASE WHEN e.big THEN 60 ELSE 3 END`);
  });
  await run('ANALYZE');
  const [[counts]] = (await sequelize.query(
    `SELECT (SELECT count(*) FROM households) AS households, (SELECT count(*) FROM jars) AS jars,
            (SELECT count(*) FROM jars WHERE state = 'opened') AS opened, (SELECT count(*) FROM plan_entries) AS entries`,
  )) as [Record<string, string>[], unknown];
  return counts;
}
