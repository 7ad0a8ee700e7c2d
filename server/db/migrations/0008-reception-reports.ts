import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const owner = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' };
const timestamps = { createdAt: { type: DataTypes.DATE(3), allowNull: false }, updatedAt: { type: DataTypes.DATE(3), allowNull: false } };

/**
 * Reception reports and the aggregates kept beside them. Reports are the largest table by far, so it carries
 * no foreign keys (each would cost a lookup per inserted row) and only the indexes the reading queries use.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('listening_posts', {
    id,
    ownerId: owner,
    name: { type: DataTypes.STRING(80), allowNull: false },
    callsign: { type: DataTypes.STRING(12), allowNull: false },
    locator: { type: DataTypes.STRING(8), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: true, unique: true },
    tokenIssuedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  // One row per arrival (a listening post's POST or an import's chunk): where reports came from and who brought them.
  await qi.createTable('reception_batches', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    importerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    listeningPostId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    importId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    accepted: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    duplicates: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    receivedAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.createTable('reception_reports', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    slotStart: { type: DataTypes.DATE, allowNull: false },
    bandId: { type: DataTypes.STRING(8), allowNull: false },
    txCallsign: { type: DataTypes.STRING(12), allowNull: false },
    txLocator: { type: DataTypes.STRING(8), allowNull: true },
    txPowerDbm: { type: DataTypes.TINYINT, allowNull: true },
    rxCallsign: { type: DataTypes.STRING(12), allowNull: false },
    rxLocator: { type: DataTypes.STRING(8), allowNull: false },
    snrDb: { type: DataTypes.SMALLINT, allowNull: false },
    frequencyHz: { type: DataTypes.DOUBLE, allowNull: false },
    driftHz: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 0 },
    distanceKm: { type: DataTypes.FLOAT, allowNull: true },
    bearingDeg: { type: DataTypes.FLOAT, allowNull: true },
    /** heard minus the tones' centre the plan meant for that slot; null without a plan */
    frequencyErrorHz: { type: DataTypes.FLOAT, allowNull: true },
    stationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    ambiguous: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    importerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    batchId: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
  });
  // The same decode arriving twice is stored once, however it arrived.
  await qi.addIndex('reception_reports', ['txCallsign', 'rxCallsign', 'slotStart', 'bandId'], { name: 'reports_decode', unique: true });
  await qi.addIndex('reception_reports', ['stationId', 'slotStart'], { name: 'reports_station_time' });
  await qi.addIndex('reception_reports', ['importerId', 'slotStart'], { name: 'reports_importer_time' });
  await qi.addIndex('reception_reports', ['batchId'], { name: 'reports_batch' });

  // Aggregates, kept up to date in the transaction that stores the reports (screens never scan every report).
  await qi.createTable('reception_slot_counts', {
    stationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
    slotStart: { type: DataTypes.DATE, allowNull: false, primaryKey: true },
    bandId: { type: DataTypes.STRING(8), allowNull: false, primaryKey: true },
    reports: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    bestSnrDb: { type: DataTypes.SMALLINT, allowNull: false },
  });
  await qi.createTable('reception_receiver_days', {
    stationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
    day: { type: DataTypes.DATEONLY, allowNull: false, primaryKey: true },
    bandId: { type: DataTypes.STRING(8), allowNull: false, primaryKey: true },
    rxCallsign: { type: DataTypes.STRING(12), allowNull: false, primaryKey: true },
    rxLocator: { type: DataTypes.STRING(8), allowNull: false },
    distanceKm: { type: DataTypes.FLOAT, allowNull: true },
    bearingDeg: { type: DataTypes.FLOAT, allowNull: true },
    reports: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    bestSnrDb: { type: DataTypes.SMALLINT, allowNull: false },
    bestSnrPerWattDb: { type: DataTypes.FLOAT, allowNull: true },
    lastSlotStart: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ['reception_receiver_days', 'reception_slot_counts', 'reception_reports', 'reception_batches', 'listening_posts'])
    await qi.dropTable(table);
}
