import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const station = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'stations', key: 'id' }, onDelete: 'CASCADE' };

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('device_tokens', {
    id,
    stationId: { ...station, unique: true },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    createdAt: { type: DataTypes.DATE(3), allowNull: false },
    updatedAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.createTable('device_heartbeats', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    stationId: station,
    receivedAt: { type: DataTypes.DATE(3), allowNull: false },
    report: { type: DataTypes.TEXT, allowNull: false },
    clockOffsetMs: { type: DataTypes.DOUBLE, allowNull: true },
    temperatureC: { type: DataTypes.DOUBLE, allowNull: true },
  });
  await qi.addIndex('device_heartbeats', ['stationId', 'receivedAt'], { name: 'heartbeats_station_time' });
  await qi.createTable('device_transmissions', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    stationId: station,
    startedAt: { type: DataTypes.DATE(3), allowNull: false },
    bandId: { type: DataTypes.STRING(8), allowNull: false },
    frequencyHz: { type: DataTypes.DOUBLE, allowNull: false },
    messageText: { type: DataTypes.STRING(40), allowNull: false },
    receivedAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('device_transmissions', ['stationId', 'startedAt'], { name: 'transmissions_station_time' });
  await qi.createTable('alert_settings', {
    stationId: { ...station, primaryKey: true },
    silentMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 30 },
    clockOffsetMs: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1000 },
    updatedAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.createTable('alerts', {
    id,
    stationId: station,
    rule: { type: DataTypes.STRING(30), allowNull: false },
    message: { type: DataTypes.STRING(300), allowNull: false },
    openedAt: { type: DataTypes.DATE(3), allowNull: false },
    lastSeenAt: { type: DataTypes.DATE(3), allowNull: false },
    resolvedAt: { type: DataTypes.DATE(3), allowNull: true },
    mailedAt: { type: DataTypes.DATE(3), allowNull: true },
    // Non-null only while open, so at most one open alert per station and rule.
    openKey: { type: DataTypes.STRING(60), allowNull: true, unique: true },
  });
  await qi.createTable('job_locks', {
    name: { type: DataTypes.STRING(40), primaryKey: true },
    lastRunAt: { type: DataTypes.DATE(3), allowNull: true },
  });
  await qi.bulkInsert('job_locks', [{ name: 'alerts', lastRunAt: null }]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ['job_locks', 'alerts', 'alert_settings', 'device_transmissions', 'device_heartbeats', 'device_tokens'])
    await qi.dropTable(table);
}
