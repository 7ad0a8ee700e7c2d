import type { SessionUser } from '@/shared/api/contracts';
import type { OffsetProposal } from '@/shared/schemas';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import type { OutgoingMail } from '../../mail/mailer';
import * as audit from '../audit/audit.service';
import { contactOf } from '../auth/auth.service';
import { notify } from '../notifications/notifications.service';
import * as stations from '../stations/stations.service';
import { memberIdsOf, requireAdmin } from './access';
import { findClub } from './clubs.repo';
import * as repo from './proposals.repo';

/** The station, if its owner belongs to the club or (for lifting) the club suspended it. */
async function clubStation(clubId: number, stationId: number, { suspendedByThisClub = false } = {}) {
  const station = await stations.stationById(stationId);
  const ours = station && suspendedByThisClub && station.suspension?.clubId === clubId;
  if (!station || (!ours && !(await memberIdsOf(clubId)).includes(station.ownerId)))
    throw new AppError('not-found', `Station ${stationId} is not a station of this club`);
  const owner = (await contactOf(station.ownerId))!;
  return { station, owner };
}

export async function suspend(db: TransactionRunner, user: SessionUser, clubId: number, stationId: number, reason: string) {
  const { club } = await requireAdmin(user, clubId);
  const { station, owner } = await clubStation(clubId, stationId);
  if (station.suspension) throw new AppError('conflict', `${station.name} is already suspended`);
  await db.transaction(async (transaction) => {
    await stations.setSuspension(
      stationId,
      { reason, clubId, clubName: club.name, byUserId: user.id, byName: user.displayName },
      transaction,
    );
    await notify(owner.id, 'suspension', `${club.name} suspended ${station.name}: ${reason}`, `/stations/${stationId}`, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: owner.id,
        clubId,
        action: 'station.suspend',
        entityType: 'suspension',
        entityId: stationId,
        summary: `Suspended ${station.name} (${station.callsign}): ${reason}`,
        before: { suspended: false },
        after: { suspended: true, reason },
      },
      transaction,
    );
  });
  const mail: OutgoingMail = {
    to: owner.email,
    subject: `${station.name} is suspended by ${club.name}`,
    text: `Hello ${owner.displayName},\n\nAn admin of ${club.name} suspended your station ${station.name} (${station.callsign}) on Faintline:\n\n  ${reason}\n\nIts plan is empty and its device configuration says "suspended" until the admin lifts it. Please switch the beacon off and talk to the club.\n`,
  };
  return { mail };
}

export async function lift(db: TransactionRunner, user: SessionUser, clubId: number, stationId: number) {
  const { club } = await requireAdmin(user, clubId);
  // A suspension stays with the club that made it: its admins can lift it even after the owner left.
  const { station, owner } = await clubStation(clubId, stationId, { suspendedByThisClub: true });
  if (!station.suspension) throw new AppError('conflict', `${station.name} is not suspended`);
  if (station.suspension.clubId !== null && station.suspension.clubId !== clubId) {
    throw new AppError(
      'forbidden',
      `${station.name} was suspended by ${station.suspension.clubName ?? 'another club'}; only its admins can lift it`,
    );
  }
  await db.transaction(async (transaction) => {
    await stations.setSuspension(stationId, null, transaction);
    await notify(
      owner.id,
      'suspension-lifted',
      `${club.name} lifted the suspension of ${station.name}`,
      `/stations/${stationId}`,
      transaction,
    );
    await audit.record(
      {
        actor: user,
        ownerId: owner.id,
        clubId,
        action: 'station.lift',
        entityType: 'suspension',
        entityId: stationId,
        summary: `Lifted the suspension of ${station.name}`,
        before: { suspended: true, reason: station.suspension?.reason },
        after: { suspended: false },
      },
      transaction,
    );
  });
  return {
    mail: {
      to: owner.email,
      subject: `${station.name} may transmit again`,
      text: `Hello ${owner.displayName},\n\nAn admin of ${club.name} lifted the suspension of ${station.name} (${station.callsign}). Its schedule applies again.\n`,
    } as OutgoingMail,
  };
}

