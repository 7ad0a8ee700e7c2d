import { ConnectionError, TimeoutError } from 'sequelize';
import { isWriteConflict } from '../db/transaction';

// Driver codes (mariadb connector and node sockets) that mean "the server went away", not "this query was wrong".
const GONE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'ER_SOCKET',
  'ER_SOCKET_UNEXPECTED_CLOSE',
  'ER_SOCKET_TIMEOUT',
  'ER_CONNECTION_ALREADY_CLOSED',
  'ER_CONNECTION_TIMEOUT',
  'ER_GET_CONNECTION_TIMEOUT',
  'ER_POOL_ALREADY_CLOSED',
  'ER_SERVER_SHUTDOWN',
  'ER_CON_COUNT_ERROR',
  'ER_QUERY_INTERRUPTED',
  // Galera: the node is not (yet) part of the primary component, e.g. while it rejoins (errno 1047).
  'ER_UNKNOWN_COM_ERROR',
]);

type MaybeDriverError = { code?: unknown; fatal?: unknown; parent?: unknown; original?: unknown };

/**
 * Whether an error means the database cannot take the request now (down, restarting, pool exhausted, or a write
 * conflict that persisted through the transaction's retries): nothing was saved and the request may be sent again.
 */
export function isDatabaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError || error instanceof TimeoutError || isWriteConflict(error)) return true;
  for (let e = error as MaybeDriverError | undefined, depth = 0; e && typeof e === 'object' && depth < 4; depth += 1) {
    if (e.fatal === true || (typeof e.code === 'string' && GONE_CODES.has(e.code))) return true;
    e = (e.parent ?? e.original) as MaybeDriverError | undefined;
  }
  return false;
}

export const UNAVAILABLE_MESSAGE = 'The database cannot be reached right now, so nothing was saved. Try again in a few seconds.';
