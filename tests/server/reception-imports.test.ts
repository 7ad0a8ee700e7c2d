import { hostname } from 'node:os';
import { PassThrough } from 'node:stream';
import { parse } from 'csv-parse/sync';
import type { Sequelize } from 'sequelize';
import request from 'supertest';
import { createSequelize } from '@/server/db/sequelize';
import { createLogger } from '@/server/lib/logger';
import { processIsGone, PROCESS_ID, recoverInterruptedImports, startImport } from '@/server/features/receptions/imports.service';
import { REPORT_CSV_HEADER, reportCsvLine } from '@/shared/domain/reception';
import type { ImportMapping, ImportStatus } from '@/shared/api/receptions';
import { signedInAgent, startTestServer, truncateAll, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  // A 1 MB limit keeps the too-large case small.
  server = await startTestServer({ IMPORT_MAX_MB: '1' });
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];

// Fictional Q-prefixed callsigns; 20 m reports near 14.0971 MHz (common practice, from memory).
const FILE = [
  'Time UTC,Heard,Grid,Power dBm,Reporter,Reporter grid,SNR,Freq MHz,Drift',
  '2026-12-02T10:04:00Z,Q1ABC,JO22,23,Q2XYZ,FN31pr,-21,14.097102,0',
  '2026-12-02T10:06:00Z,Q1ABC,JO22,23,Q3RX,IO91wm,-7,14.097098,-1',
  '2026-12-02T10:08:00Z,Q1ABC,JO22,23,Q2XYZ,FN31pr,-25,14.097101,1',
].join('\n');

async function count(sql: string, replacements: unknown[] = []) {
  const [rows] = await server.sequelize.query(sql, { replacements });
  return Number((rows as { n: number | string }[])[0].n);
}

async function upload(agent: Agent, text: string | Buffer, options: { mapping?: ImportMapping; name?: string } = {}) {
  const req = agent.post('/api/reception-imports');
  if (options.mapping) req.field('mapping', JSON.stringify(options.mapping));
  return req.attach('file', Buffer.isBuffer(text) ? text : Buffer.from(text), options.name ?? 'reports.csv');
}

