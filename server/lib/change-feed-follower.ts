/**
 * Carries station changes between server processes through the database: every change announced in this
 * process is written to station_change_feed, and every process polls the feed for the others' changes and
 * announces them locally, so device caches everywhere drop a revoked token, a suspension or a new
 * configuration within about one poll interval. The caches' own lifetime (DEVICE_CACHE_MS) stays as a backstop.
 *
 * Rows are read by time, not by id: under Galera each node hands out interleaved auto-increment ids, so ids do
 * not follow commit order across nodes. Ids already seen are remembered for the overlap window.
 */
import { randomUUID } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { Logger } from './logger';
import { onStationChanged, stationChanged } from './change-feed';

export type ChangeFeedFollower = { stop(): Promise<void>; instanceId: string };

const OVERLAP_MS = 5_000;
const KEEP_MS = 10 * 60_000;

export function followChangesAcrossProcesses({
  sequelize,
  logger,
  pollMs,
}: {
  sequelize: Sequelize;
  logger: Logger;
  pollMs: number;
}): ChangeFeedFollower {
  const instanceId = randomUUID();
  const seen = new Map<string, number>();
  let relaying = false;
  let since = Date.now() - OVERLAP_MS;
  let stopped = false;
  let lastPrune = 0;
  const pending = new Set<Promise<unknown>>();
  const track = (p: Promise<unknown>) => {
    pending.add(p);
    void p.finally(() => pending.delete(p));
  };

  const unsubscribe = onStationChanged((stationId) => {
    if (relaying) return;
    track(
      sequelize
        .query('INSERT INTO station_change_feed (stationId, origin, createdAt) VALUES (?, ?, ?)', {
          replacements: [stationId === 'all' ? 0 : stationId, instanceId, new Date()],
        })
        .catch((error: unknown) =>
          logger.warn({ err: error }, 'change feed write failed; other processes fall back to the cache lifetime'),
        ),
    );
  });

  async function poll() {
    const startedAt = Date.now();
    const rows = await sequelize.query<{ id: string | number; stationId: number; origin: string; createdAt: Date }>(
      'SELECT id, stationId, origin, createdAt FROM station_change_feed WHERE createdAt >= ? ORDER BY createdAt',
      { replacements: [new Date(since - OVERLAP_MS)], type: QueryTypes.SELECT },
    );
    relaying = true;
    try {
      for (const row of rows) {
        const key = String(row.id);
        if (seen.has(key)) continue;
        seen.set(key, new Date(row.createdAt).getTime());
        if (row.origin !== instanceId) stationChanged(row.stationId === 0 ? 'all' : row.stationId);
      }
    } finally {
      relaying = false;
    }
    since = startedAt;
    for (const [key, at] of seen) if (at < since - 2 * OVERLAP_MS) seen.delete(key);
    if (startedAt - lastPrune > 60_000) {
      lastPrune = startedAt;
      await sequelize.query('DELETE FROM station_change_feed WHERE createdAt < ?', { replacements: [new Date(startedAt - KEEP_MS)] });
    }
  }

  let timer: NodeJS.Timeout | undefined;
  const loop = () => {
    if (stopped) return;
    const run = poll().catch((error: unknown) => logger.warn({ err: error }, 'change feed poll failed'));
    track(run);
    void run.finally(() => {
      if (!stopped) timer = setTimeout(loop, pollMs);
    });
  };
  timer = setTimeout(loop, pollMs);
  timer.unref?.();

  return {
    instanceId,
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      unsubscribe();
      await Promise.allSettled([...pending]);
    },
  };
}
