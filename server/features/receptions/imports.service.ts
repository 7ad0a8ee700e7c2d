/**
 * File imports of reception reports as server-side jobs. The upload is read as a stream: its first 64 KB decide
 * the mapping (or check the one given), then csv-parse turns the rest into rows that are stored in chunks through
 * ingestReports. Counts move on only after a chunk is stored; a job whose process died is ended by recovery.
 */
import { parse } from 'csv-parse';
import { hostname } from 'node:os';
import type { Readable } from 'node:stream';
import type { Sequelize } from 'sequelize';
import type { ImportMapping, ImportPreview, ImportStatus, SavedMapping } from '@/shared/api/receptions';
import {
  createRowReader,
  detectDelimiter,
  missingRoles,
  proposeMapping,
  ROLE_LABELS,
  sampleLines,
  splitLine,
  type RowProblem,
} from '@/shared/domain/reception';
import { checkMappedReport, IMPORT_PREVIEW_BYTES, type ImportedReport, type SavedMappingInput } from '@/shared/schemas';
import { AppError } from '../../lib/app-error';
import type { Logger } from '../../lib/logger';
import { ingestReports } from './ingest.service';
import * as repo from './imports.repo';

/** Rows stored per ingest call (one transaction each). */
export const IMPORT_CHUNK_ROWS = 5000;
/** A running job whose process has not written for this long is taken for dead. */
export const IMPORT_STALE_MS = 120_000;
const HEARTBEAT_MS = 10_000;
const PREVIEW_ROWS = 20;

/** This process, as written on the jobs it runs: host, pid and start time (a pid alone can be reused). */
export const PROCESS_ID = `${hostname()}:${process.pid}:${Date.now()}`;

// ---------------------------------------------------------------------------------------------------------------
// The start of a file

/** Reads a stream until `bytes` have arrived or it ends; the stream is left paused for whoever reads on. */
export function readHead(file: Readable, bytes = IMPORT_PREVIEW_BYTES): Promise<{ head: Buffer; complete: boolean }> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    const done = (complete: boolean) => {
      file.off('data', onData);
      file.off('end', onEnd);
      file.off('error', onError);
      file.pause();
      resolve({ head: Buffer.concat(chunks, size), complete });
    };
    const onData = (chunk: Buffer) => {
      chunks.push(chunk);
      size += chunk.length;
      if (size >= bytes) done(false);
    };
    const onEnd = () => done(true);
    const onError = (error: Error) => reject(error);
    file.on('data', onData);
    file.on('end', onEnd);
    file.on('error', onError);
  });
}

function isBinary(head: Buffer): boolean {
  if (head.includes(0)) return true;
  // A cut at the end of the head may split a multi-byte character: judge the bytes before the last line break.
  const lastBreak = head.lastIndexOf(0x0a);
  const whole = lastBreak > 0 ? head.subarray(0, lastBreak) : head;
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(whole);
  } catch {
    return true;
  }
  let control = 0;
  for (const byte of whole) if (byte < 0x09 || (byte > 0x0d && byte < 0x20)) control += 1;
  return control > whole.length / 100;
}

type Inspected = { mapping: ImportMapping; notes: string[]; rows: string[][] };

/** What the first bytes of a file say: its rows and the mapping to read them with, or why it cannot be imported. */
export function inspectHead(fileName: string, head: Buffer, complete: boolean, given: ImportMapping | null): Inspected {
  if (head.toString('utf8').trim() === '')
    throw new AppError('bad-request', `"${fileName}" is empty: choose a CSV or TSV file with one report per line`, {
      file: 'The file is empty',
    });
  if (isBinary(head))
    throw new AppError(
      'unsupported-media-type',
      `"${fileName}" is not a text file: upload reports as CSV or TSV text (UTF-8), one report per line; unpack a compressed file first`,
      { file: 'Choose a CSV or TSV text file' },
    );
  const lines = sampleLines(head.toString('utf8'), complete);
  const delimiter = given?.delimiter ?? detectDelimiter(lines);
  const rows = lines.map((line) => splitLine(line, delimiter));
  const proposal = proposeMapping(rows, delimiter);
  const mapping = given ?? proposal.mapping;
  const missing = missingRoles(mapping);
  const columnList = proposal.mapping.columns.map((c) => `"${c.header}"`).join(', ');
  if (missing.includes('time'))
    throw new AppError(
      'bad-request',
      `No column of "${fileName}" is read as the time (UTC) of the report (its columns: ${columnList}). Choose the time column in the mapping.`,
      { mapping: 'Choose which column holds the time (UTC)' },
    );
  if (missing.length > 0)
    throw new AppError(
      'bad-request',
      `No column of "${fileName}" is read as the ${missing.map((role) => ROLE_LABELS[role]).join(', the ')} (its columns: ${columnList}). Choose them in the mapping.`,
      { mapping: `Choose the column for the ${ROLE_LABELS[missing[0]]}` },
    );
  if (rows.length <= (mapping.hasHeader ? 1 : 0))
    throw new AppError('bad-request', `"${fileName}" has a header line but no reports under it`, { file: 'The file has no reports' });
  return { mapping, notes: given ? [] : proposal.notes, rows };
}

