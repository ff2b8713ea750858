import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A jar put back (an undone open, finish or discard) is a new 'restored' event pointing at the
 * event it reverses; the unique index makes a second undo of the same event impossible.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    await qi.addColumn(
      'jar_events',
      'undoes_event_id',
      { type: DataTypes.UUID, allowNull: true, references: { model: 'jar_events', key: 'id' }, onDelete: 'CASCADE' },
      t,
    );
    // What the jar looked like before this event, so undoing it restores exactly that.
    await qi.addColumn('jar_events', 'state_before', { type: DataTypes.JSONB, allowNull: true }, t);
    // PostgreSQL lets many rows share NULL under a unique index, so only real undos collide.
    await qi.addIndex('jar_events', ['undoes_event_id'], { unique: true, ...t });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('jar_events', 'state_before');
  await qi.removeColumn('jar_events', 'undoes_event_id');
}
