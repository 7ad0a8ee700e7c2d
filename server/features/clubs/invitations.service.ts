import { createHash, randomBytes } from 'node:crypto';
import type { AcceptedInvitation } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import type { Invitation } from '@/shared/schemas';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import type { OutgoingMail } from '../../mail/mailer';
import * as audit from '../audit/audit.service';
import { requireAdmin } from './access';
import * as clubsRepo from './clubs.repo';
import * as repo from './invitations.repo';

export const INVITATION_LIFETIME_DAYS = 7;
const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

const toInvitation = (row: repo.InvitationRow): Invitation => ({
  id: row.id,
  email: row.email,
  expiresAt: row.expiresAt.toISOString(),
  acceptedAt: row.acceptedAt?.toISOString() ?? null,
  createdAt: row.createdAt.toISOString(),
});

function invitationMail(to: string, inviterName: string, clubName: string, link: string): OutgoingMail {
  return {
    to,
    subject: `You are invited to ${clubName} on Faintline`,
    text: `Hello,\n\n${inviterName} invites you to join ${clubName}, a club that coordinates WSPR beacons on Faintline. Its admins will see your stations and can help keep club beacons out of each other's way.\n\nSign in (or create an account with this e-mail address) and open this link within ${INVITATION_LIFETIME_DAYS} days; it works once:\n\n${link}\n\nIf you did not expect this, ignore the mail.\n`,
  };
}

const joinLink = (webOrigin: string, token: string) => `${webOrigin}/join?token=${encodeURIComponent(token)}`;

/** Withdraws a pending invitation: its link stops working. */
export async function revoke(db: TransactionRunner, user: SessionUser, clubId: number, invitationId: number, now = new Date()) {
  await requireAdmin(user, clubId);
  await db.transaction(async (transaction) => {
    const row = await repo.findPendingForUpdate(clubId, invitationId, now, transaction);
    if (!row) throw new AppError('not-found', 'This invitation is no longer waiting: it was answered, withdrawn or has expired');
    await repo.remove(row.id, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId,
        action: 'invitation.revoke',
        entityType: 'invitation',
        entityId: row.id,
        summary: `Withdrew the invitation to ${row.email}`,
      },
      transaction,
    );
  });
}

/** Sends a pending invitation again with a new link and a new expiry; the old link stops working. */
export async function resend(
  db: TransactionRunner,
  user: SessionUser,
  clubId: number,
  invitationId: number,
  webOrigin: string,
  now = new Date(),
) {
  const { club } = await requireAdmin(user, clubId);
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(now.getTime() + INVITATION_LIFETIME_DAYS * 86_400_000);
  const email = await db.transaction(async (transaction) => {
    const row = await repo.findPendingForUpdate(clubId, invitationId, now, transaction);
    if (!row) throw new AppError('not-found', 'This invitation is no longer waiting: it was answered, withdrawn or has expired');
    await repo.renew(row.id, sha256(token), expiresAt, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId,
        action: 'invitation.resend',
        entityType: 'invitation',
        entityId: row.id,
        summary: `Sent the invitation to ${row.email} again`,
      },
      transaction,
    );
    return row.email;
  });
  return { mail: invitationMail(email, user.displayName, club.name, joinLink(webOrigin, token)) };
}

/** Creates an invitation and returns the mail to send once the write has committed. */
export async function invite(db: TransactionRunner, user: SessionUser, clubId: number, email: string, webOrigin: string, now = new Date()) {
  const { club } = await requireAdmin(user, clubId);
  const token = randomBytes(32).toString('base64url');
  const row = await db.transaction(async (transaction) => {
    const created = await repo.insert(
      {
        clubId,
        email,
        tokenHash: sha256(token),
        invitedById: user.id,
        expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_DAYS * 86_400_000),
      },
      transaction,
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
  const mail = invitationMail(email, user.displayName, club.name, joinLink(webOrigin, token));
  return { invitation: toInvitation(row), mail };
}

export async function listPending(user: SessionUser, clubId: number, now = new Date()) {
  await requireAdmin(user, clubId);
  return (await repo.findPending(clubId, now)).map(toInvitation);
}

/** Joins the club the invitation names: once, before it expires, for the address it was sent to. */
export async function accept(db: TransactionRunner, user: SessionUser, token: string, now = new Date()) {
  return db.transaction(async (transaction) => {
    const row = await repo.findByTokenForUpdate(sha256(token), transaction);
    const invalid = (reason: string) => new AppError('bad-request', reason, { token: reason });
    if (!row) throw invalid('This invitation link is not valid. Ask the club admin for a new one.');
    if (row.acceptedAt) throw invalid('This invitation was already used. Ask the club admin for a new one if you need it.');
    if (row.expiresAt <= now) throw invalid('This invitation has expired. Ask the club admin for a new one.');
    if (row.email !== user.email) {
      throw new AppError('forbidden', `This invitation was sent to ${row.email}; sign in with that address to accept it`);
    }
    const existing = await clubsRepo.membershipOf(user.id, row.clubId, transaction);
    if (!existing) await clubsRepo.insertMembership({ clubId: row.clubId, userId: user.id, role: 'member' }, transaction);
    await repo.markAccepted(row.id, user.id, now, transaction);
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
    return { clubId: row.clubId } satisfies AcceptedInvitation;
  });
}
