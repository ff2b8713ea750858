import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const householdRef = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'households', key: 'id' },
  onDelete: 'CASCADE',
};
const JAR_SIZES = ['quarter-pint', 'half-pint', 'twelve-ounce', 'pint', 'pint-and-half', 'quart', 'half-gallon'];
const METHODS = ['boiling-water', 'atmospheric-steam', 'pressure-dial', 'pressure-weighted'];

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    await qi.addColumn(
      'households',
      'best_quality_months',
      { type: DataTypes.INTEGER, allowNull: false, defaultValue: 12 },
      t,
    );
    await qi.addColumn(
      'households',
      'week_starts_on',
      { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      t,
    );
    await qi.addColumn(
      'households',
      'canner_capacity_jars',
      { type: DataTypes.INTEGER, allowNull: false, defaultValue: 7 },
      t,
    );
    await qi.addColumn(
      'households',
      'default_method',
      { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'boiling-water' },
      t,
    );

    await qi.createTable(
      'products',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        name: { type: DataTypes.STRING(80), allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        heat: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        favourite: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        min_jars: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        use_within_days: { type: DataTypes.INTEGER, allowNull: true },
        harvest_months: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false, defaultValue: [] },
        jar_size: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'half-pint' },
        colour: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'honey' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('products', ['household_id'], t);
    await qi.sequelize.query('CREATE UNIQUE INDEX products_household_name ON products (household_id, lower(name))', t);
    await qi.sequelize.query(
      'ALTER TABLE products ADD CONSTRAINT products_heat_range CHECK (heat BETWEEN 0 AND 5), ADD CONSTRAINT products_min_jars CHECK (min_jars >= 0)',
      t,
    );

    await qi.createTable(
      'recipes',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        product_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'products', key: 'id' },
          onDelete: 'CASCADE',
        },
        name: { type: DataTypes.STRING(120), allowNull: false },
        yield_jars: { type: DataTypes.INTEGER, allowNull: false },
        yield_jar_size: { type: DataTypes.STRING(20), allowNull: false },
        // [{ name, amount, unit, role }]: a recipe card owns its ingredient lines.
        ingredients: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        acid_percent: { type: DataTypes.DECIMAL(4, 2), allowNull: true },
        ph: { type: DataTypes.DECIMAL(4, 2), allowNull: true },
        acidified: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        method: { type: DataTypes.STRING(20), allowNull: false },
        // { [jarSize]: minutes at 0-1,000 ft }
        base_minutes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        // The recipe's own [{ upToFt, addMinutes }] rows, where it has them.
        altitude_table: { type: DataTypes.JSONB, allowNull: true },
        headspace_inches: { type: DataTypes.DECIMAL(4, 3), allowNull: false },
        steps: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        source: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('recipes', ['household_id'], t);
    await qi.addIndex('recipes', ['product_id'], t);

    await qi.createTable(
      'batches',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        product_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'products', key: 'id' },
          onDelete: 'CASCADE',
        },
        recipe_id: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'recipes', key: 'id' },
          onDelete: 'SET NULL',
        },
        canned_on: { type: DataTypes.DATEONLY, allowNull: false },
        jar_size: { type: DataTypes.STRING(20), allowNull: false },
        jars_filled: { type: DataTypes.INTEGER, allowNull: false },
        jars_sealed: { type: DataTypes.INTEGER, allowNull: false },
        method: { type: DataTypes.STRING(20), allowNull: false },
        altitude_ft: { type: DataTypes.INTEGER, allowNull: false },
        minutes: { type: DataTypes.INTEGER, allowNull: true },
        pressure_psi: { type: DataTypes.INTEGER, allowNull: true },
        headspace_inches: { type: DataTypes.DECIMAL(4, 3), allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        photo_key: { type: DataTypes.STRING(200), allowNull: true },
        photo_type: { type: DataTypes.STRING(40), allowNull: true },
        created_by: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'users', key: 'id' },
          onDelete: 'SET NULL',
        },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('batches', ['household_id', 'canned_on'], t);
    await qi.addIndex('batches', ['product_id'], t);
    await qi.addIndex('batches', ['recipe_id'], t);
    await qi.addIndex('batches', ['created_by'], t);
    await qi.sequelize.query(
      `ALTER TABLE batches ADD CONSTRAINT batches_counts CHECK (jars_filled BETWEEN 1 AND 500 AND jars_sealed BETWEEN 0 AND jars_filled),
       ADD CONSTRAINT batches_jar_size CHECK (jar_size IN (${JAR_SIZES.map((s) => `'${s}'`).join(',')})),
       ADD CONSTRAINT batches_method CHECK (method IN (${METHODS.map((s) => `'${s}'`).join(',')}))`,
      t,
    );

    await qi.createTable(
      'jars',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        batch_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'batches', key: 'id' },
          onDelete: 'CASCADE',
        },
        product_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'products', key: 'id' },
          onDelete: 'CASCADE',
        },
        // Short code printed on the label; /j/<code> opens the jar.
        code: { type: DataTypes.STRING(12), allowNull: false, unique: true },
        state: { type: DataTypes.STRING(10), allowNull: false },
        capacity_tbsp: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
        remaining_tbsp: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
        unsealed: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        best_by: { type: DataTypes.DATEONLY, allowNull: false },
        opened_on: { type: DataTypes.DATEONLY, allowNull: true },
        use_by: { type: DataTypes.DATEONLY, allowNull: true },
        finished_on: { type: DataTypes.DATEONLY, allowNull: true },
        discarded_on: { type: DataTypes.DATEONLY, allowNull: true },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('jars', ['household_id', 'state'], t);
    await qi.addIndex('jars', ['batch_id'], t);
    await qi.addIndex('jars', ['product_id', 'state'], t);
    await qi.sequelize.query(
      `ALTER TABLE jars ADD CONSTRAINT jars_state CHECK (state IN ('sealed','opened','finished','discarded')),
       ADD CONSTRAINT jars_opened_has_dates CHECK (state <> 'opened' OR (opened_on IS NOT NULL AND use_by IS NOT NULL))`,
      t,
    );

    // Who did what to a jar, and when: the batch's history.
    await qi.createTable(
      'jar_events',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        jar_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'jars', key: 'id' },
          onDelete: 'CASCADE',
        },
        batch_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'batches', key: 'id' },
          onDelete: 'CASCADE',
        },
        kind: { type: DataTypes.STRING(12), allowNull: false },
        user_id: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'users', key: 'id' },
          onDelete: 'SET NULL',
        },
        happened_on: { type: DataTypes.DATEONLY, allowNull: false },
        created_at: { type: DataTypes.DATE, allowNull: false },
      },
      t,
    );
    await qi.addIndex('jar_events', ['household_id'], t);
    await qi.addIndex('jar_events', ['jar_id'], t);
    await qi.addIndex('jar_events', ['batch_id'], t);
    await qi.addIndex('jar_events', ['user_id'], t);
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ['jar_events', 'jars', 'batches', 'recipes', 'products']) await qi.dropTable(table);
  for (const column of ['best_quality_months', 'week_starts_on', 'canner_capacity_jars', 'default_method'])
    await qi.removeColumn('households', column);
}
