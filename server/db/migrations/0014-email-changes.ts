import { DataTypes, type QueryInterface } from 'sequelize';
import { id, ref, timestamps } from './columns';

/** A requested change of sign-in address, waiting for the link mailed to the new address; only the token's SHA-256 is kept. */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('email_changes', {
    id,
    userId: ref('users'),
    newEmail: { type: DataTypes.STRING(190), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    usedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('email_changes', ['userId', 'usedAt'], { name: 'email_changes_user' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('email_changes');
}
