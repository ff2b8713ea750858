import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'users',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        password_hash: { type: DataTypes.STRING(100), allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.createTable(
      'households',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        altitude_ft: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        unit_system: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'us' },
        time_zone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: 'UTC' },
        ...timestamps,
      },
      { transaction },
    );
    await qi.createTable(
      'memberships',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'households', key: 'id' },
          onDelete: 'CASCADE',
        },
        user_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'users', key: 'id' },
          onDelete: 'CASCADE',
        },
        role: { type: DataTypes.STRING(10), allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addConstraint('memberships', {
      type: 'check',
      fields: ['role'],
      where: { role: ['keeper', 'cook', 'helper'] },
      name: 'memberships_role_check',
      transaction,
    });
    await qi.addIndex('memberships', ['household_id', 'user_id'], { unique: true, transaction });
    await qi.addIndex('memberships', ['user_id'], { transaction });
    // The table connect-pg-simple reads and writes.
    await qi.createTable(
      'sessions',
      {
        sid: { type: DataTypes.STRING, primaryKey: true },
        sess: { type: DataTypes.JSON, allowNull: false },
        expire: { type: DataTypes.DATE(6), allowNull: false },
      },
      { transaction },
    );
    await qi.addIndex('sessions', ['expire'], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('sessions');
  await qi.dropTable('memberships');
  await qi.dropTable('households');
  await qi.dropTable('users');
}
