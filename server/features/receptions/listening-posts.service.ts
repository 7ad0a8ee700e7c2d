import type { Sequelize, Transaction } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import type { ListeningPost } from '@/shared/api/receptions';
import type { ListeningPostInput } from '@/shared/schemas';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import { membersOfClubs, ownerInClubs } from './access.repo';
import * as repo from './listening-posts.repo';
import { forgetPostTokens, hashToken, newPostToken } from './post-tokens';

const notFound = (id: number) => new AppError('not-found', `Listening post ${id} does not exist`);

/** Own posts; with `withClubs`, also the posts of members of the clubs the caller administers. */
export async function listFor(sequelize: Sequelize, user: SessionUser, withClubs = false): Promise<ListeningPost[]> {
  const ownerIds = new Set([user.id]);
  if (withClubs) for (const id of await membersOfClubs(sequelize, user.adminOfClubIds)) ownerIds.add(id);
  return repo.findByOwners(sequelize, [...ownerIds]);
}

/** The owner reads a post, and so do the admins of the owner's clubs; anyone else is told it does not exist. */
export async function getFor(sequelize: Sequelize, user: SessionUser, id: number) {
  const post = await repo.findById(sequelize, id);
  if (!post) throw notFound(id);
  if (post.ownerId !== user.id && !(await ownerInClubs(sequelize, user.adminOfClubIds, post.ownerId))) throw notFound(id);
  return post;
}

async function getOwnedBy(sequelize: Sequelize, user: SessionUser, id: number) {
  const post = await getFor(sequelize, user, id);
  if (post.ownerId !== user.id) throw new AppError('forbidden', `Only the owner of listening post ${post.name} can change it`);
  return post;
}

export async function create(sequelize: Sequelize, user: SessionUser, input: ListeningPostInput) {
  return sequelize.transaction(async (transaction) => {
    const post = await repo.insert({ ownerId: user.id, name: input.name, callsign: input.callsign, locator: input.locator }, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'listening-post.create',
        entityType: 'listening-post',
        entityId: post.id,
        summary: `Registered listening post ${post.name} (${post.callsign}, ${post.locator})`,
        after: { name: post.name, callsign: post.callsign, locator: post.locator },
      },
      transaction,
    );
    return post;
  });
}

/** Issues a new token (shown once); the previous one stops at once. */
export async function rotateToken(sequelize: Sequelize, user: SessionUser, id: number, now = new Date()) {
  const post = await getOwnedBy(sequelize, user, id);
  const token = newPostToken();
  await sequelize.transaction(async (transaction) => {
    await repo.setToken(id, hashToken(token), now, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: post.hasToken ? 'listening-post.rotate' : 'listening-post.token',
        entityType: 'listening-post',
        entityId: id,
        summary: `${post.hasToken ? 'Rotated' : 'Issued'} the token of listening post ${post.name}`,
      },
      transaction,
    );
    transaction.afterCommit(() => forgetPostTokens(id));
  });
  return token;
}

/** Deletes the post and its token; the reports it sent stay (they are the importer's, counted where they belong). */
export async function remove(sequelize: Sequelize, user: SessionUser, id: number) {
  const post = await getOwnedBy(sequelize, user, id);
  await sequelize.transaction(async (transaction) => {
    await repo.remove(id, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'listening-post.delete',
        entityType: 'listening-post',
        entityId: id,
        summary: `Deleted listening post ${post.name}`,
        before: { name: post.name, callsign: post.callsign, locator: post.locator },
      },
      transaction,
    );
    transaction.afterCommit(() => forgetPostTokens(id));
  });
}

/** Deletes every post of an owner (their tokens stop on commit); the reports they sent stay. For account deletion. */
export async function removeAllOwnedBy(ownerId: number, transaction: Transaction) {
  const ids = await repo.removeAllOfOwner(ownerId, transaction);
  transaction.afterCommit(() => ids.forEach((id) => forgetPostTokens(id)));
  return ids.length;
}
