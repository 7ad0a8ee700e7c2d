import type { SessionUser } from '@/shared/api/contracts';
import type { Station, StationInput, StationPatch } from '@/shared/schemas';
import { AppError } from '../../lib/app-error';
import { adminSharesClubWith } from '../clubs/clubs.repo';
import * as repo from './stations.repo';

const notFound = (id: number) => new AppError('not-found', `Station ${id} does not exist`);

export const listFor = (user: SessionUser) => repo.findByOwner(user.id);

/** Owners read their stations; a club admin reads the stations of the club's members. */
export async function getFor(user: SessionUser, id: number): Promise<Station> {
  const station = await repo.findById(id);
  if (!station) throw notFound(id);
  if (station.ownerId !== user.id && !(await adminSharesClubWith(user.id, user.adminOfClubIds, station.ownerId))) {
    throw notFound(id); // do not reveal that it exists
  }
  return station;
}

/** Only the owner changes a station; an admin who can read it is told why not. */
async function getOwnedBy(user: SessionUser, id: number) {
  const station = await getFor(user, id);
  if (station.ownerId !== user.id) {
    throw new AppError('forbidden', `Station ${id} belongs to ${station.ownerName}; only its owner can change it`);
  }
  return station;
}

export const create = (user: SessionUser, input: Required<StationInput>) => repo.insert(user.id, input);

export async function update(user: SessionUser, id: number, patch: StationPatch) {
  await getOwnedBy(user, id);
  return repo.update(id, patch);
}

export async function remove(user: SessionUser, id: number) {
  await getOwnedBy(user, id);
  await repo.remove(id);
}
