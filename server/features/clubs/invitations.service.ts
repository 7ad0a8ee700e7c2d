import { createHash, randomBytes } from 'node:crypto';
import { Op, type Sequelize } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import type { Invitation } from '@/shared/schemas';
import { InvitationModel } from '../../db/models/club-extras.model';
import { MembershipModel } from '../../db/models/membership.model';
import { AppError } from '../../lib/app-error';
import type { OutgoingMail } from '../../mail/mailer';
import * as audit from '../audit/audit.service';
import { requireAdmin } from './access';

export const INVITATION_LIFETIME_DAYS = 7;
const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

const toInvitation = (row: InvitationModel): Invitation => ({
  id: row.id,
  email: row.email,
  expiresAt: row.expiresAt.toISOString(),
  acceptedAt: row.acceptedAt?.toISOString() ?? null,
  createdAt: row.createdAt.toISOString(),
});

/** Creates an invitation and returns the mail to send once the write has committed. */
export async function invite(sequelize: Sequelize, user: SessionUser, clubId: number, email: string, webOrigin: string, now = new Date()) {
  const { club } = await requireAdmin(user, clubId);
  const token = randomBytes(32).toString('base64url');
  const row = await sequelize.transaction(async (transaction) => {
    const created = await InvitationModel.create(
      {
        clubId,
        email,
        tokenHash: sha256(token),
        invitedById: user.id,
        expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_DAYS * 86_400_000),
        acceptedAt: null,
        acceptedById: null,
      },
      { transaction },
    );
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId,
        action: 'invitation.create',
        entityType: 'invitation',
        entityId: created.id,
        summary: `Invited ${email}`,
      },
      transaction,
    );
    return created;
  });
  const link = `${webOrigin}/join?token=${encodeURIComponent(token)}`;
  const mail: OutgoingMail = {
    to: email,
    subject: `You are invited to ${club.name} on Faintline`,
    text: `Hello,\n\n${user.displayName} invites you to join ${club.name}, a club that coordinates WSPR beacons on Faintline. Its admins will see your stations and can help keep club beacons out of each other's way.\n\nSign in (or create an account with this e-mail address) and open this link within ${INVITATION_LIFETIME_DAYS} days; it works once:\n\n${link}\n\nIf you did not expect this, ignore the mail.\n`,
  };
  return { invitation: toInvitation(row), mail };
}

export async function listPending(user: SessionUser, clubId: number, now = new Date()) {
  await requireAdmin(user, clubId);
  const rows = await InvitationModel.findAll({ where: { clubId, acceptedAt: null, expiresAt: { [Op.gt]: now } }, order: [['id', 'DESC']] });
  return rows.map(toInvitation);
}

/** Joins the club the invitation names: once, before it expires, for the address it was sent to. */
export async function accept(sequelize: Sequelize, user: SessionUser, token: string, now = new Date()) {
  return sequelize.transaction(async (transaction) => {
    const row = await InvitationModel.findOne({ where: { tokenHash: sha256(token) }, transaction, lock: transaction.LOCK.UPDATE });
    const invalid = (reason: string) => new AppError('bad-request', reason, { token: reason });
    if (!row) throw invalid('This invitation link is not valid. Ask the club admin for a new one.');
    if (row.acceptedAt) throw invalid('This invitation was already used. Ask the club admin for a new one if you need it.');
    if (row.expiresAt <= now) throw invalid('This invitation has expired. Ask the club admin for a new one.');
    if (row.email !== user.email) {
      throw new AppError('forbidden', `This invitation was sent to ${row.email}; sign in with that address to accept it`);
    }
    const existing = await MembershipModel.findOne({ where: { clubId: row.clubId, userId: user.id }, transaction });
    if (!existing) await MembershipModel.create({ clubId: row.clubId, userId: user.id, role: 'member' }, { transaction });
    await row.update({ acceptedAt: now, acceptedById: user.id }, { transaction });
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId: row.clubId,
        action: 'member.join',
        entityType: 'membership',
        entityId: user.id,
        summary: 'Joined the club through an invitation',
      },
      transaction,
    );
    return { clubId: row.clubId };
  });
}