type ReadRow = { ok: true; report: ImportedReport } | { ok: false; problem: RowProblem };

function rowReader(mapping: ImportMapping): (cells: string[]) => ReadRow {
  const read = createRowReader(mapping);
  return (cells) => {
    const row = read(cells);
    return row.ok ? checkMappedReport(row.report, mapping) : row;
  };
}

/** The proposal (or the given mapping) and the first rows as the import will read them. */
export function preview(fileName: string, head: Buffer, complete: boolean, given: ImportMapping | null): ImportPreview {
  let inspected: Inspected;
  try {
    inspected = inspectHead(fileName, head, complete, given);
  } catch (error) {
    // A mapping that lacks a role is what the preview is for: show it with the rows anyway.
    if (!(error instanceof AppError) || error.code !== 'bad-request' || !error.fields?.mapping) throw error;
    const lines = sampleLines(head.toString('utf8'), complete);
    const delimiter = given?.delimiter ?? detectDelimiter(lines);
    const rows = lines.map((line) => splitLine(line, delimiter));
    const proposal = proposeMapping(rows, delimiter);
    inspected = { mapping: given ?? proposal.mapping, notes: [...(given ? [] : proposal.notes), error.message], rows };
  }
  const { mapping, notes, rows } = inspected;
  const read = rowReader(mapping);
  const first = mapping.hasHeader ? 1 : 0;
  return {
    mapping,
    notes,
    rows: rows.slice(first, first + PREVIEW_ROWS).map((cells, i) => {
      const row = read(cells);
      return {
        rowNumber: first + i + 1,
        cells,
        report: row.ok ? { ...row.report } : null,
        problem: row.ok ? null : `${row.problem.column}: ${row.problem.reason}`,
      };
    }),
  };
}

// ---------------------------------------------------------------------------------------------------------------
// The job

export type ImportUpload = { fileName: string; bytesTotal: number; maxBytes: number; mapping: ImportMapping | null; file: Readable };
type Deps = { sequelize: Sequelize; logger: Logger; now?: () => Date };

/** Marks the upload as not wanted any more: its bytes are read and dropped so the request can end. */
const drain = (file: Readable) => {
  file.resume();
};

/**
 * Checks the start of the upload, creates the job and returns its id; the rest of the file is imported in the
 * background. `received` settles when the whole upload has been read (or the job has ended), `finished` when the
 * job has ended.
 */
export async function startImport(
  deps: Deps,
  ownerId: number,
  upload: ImportUpload,
): Promise<{ id: number; received: Promise<void>; finished: Promise<void> }> {
  const now = deps.now ?? (() => new Date());
  const { head, complete } = await readHead(upload.file);
  let inspected: Inspected;
  try {
    inspected = inspectHead(upload.fileName, head, complete, upload.mapping);
  } catch (error) {
    drain(upload.file);
    throw error;
  }
  const id = await repo.createImport(
    deps.sequelize,
    { ownerId, fileName: upload.fileName.slice(0, 255), bytesTotal: upload.bytesTotal, mapping: inspected.mapping, processId: PROCESS_ID },
    now(),
  );
  const received = complete
    ? Promise.resolve()
    : new Promise<void>((resolve) => {
        upload.file.once('end', resolve);
        upload.file.once('close', resolve);
        upload.file.once('error', () => resolve());
      });
  const finished = runImport(deps, ownerId, id, inspected.mapping, head, upload).catch((error: unknown) =>
    deps.logger.error({ err: error, importId: id }, 'import could not record its end'),
  );
  return { id, received: Promise.race([received, finished]), finished };
}

