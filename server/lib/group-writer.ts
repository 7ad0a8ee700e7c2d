/**
 * Group commit: rows handed in during one turn of the event loop (or while the previous write is
 * still running) go to the database in one multi-row write, and each caller's promise settles only
 * once its row is stored. If a group write fails, its rows are retried one by one, so one bad row
 * fails only its own caller.
 */
export function createGroupWriter<Row>(writeMany: (rows: Row[]) => Promise<unknown>, { maxRows = 500 } = {}) {
  type Waiting = { row: Row; resolve: () => void; reject: (error: unknown) => void };
  let queue: Waiting[] = [];
  let writing = false;
  let scheduled = false;

  async function writeGroup(group: Waiting[]) {
    try {
      await writeMany(group.map((w) => w.row));
      for (const w of group) w.resolve();
    } catch (error) {
      if (group.length === 1) return group[0].reject(error);
      for (const w of group) await writeMany([w.row]).then(w.resolve, w.reject);
    }
  }

  async function drain() {
    scheduled = false;
    if (writing) return;
    writing = true;
    while (queue.length) {
      const group = queue.slice(0, maxRows);
      queue = queue.slice(group.length);
      await writeGroup(group);
    }
    writing = false;
  }

  return function write(row: Row) {
    return new Promise<void>((resolve, reject) => {
      queue.push({ row, resolve, reject });
      if (!scheduled && !writing) {
        scheduled = true;
        setImmediate(() => void drain());
      }
    });
  };
}
