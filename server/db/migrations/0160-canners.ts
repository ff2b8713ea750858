import type { QueryInterface } from 'sequelize';

// A household may own more than one canner (a boiling-water canner and a pressure canner), each holding its own number
// of jars a load. The single capacity it had becomes the capacity of its default canner.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query(
      `ALTER TABLE households ADD COLUMN canners jsonb NOT NULL DEFAULT '[{"method":"boiling-water","capacityJars":7}]'::jsonb`,
      { transaction },
    );
    await qi.sequelize.query(
      `UPDATE households SET canners = jsonb_build_array(jsonb_build_object('method', default_method, 'capacityJars', canner_capacity_jars))`,
      { transaction },
    );
    await qi.sequelize.query('ALTER TABLE households DROP COLUMN canner_capacity_jars', { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query('ALTER TABLE households ADD COLUMN canner_capacity_jars integer NOT NULL DEFAULT 7', {
      transaction,
    });
    await qi.sequelize.query(
      `UPDATE households h SET canner_capacity_jars = coalesce(
         (SELECT (c->>'capacityJars')::int FROM jsonb_array_elements(h.canners) c WHERE c->>'method' = h.default_method),
         (h.canners->0->>'capacityJars')::int, 7)`,
      { transaction },
    );
    await qi.sequelize.query('ALTER TABLE households DROP COLUMN canners', { transaction });
  });
}
