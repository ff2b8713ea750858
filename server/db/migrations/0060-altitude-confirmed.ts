import { DataTypes, type QueryInterface } from 'sequelize';

// No processing plan is shown until a keeper has confirmed the altitude; households made before this stay unconfirmed.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('households', 'altitude_confirmed_at', { type: DataTypes.DATE, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('households', 'altitude_confirmed_at');
}
