import { AppError } from './app-error';

/** A numeric path id; anything else names no resource. */
export function parseId(value: unknown, what: string): number {
  const id = Number(value);
  if (!Number.isInteger(id) || id <= 0 || String(id) !== String(value)) {
    throw new AppError('not-found', `${what} ${String(value)} does not exist`);
  }
  return id;
}