class JobEnded extends Error {}

const keptMessage = (c: repo.StoredCounts) =>
  `What it had stored is kept and counted: ${c.imported} reports imported, ${c.duplicates} duplicates, ${c.rejected} rows rejected. ` +
  'Import the file again to bring in the rest (reports already stored count as duplicates).';

async function runImport(deps: Deps, ownerId: number, id: number, mapping: ImportMapping, head: Buffer, { file, maxBytes }: ImportUpload) {
  const now = deps.now ?? (() => new Date());
  const read = rowReader(mapping);
  let bytesRead = head.length;
  let truncated = false;
  const parser = parse({ delimiter: mapping.delimiter, relax_column_count: true, relax_quotes: true, bom: true, skip_empty_lines: false });
  file.on('data', (chunk: Buffer) => {
    bytesRead += chunk.length;
  });
  file.on('limit', () => {
    truncated = true;
  });
  file.on('error', (error) => parser.destroy(error));
  parser.write(head);
  file.pipe(parser);

  const heartbeat = setInterval(() => {
    repo.touchImport(deps.sequelize, id, bytesRead, now()).catch(() => undefined);
  }, HEARTBEAT_MS);
  heartbeat.unref();

  let good: ImportedReport[] = [];
  let rejections: repo.Rejection[] = [];
  const store = async (reports: ImportedReport[], rejected: repo.Rejection[], bytes: number) => {
    const stored = await ingestReports(deps.sequelize, reports, { importerId: ownerId, importId: id }, now());
    const rowsRead = reports.length + rejected.length;
    const going = await repo.recordChunk(deps.sequelize, id, { ...stored, rejections: rejected, rowsRead, bytesRead: bytes }, now());
    if (!going) throw new JobEnded();
  };
  // One chunk is stored while the next is read (the database and the parser work side by side); chunks are
  // still stored and counted one after the other, in file order.
  let storing: Promise<void> | null = null;
  const flush = async () => {
    const [reports, rejected] = [good, rejections];
    good = [];
    rejections = [];
    if (storing) await storing;
    storing = store(reports, rejected, bytesRead);
    storing.catch(() => undefined);
  };

  try {
    let rowNumber = 0;
    for await (const cells of parser as AsyncIterable<string[]>) {
      rowNumber += 1;
      if (rowNumber === 1 && mapping.hasHeader) continue;
      if (cells.length === 1 && cells[0].trim() === '') continue;
      const row = read(cells);
      if (row.ok) good.push(row.report);
      else rejections.push({ rowNumber, ...row.problem });
      if (good.length + rejections.length >= IMPORT_CHUNK_ROWS) await flush();
    }
    if (truncated)
      throw new AppError('payload-too-large', `The file is larger than the import limit of ${Math.round(maxBytes / 1024 / 1024)} MB`);
    if (good.length + rejections.length > 0) await flush();
    if (storing) await storing;
    await repo.finishImport(deps.sequelize, id, { status: 'done', error: null, bytesRead, bytesTotal: bytesRead }, now());
  } catch (error) {
    drain(file);
    await (storing as Promise<void> | null)?.catch(() => undefined);
    if (error instanceof JobEnded) return;
    const reason =
      error instanceof AppError
        ? `${error.message}.`
        : /end of form|aborted|Unexpected end/i.test(String((error as Error)?.message))
          ? 'The upload stopped before the end of the file (the connection was closed).'
          : `The import stopped: ${(error as Error)?.message ?? String(error)}.`;
    if (!(error instanceof AppError)) deps.logger.warn({ err: error, importId: id }, 'import failed');
    await repo.touchImport(deps.sequelize, id, bytesRead, now());
    // Counts become exactly what the stored chunks hold, whatever step the failure interrupted.
    await repo.failInterrupted(deps.sequelize, id, (c) => `${reason} ${keptMessage(c)}`, now());
  } finally {
    clearInterval(heartbeat);
  }
}

