/**
 * Listening-post tokens: only their SHA-256 is stored. Known tokens are kept in memory for a short while; a
 * rotation or deletion in this process drops the post's entry at once (other processes within DEVICE_CACHE_MS).
 */
import { randomBytes } from 'node:crypto';
import { LRUCache } from 'lru-cache';
import { AppError } from '../../lib/app-error';
import type { UnknownTokenGuard } from '../../lib/unknown-token-guard';
import { hashToken } from '../devices/tokens.service';
import { findByTokenHash, type PostIdentity } from './listening-posts.repo';

export const newPostToken = () => `flp_${randomBytes(24).toString('base64url')}`;
export { hashToken };

const known = new LRUCache<string, { post: PostIdentity; atMs: number }>({ max: 50_000 });

/** Drops every cached token of the post (call after the rotation or deletion committed). */
export function forgetPostTokens(postId: number) {
  for (const [token, hit] of known.entries()) if (hit.post.postId === postId) known.delete(token);
}

/** `guard` keeps unknown tokens away from the database; `address` is the client's, for its throttle. */
export async function authenticatePost(
  authorization: string | undefined,
  cacheMs: number,
  guard: UnknownTokenGuard,
  address = '',
): Promise<PostIdentity> {
  const match = /^Bearer\s+(\S+)$/i.exec(authorization ?? '');
  if (!match) throw new AppError('unauthenticated', 'Send the listening post token as "Authorization: Bearer <token>"');
  const token = match[1];
  const hit = known.get(token);
  if (hit && Date.now() - hit.atMs < cacheMs) return hit.post;
  guard.screen(token, address);
  const post = await findByTokenHash(hashToken(token));
  if (!post) {
    known.delete(token);
    throw guard.remember(token, address);
  }
  known.set(token, { post, atMs: Date.now() });
  return post;
}
