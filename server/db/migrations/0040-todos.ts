import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    await qi.createTable(
      'todos',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'households', key: 'id' },
          onDelete: 'CASCADE',
        },
        title: { type: DataTypes.STRING(200), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        due_on: { type: DataTypes.DATEONLY, allowNull: true },
        assignee_id: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'users', key: 'id' },
          onDelete: 'SET NULL',
        },
        done: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        done_at: { type: DataTypes.DATE, allowNull: true },
        // 0..n-1 within the household, done items included, so a move is one shift.
        position: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'plain' },
        product_id: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'products', key: 'id' },
          onDelete: 'SET NULL',
        },
        // A restock to-do's batch plan: scaled recipe, processing plan, jars and lids, shopping list, target date.
        batch_plan: { type: DataTypes.JSONB, allowNull: true },
        created_by: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'users', key: 'id' },
          onDelete: 'SET NULL',
        },
        created_at: { type: DataTypes.DATE, allowNull: false },
        updated_at: { type: DataTypes.DATE, allowNull: false },
      },
      t,
    );
    await qi.addIndex('todos', ['assignee_id'], t);
    await qi.addIndex('todos', ['product_id'], t);
    await qi.addIndex('todos', ['created_by'], t);
    // The unique index also serves every household_id lookup; deferred so a move can shift rows in any order.
    await qi.sequelize.query(
      `ALTER TABLE todos ADD CONSTRAINT todos_dense UNIQUE (household_id, position) DEFERRABLE INITIALLY DEFERRED,
       ADD CONSTRAINT todos_position CHECK (position >= 0),
       ADD CONSTRAINT todos_kind CHECK (kind IN ('plain','restock')),
       ADD CONSTRAINT todos_restock_has_plan CHECK (kind <> 'restock' OR batch_plan IS NOT NULL),
       ADD CONSTRAINT todos_done_at CHECK (done = (done_at IS NOT NULL))`,
      t,
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('todos');
}
