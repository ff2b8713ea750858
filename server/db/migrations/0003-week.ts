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

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    // Who eats: each member's heat tolerance and diet.
    await qi.addColumn(
      'memberships',
      'heat_tolerance',
      { type: DataTypes.INTEGER, allowNull: false, defaultValue: 5 },
      t,
    );
    await qi.addColumn(
      'memberships',
      'diet_tags',
      { type: DataTypes.ARRAY(DataTypes.STRING(30)), allowNull: false, defaultValue: [] },
      t,
    );

    await qi.createTable(
      'meals',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        name: { type: DataTypes.STRING(100), allowNull: false },
        tags: { type: DataTypes.ARRAY(DataTypes.STRING(30)), allowNull: false, defaultValue: [] },
        usual_servings: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 2 },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('meals', ['household_id'], t);

    // The products a meal usually goes with, and a portion per serving.
    await qi.createTable(
      'meal_products',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        meal_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'meals', key: 'id' },
          onDelete: 'CASCADE',
        },
        product_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'products', key: 'id' },
          onDelete: 'CASCADE',
        },
        tbsp_per_serving: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('meal_products', ['household_id'], t);
    await qi.addIndex('meal_products', ['meal_id'], t);
    await qi.addIndex('meal_products', ['product_id'], t);

    await qi.createTable(
      'plan_entries',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        date: { type: DataTypes.DATEONLY, allowNull: false },
        slot: { type: DataTypes.STRING(10), allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(100), allowNull: false },
        meal_id: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'meals', key: 'id' },
          onDelete: 'SET NULL',
        },
        servings: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 2 },
        // Member user ids who eat this meal; null means everybody.
        eaters: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: true },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('plan_entries', ['household_id', 'date'], t);
    await qi.addIndex('plan_entries', ['meal_id'], t);
    await qi.sequelize.query(
      `ALTER TABLE plan_entries ADD CONSTRAINT plan_entries_slot CHECK (slot IN ('breakfast','lunch','dinner','snack')),
       ADD CONSTRAINT plan_entries_servings CHECK (servings BETWEEN 1 AND 100),
       ADD CONSTRAINT plan_entries_dense UNIQUE (household_id, date, slot, position) DEFERRABLE INITIALLY DEFERRED`,
      t,
    );

    await qi.createTable(
      'pairings',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        plan_entry_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'plan_entries', key: 'id' },
          onDelete: 'CASCADE',
        },
        product_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'products', key: 'id' },
          onDelete: 'CASCADE',
        },
        tbsp_per_serving: { type: DataTypes.DECIMAL(6, 2), allowNull: false },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('pairings', ['household_id'], t);
    await qi.addIndex('pairings', ['plan_entry_id'], t);
    await qi.addIndex('pairings', ['product_id'], t);
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ['pairings', 'plan_entries', 'meal_products', 'meals']) await qi.dropTable(table);
  await qi.removeColumn('memberships', 'heat_tolerance');
  await qi.removeColumn('memberships', 'diet_tags');
}
