/**
 * Group commit: rows handed in during one turn of the event loop (or while the previous write is
 * still running) go to the database in one multi-row write, and each caller's promise settles only
 * once its row is stored. If a group write fails, its rows are retried one by one, so one bad row
 * fails only its own caller; when the database itself is unreachable the whole group fails at once
 * (each caller answers 503), and no caller is ever told its row is stored when it is not.
 * `drain()` waits until every row handed in so far is settled (for a graceful shutdown).
 */
export function createGroupWriter<Row>(
  writeMany: (rows: Row[]) => Promise<unknown>,
  {
    maxRows = 500,
    isUnavailable = (_error: unknown): boolean => false,
  }: { maxRows?: number; isUnavailable?: (error: unknown) => boolean } = {},
) {
  type Waiting = { row: Row; resolve: () => void; reject: (error: unknown) => void };
  let queue: Waiting[] = [];
  let writing = false;
  let scheduled = false;

  async function writeGroup(group: Waiting[]) {
    try {
      await writeMany(group.map((w) => w.row));
      for (const w of group) w.resolve();
    } catch (error) {
      if (group.length === 1 || isUnavailable(error)) {
        for (const w of group) w.reject(error);
        return;
      }
      for (const w of group) await writeMany([w.row]).then(w.resolve, w.reject);
    }
  }

  let idle: Promise<void> = Promise.resolve();
  async function run() {
    scheduled = false;
    if (writing) return;
    writing = true;
    let done!: () => void;
    idle = new Promise((resolve) => (done = resolve));
    while (queue.length) {
      const group = queue.slice(0, maxRows);
      queue = queue.slice(group.length);
      await writeGroup(group);
    }
    writing = false;
    done();
  }

  function write(row: Row) {
    return new Promise<void>((resolve, reject) => {
      queue.push({ row, resolve, reject });
      if (!scheduled && !writing) {
        scheduled = true;
        setImmediate(() => void run());
      }
    });
  }

  /** Resolves once every row handed in before the call is written or refused. */
  async function drain() {
    while (writing || scheduled || queue.length) {
      if (scheduled && !writing) await new Promise((resolve) => setImmediate(resolve));
      else await idle;
    }
  }

  return Object.assign(write, { drain });
}
