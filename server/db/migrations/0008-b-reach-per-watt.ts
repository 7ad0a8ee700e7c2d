import { DataTypes, type QueryInterface } from 'sequelize';

/** Km per watt per receiver and day, so the reach figures never need the reports themselves. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('reception_receiver_days', 'bestKmPerWatt', { type: DataTypes.FLOAT, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('reception_receiver_days', 'bestKmPerWatt');
}
