import type { QueryInterface } from 'sequelize';

/**
 * A jar given away: a state of its own ('given', beside finished and discarded), the day it left the shelf and,
 * when the giver says, to whom. It is an ending of its own, so the empty jar does not come back to the household
 * and the use-rate forecast does not count it as eaten.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run('ALTER TABLE jars ADD COLUMN given_on date, ADD COLUMN given_to varchar(80)');
    // The history keeps whom each gift went to, even after a gift is undone and the jar given to someone else.
    await run('ALTER TABLE jar_events ADD COLUMN given_to varchar(80)');
    await run('ALTER TABLE jars DROP CONSTRAINT jars_state');
    await run(`ALTER TABLE jars ADD CONSTRAINT jars_state CHECK (state IN ('sealed','opened','finished','discarded','given')),
               ADD CONSTRAINT jars_given_has_date CHECK (state <> 'given' OR given_on IS NOT NULL)`);
    // The shelf and the restock screen count the year's gifts: a partial index holds only the given jars.
    await run(`CREATE INDEX jars_given_on ON jars (household_id, given_on) WHERE state = 'given'`);
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const run = (sql: string) => qi.sequelize.query(sql, { transaction });
    await run(`UPDATE jars SET state = 'sealed' WHERE state = 'given'`);
    await run('DROP INDEX IF EXISTS jars_given_on');
    await run('ALTER TABLE jars DROP CONSTRAINT jars_given_has_date, DROP CONSTRAINT jars_state');
    await run(`ALTER TABLE jars ADD CONSTRAINT jars_state CHECK (state IN ('sealed','opened','finished','discarded'))`);
    await run('ALTER TABLE jars DROP COLUMN given_to, DROP COLUMN given_on');
    await run(`DELETE FROM jar_events WHERE kind = 'given'`);
    await run('ALTER TABLE jar_events DROP COLUMN given_to');
  });
}