async function toProposal(row: repo.ProposalRow): Promise<OffsetProposal> {
  const [club, station] = await Promise.all([findClub(row.clubId), stations.stationById(row.stationId)]);
  return {
    id: row.id,
    clubId: row.clubId,
    clubName: club?.name ?? '',
    stationId: row.stationId,
    stationName: station?.name ?? '',
    currentOffsetHz: row.currentOffsetHz,
    proposedOffsetHz: row.proposedOffsetHz,
    reason: row.reason,
    status: row.status,
    createdAt: row.createdAt.toISOString(),
    decidedAt: row.decidedAt?.toISOString() ?? null,
  };
}

/** An admin proposes an offset; the owner is told by mail and notice, and nothing changes until they accept. */
export async function propose(
  db: TransactionRunner,
  user: SessionUser,
  clubId: number,
  input: { stationId: number; proposedOffsetHz: number; reason: string },
) {
  const { club } = await requireAdmin(user, clubId);
  const { station, owner } = await clubStation(clubId, input.stationId);
  const row = await db.transaction(async (transaction) => {
    await repo.withdrawPending(station.id, new Date(), transaction);
    const created = await repo.insert(
      {
        clubId,
        stationId: station.id,
        proposedById: user.id,
        currentOffsetHz: station.audioOffsetHz,
        proposedOffsetHz: input.proposedOffsetHz,
        reason: input.reason,
      },
      transaction,
    );
    await notify(
      owner.id,
      'offset-proposal',
      `${club.name} proposes moving ${station.name} from ${station.audioOffsetHz} Hz to ${input.proposedOffsetHz} Hz audio offset`,
      '/proposals',
      transaction,
    );
    await audit.record(
      {
        actor: user,
        ownerId: owner.id,
        clubId,
        action: 'proposal.create',
        entityType: 'proposal',
        entityId: created.id,
        summary: `Proposed audio offset ${input.proposedOffsetHz} Hz for ${station.name}`,
        before: { audioOffsetHz: station.audioOffsetHz },
        after: { audioOffsetHz: input.proposedOffsetHz },
      },
      transaction,
    );
    return created;
  });
  const mail: OutgoingMail = {
    to: owner.email,
    subject: `${club.name} proposes a new audio offset for ${station.name}`,
    text: `Hello ${owner.displayName},\n\nTwo club stations meet in the same slots on the same band. An admin of ${club.name} proposes moving ${station.name} (${station.callsign}) from an audio offset of ${station.audioOffsetHz} Hz to ${input.proposedOffsetHz} Hz.\n\nReason: ${input.reason}\n\nNothing changes until you accept it in Faintline under Proposals.\n`,
  };
  return { proposal: await toProposal(row), mail };
}

export async function listMine(user: SessionUser) {
  const own = await stations.listFor(user);
  const rows = await repo.findForStations(own.map((s) => s.id));
  return Promise.all(rows.map(toProposal));
}

export async function decide(db: TransactionRunner, user: SessionUser, proposalId: number, accept: boolean) {
  return db.transaction(async (transaction) => {
    const row = await repo.findForUpdate(proposalId, transaction);
    const station = row ? await stations.stationById(row.stationId, transaction) : null;
    if (!row || !station || station.ownerId !== user.id) throw new AppError('not-found', `Proposal ${proposalId} does not exist`);
    if (row.status !== 'pending') throw new AppError('conflict', `This proposal was already ${row.status}`);
    await repo.decide(row, accept ? 'accepted' : 'declined', new Date(), transaction);
    if (accept) {
      await stations.setAudioOffset(station.id, row.proposedOffsetHz, transaction);
      await audit.record(
        {
          actor: user,
          ownerId: user.id,
          action: 'station.update',
          entityType: 'station',
          entityId: station.id,
          summary: `Accepted the club's audio offset ${row.proposedOffsetHz} Hz for ${station.name}`,
          before: { audioOffsetHz: station.audioOffsetHz },
          after: { audioOffsetHz: row.proposedOffsetHz },
        },
        transaction,
      );
    }
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId: row.clubId,
        action: accept ? 'proposal.accept' : 'proposal.decline',
        entityType: 'proposal',
        entityId: row.id,
        summary: `${accept ? 'Accepted' : 'Declined'} the proposed offset for ${station.name}`,
      },
      transaction,
    );
    return toProposal(row);
  });
}
