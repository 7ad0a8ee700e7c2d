import { DataTypes, type QueryInterface } from 'sequelize';
import { id, ref, timestamps } from './columns';

/** Pairing a device by a short code (RFC 8628), and the shared counter of wrong codes typed. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('device_pairings', {
    id,
    // both codes are stored as SHA-256 only
    deviceCodeHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    userCodeHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    // what the device will become: 'station' now; a listening post later is one more kind
    targetKind: { type: DataTypes.STRING(20), allowNull: false },
    targetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    status: { type: DataTypes.STRING(10), allowNull: false },
    model: { type: DataTypes.STRING(60), allowNull: true },
    firmware: { type: DataTypes.STRING(40), allowNull: true },
    intervalS: { type: DataTypes.INTEGER, allowNull: false },
    lastPolledAt: { type: DataTypes.DATE(3), allowNull: true },
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    decidedById: ref('users', true, 'SET NULL'),
    decidedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('device_pairings', ['expiresAt'], { name: 'device_pairings_expiry' });
  // fixed windows, one row per key (an account or an address), shared by every server process
  await qi.createTable('pairing_attempts', {
    attemptKey: { type: DataTypes.STRING(80), primaryKey: true },
    windowStart: { type: DataTypes.DATE(3), allowNull: false },
    attempts: { type: DataTypes.INTEGER, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('pairing_attempts');
  await qi.dropTable('device_pairings');
}
