import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * How a unit's low-pass filters are put in circuit, and for hand-swapped filters which one is fitted
 * now and when that was recorded. Existing units keep what they did before: every listed filter usable
 * (switched), until their owner says otherwise.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('units', 'filterSelection', { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'switched' });
  await qi.addColumn('units', 'fittedFilterIndex', { type: DataTypes.INTEGER, allowNull: true });
  await qi.addColumn('units', 'fittedAt', { type: DataTypes.DATE(3), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const column of ['fittedAt', 'fittedFilterIndex', 'filterSelection']) await qi.removeColumn('units', column);
}
