import type { Transaction } from 'sequelize';
import type { AuditEntry } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import type { TransactionRunner } from '../../db/transaction';
import * as repo from './audit.repo';

export type AuditRecord = {
  actor: Pick<SessionUser, 'id' | 'displayName'>;
  ownerId: number;
  clubId?: number | null;
  action: string;
  entityType:
    | 'user'
    | 'station'
    | 'unit'
    | 'band'
    | 'calibration'
    | 'schedule'
    | 'club'
    | 'membership'
    | 'invitation'
    | 'proposal'
    | 'suspension'
    | 'photo'
    | 'listening-post';
  entityId?: number | null;
  summary: string;
  before?: unknown;
  after?: unknown;
};

/** Records who changed what, before and after, when (UTC). Call inside the write's transaction. */
export async function record(entry: AuditRecord, transaction?: Transaction) {
  await repo.insert(
    {
      at: new Date(),
      actorId: entry.actor.id,
      actorName: entry.actor.displayName,
      ownerId: entry.ownerId,
      clubId: entry.clubId ?? null,
      action: entry.action,
      entityType: entry.entityType,
      entityId: entry.entityId ?? null,
      summary: entry.summary.slice(0, 300),
      before: entry.before === undefined ? null : JSON.stringify(entry.before),
      after: entry.after === undefined ? null : JSON.stringify(entry.after),
    },
    transaction,
  );
}

function toEntry(row: Awaited<ReturnType<typeof repo.findForOwner>>[number]): AuditEntry {
  return {
    id: Number(row.id),
    atUtc: row.at.toISOString(),
    actorName: row.actorName,
    ownerId: row.ownerId,
    clubId: row.clubId,
    action: row.action,
    entityType: row.entityType,
    entityId: row.entityId,
    summary: row.summary,
    before: row.before ? JSON.parse(row.before) : null,
    after: row.after ? JSON.parse(row.after) : null,
  };
}

/** A deleted account's own log goes with it; what its clubs' logs recorded stays there. */
export const forgetOwnLog = (ownerId: number, transaction: Transaction) => repo.removeOwnLog(ownerId, transaction);

/** An operator's own log: changes to their things, by anyone. */
export async function listForOwner(ownerId: number) {
  return (await repo.findForOwner(ownerId)).map(toEntry);
}

/** A club's log: the club's own actions and changes to its members' things. */
export async function listForClub(clubId: number, memberIds: number[]) {
  return (await repo.findForClub(clubId, memberIds)).map(toEntry);
}

const csvCell = (value: unknown) => {
  const text = value === null || value === undefined ? '' : typeof value === 'string' ? value : JSON.stringify(value);
  // Quote every cell; a leading = + - @ is neutralised so spreadsheets do not run it as a formula.
  const safe = /^[=+\-@]/.test(text) ? `'${text}` : text;
  return `"${safe.replace(/"/g, '""')}"`;
};

export function toCsv(entries: AuditEntry[]) {
  const header = ['time_utc', 'who', 'action', 'what', 'id', 'summary', 'before', 'after'];
  const lines = entries.map((e) =>
    [e.atUtc, e.actorName, e.action, e.entityType, e.entityId, e.summary, e.before, e.after].map(csvCell).join(','),
  );
  return [header.join(','), ...lines].join('\r\n') + '\r\n';
}

/** An owner's change to their own things and its log entry, in one transaction; `entry` may read what the write returned. */
export function ownChange<T>(
  db: TransactionRunner,
  user: AuditRecord['actor'],
  write: (transaction: Transaction) => Promise<T>,
  entry: (result: T) => Omit<AuditRecord, 'actor' | 'ownerId'>,
): Promise<T> {
  return db.transaction(async (transaction) => {
    const result = await write(transaction);
    await record({ actor: user, ownerId: user.id, ...entry(result) }, transaction);
    return result;
  });
}
