import type { Transaction } from 'sequelize';

/**
 * The one way a service opens a transaction: it is handed a runner (the app's Sequelize instance,
 * passed down from createApp) and calls `db.transaction(async (transaction) => …)`. Repos take the
 * transaction as their last argument; nothing reaches a model's static `sequelize`.
 *
 * The runner made by createSequelize runs the whole callback again when the transaction meets a write
 * conflict (see `retryOnConflict`), so a callback must do nothing outside the database that cannot be
 * repeated: collect mails and other side effects and perform them after the transaction resolves.
 */
export type TransactionRunner = {
  transaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T>;
};

export type { Transaction };

/** MariaDB's answers to a transaction that lost a conflict and was rolled back (or may be retried whole). */
const CONFLICT_ERRNOS = new Set([
  1213, // ER_LOCK_DEADLOCK: an InnoDB deadlock, and how Galera reports a failed certification (also on COMMIT)
  1205, // ER_LOCK_WAIT_TIMEOUT
]);

type MaybeDriverError = { errno?: unknown; parent?: unknown; original?: unknown };

/** Whether an error is a write conflict that running the same transaction again may resolve. */
export function isWriteConflict(error: unknown): boolean {
  for (let e = error as MaybeDriverError | undefined, depth = 0; e && typeof e === 'object' && depth < 4; depth += 1) {
    if (typeof e.errno === 'number' && CONFLICT_ERRNOS.has(e.errno)) return true;
    e = (e.parent ?? e.original) as MaybeDriverError | undefined;
  }
  return false;
}

export type RetryOptions = {
  /** Runs in all, the first one included. */
  attempts?: number;
  /** The first wait; each further one doubles. The actual wait is drawn uniformly between 0 and it (full jitter). */
  baseDelayMs?: number;
  /** Told of each conflict that is retried (for logs and tests). */
  onRetry?: (error: unknown, attempt: number) => void;
  random?: () => number;
};

export const CONFLICT_ATTEMPTS = 5;

/**
 * Runs `attempt` and, when it fails with a write conflict, runs it again after a random wait, at most
 * `attempts` times in all; any other error, and the last conflict, is thrown at once. `attempt` must open
 * its own transaction each time (a conflict rolls the whole transaction back).
 */
export async function retryOnConflict<T>(
  attempt: () => Promise<T>,
  { attempts = CONFLICT_ATTEMPTS, baseDelayMs = 20, onRetry, random = Math.random }: RetryOptions = {},
): Promise<T> {
  for (let n = 1; ; n += 1) {
    try {
      return await attempt();
    } catch (error) {
      if (n >= attempts || !isWriteConflict(error)) throw error;
      onRetry?.(error, n);
      await new Promise((resolve) => setTimeout(resolve, random() * baseDelayMs * 2 ** (n - 1)));
    }
  }
}
