/**
 * In-process notice that a station's device-visible configuration changed, so caches keyed on
 * it (the device identity cache) drop their entry at once. Other server processes rely on the
 * cache's short lifetime instead.
 */
type Listener = (stationId: number | 'all') => void;
const listeners = new Set<Listener>();

export function onStationChanged(listener: Listener) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function stationChanged(stationId: number | 'all') {
  for (const listener of listeners) listener(stationId);
}

/** Announces the change once the transaction commits (at once when there is none). */
export function stationChangedAfter(transaction: { afterCommit(fn: () => void): void } | undefined | null, stationId: number | 'all') {
  if (transaction) transaction.afterCommit(() => stationChanged(stationId));
  else stationChanged(stationId);
}