// ---------------------------------------------------------------------------------------------------------------
// Reading jobs, rejected rows, saved mappings

export async function statusOf(
  sequelize: Sequelize,
  ownerId: number,
  importId: number,
): Promise<ImportStatus & { mapping: ImportMapping }> {
  const job = await repo.findImport(sequelize, ownerId, importId);
  if (!job) throw new AppError('not-found', `Import ${importId} does not exist`);
  return job;
}

export const recentImports = (sequelize: Sequelize, ownerId: number) => repo.listImports(sequelize, ownerId, 50);

const csvCell = (value: string | number) => {
  const text = String(value);
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
};

/** The rejected rows as CSV lines (row number, column, reason), page by page; owner only. */
export async function* rejectedCsv(sequelize: Sequelize, ownerId: number, importId: number): AsyncGenerator<string> {
  const job = await statusOf(sequelize, ownerId, importId);
  yield 'row,column,reason\n';
  let after = 0;
  let listed = 0;
  for (;;) {
    const page = await repo.rejectionsAfter(sequelize, importId, after, 5000);
    if (page.length === 0) break;
    yield page.map((r) => `${r.rowNumber},${csvCell(r.columnName)},${csvCell(r.reason)}\n`).join('');
    after = page[page.length - 1].id;
    listed += page.length;
  }
  if (job.rejected > listed) yield `,,${csvCell(`${job.rejected - listed} more rejected rows are counted but not listed`)}\n`;
}

export const listMappings = (sequelize: Sequelize, ownerId: number): Promise<SavedMapping[]> => repo.listMappings(sequelize, ownerId);

export async function saveMapping(sequelize: Sequelize, ownerId: number, input: SavedMappingInput & { name: string }, now: Date) {
  const saved = await repo.createMapping(sequelize, ownerId, input.name, input.mapping as ImportMapping, now);
  if (!saved)
    throw new AppError('conflict', `You already have a mapping called "${input.name}": choose another name`, {
      name: 'Choose another name',
    });
  return saved;
}

export async function removeMapping(sequelize: Sequelize, ownerId: number, mappingId: number) {
  if (!(await repo.deleteMapping(sequelize, ownerId, mappingId))) throw new AppError('not-found', `Mapping ${mappingId} does not exist`);
}

// ---------------------------------------------------------------------------------------------------------------
// Recovery

/** Whether the process that wrote a job is gone: on this host by its pid, anywhere by a stale heartbeat. */
export function processIsGone(processId: string | null, heartbeatAt: Date, now: Date): boolean {
  if (processId === PROCESS_ID) return false;
  if (now.getTime() - new Date(heartbeatAt).getTime() > IMPORT_STALE_MS) return true;
  const [host, pidText] = (processId ?? '').split(':');
  if (host !== hostname()) return false;
  const pid = Number(pidText);
  if (!Number.isInteger(pid) || pid <= 0 || pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return false;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'ESRCH';
  }
}

const interruptedMessage = (c: repo.StoredCounts) => `The server stopped while this import was running. ${keptMessage(c)}`;

/** Ends every running job whose process is gone, with the counts of what it stored. Returns the ids ended. */
export async function recoverInterruptedImports(sequelize: Sequelize, now: Date): Promise<number[]> {
  const ended: number[] = [];
  for (const job of await repo.runningImports(sequelize)) {
    if (!processIsGone(job.processId, job.heartbeatAt, now)) continue;
    if (await repo.failInterrupted(sequelize, job.id, interruptedMessage, now)) ended.push(job.id);
  }
  return ended;
}

/** Recovery at start-up and then every minute (jobs of another process that died are caught by their heartbeat). */
export function watchImports(sequelize: Sequelize, logger: Logger): () => void {
  const sweep = () =>
    recoverInterruptedImports(sequelize, new Date())
      .then((ids) => ids.length > 0 && logger.warn({ importIds: ids }, 'imports of a stopped server process marked failed'))
      .catch((error: unknown) => logger.error({ err: error }, 'import recovery failed'));
  void sweep();
  const timer = setInterval(sweep, 60_000);
  timer.unref();
  return () => clearInterval(timer);
}
