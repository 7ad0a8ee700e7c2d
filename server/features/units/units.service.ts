import type { SessionUser } from '@/shared/api/contracts';
import { unitInput, type Unit, type UnitValues } from '@/shared/schemas';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import { adminSharesClubWith } from '../clubs/access';
import * as repo from './units.repo';

const notFound = (id: number) => new AppError('not-found', `Unit ${id} does not exist`);

export const listFor = (user: SessionUser) => repo.findByOwner(user.id);

/** For other features (a station's unit), which decide themselves who may see it. */
export const unitById = (id: number | null) => (id === null ? Promise.resolve(null) : repo.findById(id));

/** Owners read their units; a club admin reads the units of the club's members. */
export async function getFor(user: SessionUser, id: number): Promise<Unit> {
  const unit = await repo.findById(id);
  if (!unit) throw notFound(id);
  if (unit.ownerId !== user.id && !(await adminSharesClubWith(user.id, user.adminOfClubIds, unit.ownerId))) throw notFound(id);
  return unit;
}

export async function getOwnedBy(user: SessionUser, id: number): Promise<Unit> {
  const unit = await getFor(user, id);
  if (unit.ownerId !== user.id) throw new AppError('forbidden', `Unit ${id} belongs to ${unit.ownerName}; only its owner can change it`);
  return unit;
}

const specOf = ({ id: _i, ownerId: _o, ownerName: _n, photos: _p, createdAt: _c, updatedAt: _u, ...values }: Unit) => values;

export function create(db: TransactionRunner, user: SessionUser, values: UnitValues, summary = `Registered unit ${values.name}`) {
  return audit.ownChange(
    db,
    user,
    (transaction) => repo.insert(user.id, values, transaction),
    (unit) => ({ action: 'unit.create', entityType: 'unit', entityId: unit.id, summary, after: values }),
  );
}

export async function update(db: TransactionRunner, user: SessionUser, id: number, patch: Partial<UnitValues>) {
  const before = specOf(await getOwnedBy(user, id));
  const values = unitInput.parse({ ...before, ...patch });
  return audit.ownChange(
    db,
    user,
    (transaction) => repo.update(id, values, transaction),
    (unit) => ({
      action: 'unit.update',
      entityType: 'unit',
      entityId: id,
      summary: `Changed ${Object.keys(patch).join(', ')} of unit ${unit.name}`,
      before,
      after: values,
    }),
  );
}

/** A new unit with the same hardware (photos stay with the original). */
export async function copy(db: TransactionRunner, user: SessionUser, id: number) {
  const values = specOf(await getFor(user, id));
  return create(db, user, { ...values, name: `${values.name} (copy)`.slice(0, 80), serialLabel: '' }, `Copied unit ${values.name}`);
}

export async function remove(db: TransactionRunner, user: SessionUser, id: number) {
  const unit = await getOwnedBy(user, id);
  const photos = await repo.photosOf(id);
  await audit.ownChange(
    db,
    user,
    (transaction) => repo.remove(id, transaction),
    () => ({ action: 'unit.delete', entityType: 'unit', entityId: id, summary: `Deleted unit ${unit.name}`, before: specOf(unit) }),
  );
  return photos;
}
