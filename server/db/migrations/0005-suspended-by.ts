import { DataTypes, type QueryInterface } from 'sequelize';

/** Who suspended a station, kept with the suspension so its owner sees it even after leaving the club. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('stations', 'suspendedByUserId', { type: DataTypes.INTEGER.UNSIGNED, allowNull: true });
  await qi.addColumn('stations', 'suspendedByName', { type: DataTypes.STRING(80), allowNull: true });
  await qi.addColumn('stations', 'suspendedByClubName', { type: DataTypes.STRING(120), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeColumn('stations', 'suspendedByClubName');
  await qi.removeColumn('stations', 'suspendedByName');
  await qi.removeColumn('stations', 'suspendedByUserId');
}
