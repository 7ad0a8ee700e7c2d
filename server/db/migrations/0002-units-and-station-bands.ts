import { DataTypes, type QueryInterface } from 'sequelize';
import { id, ref, timestamps } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('units', {
    id,
    ownerId: ref('users'),
    name: { type: DataTypes.STRING(80), allowNull: false },
    // The hardware description as validated JSON (filters, amplifier, antenna and the rest).
    spec: { type: DataTypes.TEXT('medium'), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('units', ['ownerId'], { name: 'units_owner' });
  await qi.createTable('unit_photos', {
    id,
    unitId: ref('units'),
    storageKey: { type: DataTypes.STRING(200), allowNull: false },
    thumbKey: { type: DataTypes.STRING(200), allowNull: false },
    contentType: { type: DataTypes.STRING(40), allowNull: false },
    bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    ...timestamps,
  });
  await qi.addColumn('stations', 'unitId', ref('units', true, 'SET NULL'));
  await qi.addColumn('stations', 'region', { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'itu1' });
  await qi.addColumn('stations', 'audioOffsetHz', { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 1500 });
  await qi.addColumn('stations', 'transmitEnabled', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  await qi.addColumn('stations', 'referenceErrorPpm', { type: DataTypes.DOUBLE, allowNull: true });
  await qi.createTable('station_bands', {
    id,
    stationId: ref('stations'),
    bandId: { type: DataTypes.STRING(8), allowNull: false },
    enabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    calibrationOffsetHz: { type: DataTypes.DOUBLE, allowNull: true },
    calibrationSource: { type: DataTypes.STRING(10), allowNull: true },
    calibratedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('station_bands', ['stationId', 'bandId'], { unique: true, name: 'station_bands_station_band' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('station_bands');
  for (const column of ['referenceErrorPpm', 'transmitEnabled', 'audioOffsetHz', 'region']) await qi.removeColumn('stations', column);
  await qi.removeConstraint('stations', 'stations_unitId_foreign_idx').catch(() => undefined);
  await qi.removeColumn('stations', 'unitId');
  await qi.dropTable('unit_photos');
  await qi.dropTable('units');
}