async function finished(agent: Agent, id: number): Promise<ImportStatus> {
  for (let i = 0; i < 200; i += 1) {
    const res = await agent.get(`/api/reception-imports/${id}`);
    if (res.status !== 200) throw new Error(`status ${res.status}`);
    if (res.body.status !== 'running') return res.body as ImportStatus;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('import did not finish');
}

describe('importing a file of reports', () => {
  it('when a file is uploaded, answers 202 with an id and stores every report with the import as its origin', async () => {
    const { agent } = await signedInAgent(server.app);
    const res = await upload(agent, FILE);
    expect(res.status).toBe(202);
    const job = await finished(agent, res.body.id);
    expect(job).toMatchObject({
      status: 'done',
      rowsRead: 3,
      imported: 3,
      duplicates: 0,
      rejected: 0,
      fileName: 'reports.csv',
      error: null,
    });
    expect(job.bytesRead).toBe(Buffer.byteLength(FILE));
    expect(job.bytesTotal).toBe(job.bytesRead);
    expect(await count('SELECT COUNT(*) AS n FROM reception_reports')).toBe(3);
    expect(
      await count('SELECT COUNT(*) AS n FROM reception_reports r JOIN reception_batches b ON b.id = r.batchId WHERE b.importId = ?', [
        res.body.id,
      ]),
    ).toBe(3);
    const [[stored]] = (await server.sequelize.query("SELECT * FROM reception_reports WHERE rxCallsign = 'Q3RX'")) as [
      Record<string, unknown>[],
      unknown,
    ];
    // 14.097098 MHz in Hz (SI prefix M = 10^6); IO91wm stored in upper case like every locator
    expect(stored).toMatchObject({
      txCallsign: 'Q1ABC',
      rxLocator: 'IO91WM',
      snrDb: -7,
      frequencyHz: 14_097_098,
      driftHz: -1,
      bandId: '20m',
    });

    const list = await agent.get('/api/reception-imports');
    expect(list.body.map((j: ImportStatus) => j.id)).toEqual([res.body.id]);
  });

  it('when the same file is imported twice, the second time stores nothing new and counts every row a duplicate', async () => {
    const { agent } = await signedInAgent(server.app);
    await finished(agent, (await upload(agent, FILE)).body.id);
    const second = await finished(agent, (await upload(agent, FILE)).body.id);
    expect(second).toMatchObject({ status: 'done', rowsRead: 3, imported: 0, duplicates: 3, rejected: 0 });
    expect(await count('SELECT COUNT(*) AS n FROM reception_reports')).toBe(3);
  });

  it('when some rows are bad, keeps the good ones and lists each bad one with its row, column and reason', async () => {
    const { agent } = await signedInAgent(server.app);
    const text = [
      FILE,
      '2026-12-02T10:10:00Z,Q1ABC,JO22,23,Q2XYZ,FN31pr,loud,14.097101,1',
      'not a time,Q1ABC,JO22,23,Q2XYZ,FN31pr,-20,14.097101,1',
      '2026-12-02T10:14:00Z,Q1ABC,JO22,23,Q2XYZ,ZZ99,-20,14.097101,1',
      '2026-12-02T10:16:00Z,Q1ABC,JO22,23,Q4RX,JN58,-11,14.097105,0',
    ].join('\n');
    const job = await finished(agent, (await upload(agent, text)).body.id);
    expect(job).toMatchObject({ status: 'done', rowsRead: 7, imported: 4, rejected: 3 });
    expect(await count('SELECT COUNT(*) AS n FROM reception_reports')).toBe(4);

    const csv = await agent.get(`/api/reception-imports/${job.id}/rejected.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = parse(csv.text) as string[][];
    expect(lines[0]).toEqual(['row', 'column', 'reason']);
    // Row numbers count the header as row 1.
    expect(lines.slice(1).map((l) => l.slice(0, 2))).toEqual([
      ['5', 'SNR'],
      ['6', 'Time UTC'],
      ['7', 'Reporter grid'],
    ]);
    expect(lines[1][2]).toMatch(/"loud" is not a number/);
    expect(lines[2][2]).toMatch(/not a time/);
    expect(lines[3][2]).toMatch(/Maidenhead/);
  });

  it('when a mapping is sent before the file, reads the file with it instead of the proposal', async () => {
    const { agent } = await signedInAgent(server.app);
    const preview = await agent.post('/api/reception-imports/preview').attach('file', Buffer.from(FILE), 'reports.csv');
    expect(preview.status).toBe(200);
    const mapping = preview.body.mapping as ImportMapping;
    expect(preview.body.rows).toHaveLength(3);
    expect(preview.body.rows[0]).toMatchObject({ rowNumber: 2, problem: null, report: { txCallsign: 'Q1ABC', rxCallsign: 'Q2XYZ' } });
    // The user says the callsigns are the other way round.
    const swapped: ImportMapping = {
      ...mapping,
      columns: mapping.columns.map((c) => ({
        ...c,
        role:
          ({ txCallsign: 'rxCallsign', rxCallsign: 'txCallsign', txLocator: 'rxLocator', rxLocator: 'txLocator' } as const)[
            c.role as 'txCallsign'
          ] ?? c.role,
      })),
    };
    const corrected = await agent
      .post('/api/reception-imports/preview')
      .field('mapping', JSON.stringify(swapped))
      .attach('file', Buffer.from(FILE), 'r.csv');
    expect(corrected.body.rows[0].report).toMatchObject({ txCallsign: 'Q2XYZ', rxCallsign: 'Q1ABC', rxLocator: 'JO22' });
    const job = await finished(agent, (await upload(agent, FILE, { mapping: swapped })).body.id);
    expect(job).toMatchObject({ status: 'done', imported: 3 });
    expect(await count("SELECT COUNT(*) AS n FROM reception_reports WHERE rxCallsign = 'Q1ABC'")).toBe(3);
  });

  it("when Faintline's own CSV comes back, imports it with no mapping and gives the same reports", async () => {
    const { agent } = await signedInAgent(server.app);
    const rows = [
      {
        slotUtc: '2026-12-01T22:00:00Z',
        bandId: '40m',
        txCallsign: 'Q5TX',
        txLocator: 'IO91',
        txPowerDbm: 37,
        rxCallsign: 'Q6RX',
        rxLocator: 'PM95VQ',
        snrDb: -18,
        frequencyHz: 7_040_102,
        driftHz: 0,
        distanceKm: 9200.3,
        bearingDeg: 33.1,
        frequencyErrorHz: null,
      },
      {
        slotUtc: '2026-12-01T22:02:00Z',
        bandId: '40m',
        txCallsign: '<...>',
        txLocator: null,
        txPowerDbm: null,
        rxCallsign: 'Q6RX',
        rxLocator: 'PM95VQ',
        snrDb: -3,
        frequencyHz: 7_040_099,
        driftHz: 2,
        distanceKm: null,
        bearingDeg: null,
        frequencyErrorHz: null,
      },
    ];
    const text = [REPORT_CSV_HEADER, ...rows.map(reportCsvLine)].join('\n') + '\n';
    const job = await finished(agent, (await upload(agent, text)).body.id);
    expect(job).toMatchObject({ status: 'done', imported: 2, rejected: 0 });
    const [stored] = await server.sequelize.query(
      'SELECT txCallsign, txLocator, txPowerDbm, rxCallsign, rxLocator, snrDb, frequencyHz, driftHz, bandId FROM reception_reports ORDER BY slotStart',
    );
    expect(stored).toEqual(rows.map(({ slotUtc: _t, distanceKm: _d, bearingDeg: _b, frequencyErrorHz: _f, ...r }) => r));
  });
});

describe('files that cannot be imported', () => {
  it.each([
    ['an empty file', 400, '', /empty/],
    ['a file of blank lines', 400, '\n\n  \n', /empty/],
    // PNG signature and the start of its IHDR chunk (PNG specification, section 5.2)
    [
      'a binary file',
      415,
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52]),
      /not a text file/,
    ],
    [
      'a file with no time column',
      400,
      'sender,receiver,grid,snr,freq\nQ1ABC,Q2XYZ,FN31,-20,14097100\n',
      /No column .* time \(UTC\).*"sender", "receiver"/,
    ],
    ['a file with only a header', 400, 'time,sender,receiver,grid,snr,freq\n', /no reports/],
  ])('when the upload is %s, answers %d and says what is wrong', async (_what, status, body, message) => {
    const { agent } = await signedInAgent(server.app);
    const res = await upload(agent, body as string | Buffer);
    expect(res.status).toBe(status);
    expect(res.body.error.message).toMatch(message);
    expect(await count('SELECT COUNT(*) AS n FROM reception_imports')).toBe(0);
  });

  it('when the file is above the limit, answers 413 and starts nothing', async () => {
    const { agent } = await signedInAgent(server.app);
    const big = `${FILE}\n${'2026-12-02T10:04:00Z,Q1ABC,JO22,23,Q2XYZ,FN31pr,-21,14.097102,0\n'.repeat(20_000)}`;
    const res = await upload(agent, big);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/larger than the import limit of 1 MB/);
    expect(await count('SELECT COUNT(*) AS n FROM reception_imports')).toBe(0);
  });

  it('when there is no file part or the mapping is not JSON, answers 400', async () => {
    const { agent } = await signedInAgent(server.app);
    const noFile = await agent.post('/api/reception-imports').field('mapping', '{}');
    expect(noFile.status).toBe(400);
    expect(noFile.body.error.message).toMatch(/No file was sent/);
    const badMapping = await agent.post('/api/reception-imports').field('mapping', '{oops').attach('file', Buffer.from(FILE), 'r.csv');
    expect(badMapping.status).toBe(400);
    expect(badMapping.body.error.message).toMatch(/not valid JSON/);
    const json = await agent.post('/api/reception-imports').send({ file: 'x' });
    expect(json.status).toBe(415);
  });

  it('when someone else asks for an import, answers 404; signed out, 401', async () => {
    const { agent } = await signedInAgent(server.app);
    const job = await finished(agent, (await upload(agent, FILE)).body.id);
    const { agent: other } = await signedInAgent(server.app, { displayName: 'Other Operator' });
    expect((await other.get(`/api/reception-imports/${job.id}`)).status).toBe(404);
    expect((await other.get(`/api/reception-imports/${job.id}/rejected.csv`)).status).toBe(404);
    expect((await other.get('/api/reception-imports')).body).toEqual([]);
    expect((await other.get('/api/reception-imports/abc')).status).toBe(404);
    expect((await request(server.app).get(`/api/reception-imports/${job.id}`)).status).toBe(401);
    expect((await request(server.app).post('/api/reception-imports').attach('file', Buffer.from(FILE), 'r.csv')).status).toBe(401);
  });
});

describe('saved mappings', () => {
  it('when a mapping is saved by name, lists it, refuses the same name twice and deletes it for its owner only', async () => {
    const { agent } = await signedInAgent(server.app);
    const { mapping } = (await agent.post('/api/reception-imports/preview').attach('file', Buffer.from(FILE), 'r.csv')).body;
    const saved = await agent.post('/api/reception-mappings').send({ name: 'Club receiver log', mapping });
    expect(saved.status).toBe(201);
    expect(saved.body).toMatchObject({ name: 'Club receiver log', mapping });
    expect((await agent.post('/api/reception-mappings').send({ name: 'Club receiver log', mapping })).status).toBe(409);
    const bad = await agent.post('/api/reception-mappings').send({ name: 'Broken', mapping: { ...mapping, timeFormat: 'sundial' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['mapping.timeFormat']).toMatch(/iso, date-time or epoch-seconds/);
    const twice = { ...mapping, columns: mapping.columns.map((c: ImportMapping['columns'][number]) => ({ ...c, role: 'time' })) };
    expect((await agent.post('/api/reception-mappings').send({ name: 'Twice', mapping: twice })).status).toBe(400);
    expect((await agent.get('/api/reception-mappings')).body.map((m: { name: string }) => m.name)).toEqual(['Club receiver log']);

    const { agent: other } = await signedInAgent(server.app, { displayName: 'Other Operator' });
    expect((await other.delete(`/api/reception-mappings/${saved.body.id}`)).status).toBe(404);
    expect((await other.get('/api/reception-mappings')).body).toEqual([]);
    expect((await agent.delete(`/api/reception-mappings/${saved.body.id}`)).status).toBe(204);
    expect((await agent.get('/api/reception-mappings')).body).toEqual([]);
  });
});

describe('an import interrupted by a server stop', () => {
  const line = (i: number) => {
    const t = new Date(Date.UTC(2026, 10, 1) + i * 120_000).toISOString();
    return `${t},Q1ABC,JO22,23,Q${(i % 9) + 1}R${String.fromCharCode(65 + (i % 26))},FN31pr,-20,14.097102,0`;
  };

  it('when the process stops mid-way, recovery ends the job as failed with counts equal to what was stored', async () => {
    const { user } = await signedInAgent(server.app);
    // The "server that stops": its own connection pool, closed while the upload is still arriving.
    const dying: Sequelize = createSequelize(server.config.DATABASE_URL);
    const file = new PassThrough();
    const { id, finished: jobEnded } = await (async () => {
      const started = startImport({ sequelize: dying, logger: createLogger('silent') }, user.id, {
        fileName: 'long.csv',
        bytesTotal: 0,
        maxBytes: 1 << 30,
        mapping: null,
        file,
      });
      file.write(`${FILE.split('\n')[0]}\n`);
      for (let i = 0; i < 7000; i += 1) file.write(`${line(i)}\n`);
      return started;
    })();
    // Wait for the first chunk to be stored and counted, then stop the "server".
    for (let i = 0; i < 400; i += 1) {
      if ((await count('SELECT rowsRead AS n FROM reception_imports WHERE id = ?', [id])) >= 5000) break;
      await new Promise((r) => setTimeout(r, 25));
    }
    await dying.close();
    for (let i = 7000; i < 12_000; i += 1) file.write(`${line(i)}\n`);
    file.end();
    await jobEnded;
    expect(await count('SELECT COUNT(*) AS n FROM reception_imports WHERE id = ? AND status = ?', [id, 'running'])).toBe(1);

    // Start-up recovery in the next process: the job's owner process is gone.
    await server.sequelize.query('UPDATE reception_imports SET processId = ? WHERE id = ?', {
      replacements: [`${hostname()}:999999999:0`, id],
    });
    expect(await recoverInterruptedImports(server.sequelize, new Date())).toEqual([id]);

    const [[job]] = (await server.sequelize.query('SELECT * FROM reception_imports WHERE id = ?', { replacements: [id] })) as [
      ImportStatus[],
      unknown,
    ];
    const stored = await count(
      'SELECT COUNT(*) AS n FROM reception_reports r JOIN reception_batches b ON b.id = r.batchId WHERE b.importId = ?',
      [id],
    );
    expect(job.status).toBe('failed');
    expect(stored).toBeGreaterThanOrEqual(5000);
    expect(stored).toBeLessThan(12_000);
    expect(job.imported).toBe(stored);
    expect(job.rowsRead).toBe(job.imported + job.duplicates + job.rejected);
    expect(job.error).toMatch(new RegExp(`server stopped.*${stored} reports imported`));
    // A second sweep changes nothing.
    expect(await recoverInterruptedImports(server.sequelize, new Date())).toEqual([]);
  });

  it('tells a dead process from a live one', () => {
    const now = new Date();
    expect(processIsGone(PROCESS_ID, new Date(now.getTime() - 600_000), now)).toBe(false);
    expect(processIsGone(`${hostname()}:${process.ppid}:1`, now, now)).toBe(false);
    expect(processIsGone(`${hostname()}:999999999:1`, now, now)).toBe(true);
    expect(processIsGone('another-host:123:1', now, now)).toBe(false);
    expect(processIsGone('another-host:123:1', new Date(now.getTime() - 600_000), now)).toBe(true);
  });
});
