import { LRUCache } from 'lru-cache';
import { AppError } from './app-error';
import { SlidingWindowStore } from './sliding-window-store';

/** Longer than any token Faintline issues; refused without a lookup. */
const MAX_TOKEN_LENGTH = 100;

/**
 * Keeps requests with unknown bearer tokens away from the database. A token once found unknown is remembered (bounded,
 * for `ttlMs`) and refused from memory; an address that sends more than `perAddressPerMinute` unknown tokens is refused
 * with 429 before any lookup. Remembering is safe: tokens are 192 random bits made when issued, so a token seen
 * unknown never becomes valid later (a revoked one stays revoked).
 */
export function createUnknownTokenGuard({
  what,
  perAddressPerMinute,
  maxTokens = 100_000,
  ttlMs = 10 * 60_000,
  now,
}: {
  what: string;
  perAddressPerMinute: number;
  maxTokens?: number;
  ttlMs?: number;
  now?: () => number;
}) {
  const unknown = new LRUCache<string, true>({ max: maxTokens, ttl: ttlMs });
  const failures = new SlidingWindowStore({ windowMs: 60_000, maxKeys: 50_000, now });
  const refused = () => new AppError('unauthenticated', `This ${what} token is not valid (revoked or rotated?)`);

  function throttled(address: string) {
    if (failures.get(address).totalHits < perAddressPerMinute) return;
    throw new AppError('rate-limited', `Too many requests with unknown ${what} tokens from this address: try again in a minute`);
  }

  return {
    /** Before the lookup: throws when the address is throttled or the token is already known to be unknown. */
    screen(token: string, address: string) {
      throttled(address);
      if (token.length > MAX_TOKEN_LENGTH || unknown.has(token)) {
        failures.increment(address);
        throw refused();
      }
    },
    /** After a lookup found nothing: remembers the token, counts the failure against the address, returns the error to throw. */
    remember(token: string, address: string): AppError {
      unknown.set(token, true);
      failures.increment(address);
      return refused();
    },
    /** How many unknown tokens are remembered (for tests and figures). */
    get size() {
      return unknown.size;
    },
  };
}

export type UnknownTokenGuard = ReturnType<typeof createUnknownTokenGuard>;
