import { DataTypes, type QueryInterface } from 'sequelize';
import { id, ref, timestamps } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('schedules', {
    id,
    stationId: { ...ref('stations'), unique: true },
    // The validated rotation (shared `scheduleInput`) as JSON text.
    spec: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addColumn('stations', 'suspendedAt', { type: DataTypes.DATE(3), allowNull: true });
  await qi.addColumn('stations', 'suspendedReason', { type: DataTypes.STRING(300), allowNull: true });
  await qi.addColumn('stations', 'suspendedByClubId', ref('clubs', true, 'SET NULL'));
  await qi.addColumn('clubs', 'maxPowerDbm', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 30 });
  await qi.createTable('club_invitations', {
    id,
    clubId: ref('clubs'),
    email: { type: DataTypes.STRING(190), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invitedById: ref('users'),
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    acceptedAt: { type: DataTypes.DATE(3), allowNull: true },
    acceptedById: ref('users', true, 'SET NULL'),
    ...timestamps,
  });
  await qi.createTable('offset_proposals', {
    id,
    clubId: ref('clubs'),
    stationId: ref('stations'),
    proposedById: ref('users'),
    currentOffsetHz: { type: DataTypes.DOUBLE, allowNull: false },
    proposedOffsetHz: { type: DataTypes.DOUBLE, allowNull: false },
    reason: { type: DataTypes.STRING(300), allowNull: false },
    status: { type: DataTypes.ENUM('pending', 'accepted', 'declined', 'withdrawn'), allowNull: false, defaultValue: 'pending' },
    decidedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  await qi.createTable('notifications', {
    id,
    userId: ref('users'),
    kind: { type: DataTypes.STRING(40), allowNull: false },
    message: { type: DataTypes.STRING(500), allowNull: false },
    link: { type: DataTypes.STRING(200), allowNull: true },
    readAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('notifications', ['userId', 'readAt'], { name: 'notifications_user_read' });
  await qi.createTable('audit_entries', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    at: { type: DataTypes.DATE(3), allowNull: false },
    actorId: ref('users', true, 'SET NULL'),
    actorName: { type: DataTypes.STRING(80), allowNull: false },
    ownerId: ref('users', true, 'SET NULL'),
    clubId: ref('clubs', true, 'SET NULL'),
    action: { type: DataTypes.STRING(60), allowNull: false },
    entityType: { type: DataTypes.STRING(30), allowNull: false },
    entityId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    summary: { type: DataTypes.STRING(300), allowNull: false },
    before: { type: DataTypes.TEXT('medium'), allowNull: true },
    after: { type: DataTypes.TEXT('medium'), allowNull: true },
  });
  await qi.addIndex('audit_entries', ['ownerId', 'at'], { name: 'audit_owner_at' });
  await qi.addIndex('audit_entries', ['clubId', 'at'], { name: 'audit_club_at' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ['audit_entries', 'notifications', 'offset_proposals', 'club_invitations', 'schedules']) await qi.dropTable(table);
  await qi.removeColumn('clubs', 'maxPowerDbm');
  for (const column of ['suspendedByClubId', 'suspendedReason', 'suspendedAt']) await qi.removeColumn('stations', column);
}
