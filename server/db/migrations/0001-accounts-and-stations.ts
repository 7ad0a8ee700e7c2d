import { DataTypes, type QueryInterface } from 'sequelize';
import { id, ref, timestamps } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('users', {
    id,
    email: { type: DataTypes.STRING(190), allowNull: false, unique: true },
    displayName: { type: DataTypes.STRING(80), allowNull: false },
    callsign: { type: DataTypes.STRING(12), allowNull: true },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('clubs', { id, name: { type: DataTypes.STRING(120), allowNull: false }, ...timestamps });
  await qi.createTable('club_memberships', {
    id,
    clubId: ref('clubs'),
    userId: ref('users'),
    role: { type: DataTypes.ENUM('member', 'admin'), allowNull: false, defaultValue: 'member' },
    ...timestamps,
  });
  await qi.addIndex('club_memberships', ['clubId', 'userId'], { unique: true, name: 'club_memberships_club_user' });
  await qi.createTable('stations', {
    id,
    ownerId: ref('users'),
    name: { type: DataTypes.STRING(80), allowNull: false },
    callsign: { type: DataTypes.STRING(12), allowNull: false },
    locator: { type: DataTypes.STRING(8), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('stations', ['ownerId'], { name: 'stations_owner' });
  await qi.createTable('password_resets', {
    id,
    userId: ref('users'),
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    usedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  // The session store's table (connect-session-sequelize's default model).
  await qi.createTable('Sessions', {
    sid: { type: DataTypes.STRING(36), primaryKey: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('Sessions', ['expires'], { name: 'sessions_expires' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of ['Sessions', 'password_resets', 'stations', 'club_memberships', 'clubs', 'users']) {
    await qi.dropTable(table);
  }
}
