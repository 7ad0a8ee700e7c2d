import type { SessionUser } from '@/shared/api/contracts';
import { unitInput, type Unit, type UnitValues } from '@/shared/schemas';
import { AppError } from '../../lib/app-error';
import { adminSharesClubWith } from '../clubs/clubs.repo';
import * as repo from './units.repo';

const notFound = (id: number) => new AppError('not-found', `Unit ${id} does not exist`);

export const listFor = (user: SessionUser) => repo.findByOwner(user.id);

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

export const create = (user: SessionUser, values: UnitValues) => repo.insert(user.id, values);

export async function update(user: SessionUser, id: number, patch: Partial<UnitValues>) {
  const unit = await getOwnedBy(user, id);
  const { id: _i, ownerId: _o, ownerName: _n, photos: _p, createdAt: _c, updatedAt: _u, ...current } = unit;
  return repo.update(id, unitInput.parse({ ...current, ...patch }));
}

/** A new unit with the same hardware (photos stay with the original). */
export async function copy(user: SessionUser, id: number) {
  const unit = await getFor(user, id);
  const { id: _i, ownerId: _o, ownerName: _n, photos: _p, createdAt: _c, updatedAt: _u, ...values } = unit;
  return repo.insert(user.id, { ...values, name: `${values.name} (copy)`.slice(0, 80), serialLabel: '' });
}

export async function remove(user: SessionUser, id: number) {
  await getOwnedBy(user, id);
  const photos = await repo.photosOf(id);
  await repo.remove(id);
  return photos;
}
