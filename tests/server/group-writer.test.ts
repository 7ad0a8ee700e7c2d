import { createGroupWriter } from '@/server/lib/group-writer';

describe('createGroupWriter', () => {
  it('when rows arrive in one turn, writes them as one group and settles every caller after the write', async () => {
    const groups: number[][] = [];
    const write = createGroupWriter(async (rows: number[]) => {
      groups.push(rows);
    });
    const settled: number[] = [];
    await Promise.all([1, 2, 3].map((n) => write(n).then(() => settled.push(n))));
    expect(groups).toEqual([[1, 2, 3]]);
    expect(settled).toEqual([1, 2, 3]);
  });

  it('when rows arrive while a write is running, they go in the next group', async () => {
    const groups: number[][] = [];
    let release!: () => void;
    const write = createGroupWriter(async (rows: number[]) => {
      groups.push(rows);
      if (groups.length === 1) await new Promise<void>((r) => (release = r));
    });
    const first = write(1);
    await new Promise((r) => setImmediate(r));
    const later = [write(2), write(3)];
    release();
    await Promise.all([first, ...later]);
    expect(groups).toEqual([[1], [2, 3]]);
  });

  it('when a group fails, retries one by one so only the bad row fails its caller', async () => {
    const stored: number[] = [];
    const write = createGroupWriter(async (rows: number[]) => {
      if (rows.includes(13)) throw new Error('row 13 refused');
      stored.push(...rows);
    });
    const results = await Promise.allSettled([12, 13, 14].map((n) => write(n)));
    expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
    expect(stored).toEqual([12, 14]);
  });

  it('when more rows wait than a group holds, splits them', async () => {
    const sizes: number[] = [];
    const write = createGroupWriter(async (rows: number[]) => void sizes.push(rows.length), { maxRows: 4 });
    await Promise.all(Array.from({ length: 10 }, (_, i) => write(i)));
    expect(sizes).toEqual([4, 4, 2]);
  });

  it('when the database is unreachable, every row of the group is refused at once (no row-by-row retry, nothing acknowledged)', async () => {
    let calls = 0;
    const down = Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' });
    const write = createGroupWriter(
      async () => {
        calls += 1;
        throw down;
      },
      { isUnavailable: (e) => e === down },
    );
    const results = await Promise.allSettled([write(1), write(2), write(3)]);
    expect(results.map((r) => r.status)).toEqual(['rejected', 'rejected', 'rejected']);
    expect(calls).toBe(1);
  });

  it('drain() resolves only after every row handed in is written', async () => {
    const written: number[] = [];
    const write = createGroupWriter(async (rows: number[]) => {
      await new Promise((resolve) => setTimeout(resolve, 20));
      written.push(...rows);
    });
    void write(1);
    void write(2);
    await write.drain();
    expect(written).toEqual([1, 2]);
  });
});
