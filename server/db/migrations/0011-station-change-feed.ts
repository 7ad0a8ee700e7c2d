import { DataTypes, type QueryInterface } from 'sequelize';

/** Changes that device caches must drop, written by one server process and followed by every other. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('station_change_feed', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    /** 0 = every station */
    stationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    origin: { type: DataTypes.CHAR(36), allowNull: false },
    createdAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('station_change_feed', ['createdAt'], { name: 'change_feed_time' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('station_change_feed');
}
