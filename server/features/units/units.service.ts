import type { SessionUser } from '@/shared/api/contracts';
import { unitInput, type Unit, type UnitValues } from '@/shared/schemas';
import type { Transaction, TransactionRunner } from '../../db/transaction';
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

const specOf = ({ id: _i, ownerId: _o, ownerName: _n, photos: _p, createdAt: _c, updatedAt: _u, fittedFilter: _f, ...values }: Unit) =>
  values;

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
  // A club admin may read a member's unit, but a copy is the member's design: only its owner copies it.
  const unit = await getFor(user, id);
  if (unit.ownerId !== user.id) throw new AppError('forbidden', `Unit ${id} belongs to ${unit.ownerName}; only its owner can copy it`);
  const values = specOf(unit);
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

/** Deletes every unit of an owner; returns the stored photo files to delete once the transaction has committed. */
export const removeAllOwnedBy = (ownerId: number, transaction: Transaction) => repo.removeAllOfOwner(ownerId, transaction);

const bandList = (bands: readonly string[]) => bands.map((b) => b.replace(/m$/, ' m')).join('/');

/** "I fitted the 40 m filter": for hand-swapped filters, recorded with its UTC time and audited; it changes what may be planned. */
export async function recordFittedFilter(db: TransactionRunner, user: SessionUser, id: number, filterIndex: number, now = new Date()) {
  const unit = await getOwnedBy(user, id);
  if (unit.filterSelection !== 'hand') {
    throw new AppError('conflict', `Unit ${unit.name} does not have hand-swapped filters, so there is no fitted filter to record`, {
      filterIndex: 'Set the unit’s filter selection to “swapped by hand” first',
    });
  }
  const filter = unit.filters[filterIndex];
  if (!filter) {
    throw new AppError('bad-request', `Unit ${unit.name} has ${unit.filters.length} filters; there is no filter ${filterIndex + 1}`, {
      filterIndex: 'Choose one of the unit’s filters',
    });
  }
  return db.transaction(async (transaction) => {
    const updated = await repo.setFittedFilter(id, filterIndex, now, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'unit.filter-fitted',
        entityType: 'unit',
        entityId: id,
        summary: `Fitted the ${bandList(filter.bands)} filter in unit ${unit.name} at ${now.toISOString().slice(0, 16).replace('T', ' ')} UTC`,
        before: { fittedFilter: unit.fittedFilter },
        after: { fittedFilter: updated.fittedFilter },
      },
      transaction,
    );
    return updated;
  });
}
