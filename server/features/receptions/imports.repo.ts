/**
 * File import jobs, the rows they rejected and mappings saved by name. Counts move forward only after the
 * chunk they describe has been stored, and recovery recounts from what the committed chunks stored.
 */
import { QueryTypes, UniqueConstraintError, type Sequelize } from 'sequelize';
import type { ImportMapping, ImportStatus, SavedMapping } from '@/shared/api/receptions';

/** At most this many rejected rows are kept per import (all of them are counted). */
export const REJECTIONS_KEPT = 100_000;

type ImportRow = {
  id: number;
  ownerId: number;
  fileName: string;
  status: ImportStatus['status'];
  bytesTotal: number | string;
  bytesRead: number | string;
  rowsRead: number;
  imported: number;
  duplicates: number;
  rejected: number;
  mapping: string;
  error: string | null;
  processId: string | null;
  heartbeatAt: Date;
  createdAt: Date;
  finishedAt: Date | null;
};

const toStatus = (r: ImportRow): ImportStatus & { mapping: ImportMapping } => ({
  id: r.id,
  fileName: r.fileName,
  status: r.status,
  rowsRead: r.rowsRead,
  imported: r.imported,
  duplicates: r.duplicates,
  rejected: r.rejected,
  bytesRead: Number(r.bytesRead),
  bytesTotal: Number(r.bytesTotal),
  error: r.error,
  createdAt: new Date(r.createdAt).toISOString(),
  finishedAt: r.finishedAt ? new Date(r.finishedAt).toISOString() : null,
  mapping: JSON.parse(r.mapping) as ImportMapping,
});

export async function createImport(
  sequelize: Sequelize,
  job: { ownerId: number; fileName: string; bytesTotal: number; mapping: ImportMapping; processId: string },
  now: Date,
): Promise<number> {
  const [id] = await sequelize.query(
    `INSERT INTO reception_imports (ownerId, fileName, status, bytesTotal, mapping, processId, heartbeatAt, createdAt, updatedAt)
     VALUES (?, ?, 'running', ?, ?, ?, ?, ?, ?)`,
    {
      replacements: [job.ownerId, job.fileName, job.bytesTotal, JSON.stringify(job.mapping), job.processId, now, now, now],
      type: QueryTypes.INSERT,
    },
  );
  return Number(id);
}

export type Rejection = { rowNumber: number; column: string; reason: string };

/**
 * After a chunk's reports have been stored: keeps its rejected rows and moves the counts on, in one transaction.
 * Only a job still `running` moves on; false tells the runner its job was ended elsewhere (by recovery) and must stop.
 */
export async function recordChunk(
  sequelize: Sequelize,
  importId: number,
  chunk: { accepted: number; duplicates: number; rejections: Rejection[]; rowsRead: number; bytesRead: number },
  now: Date,
): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const [job] = await sequelize.query<{ rejected: number; status: string }>(
      'SELECT rejected, status FROM reception_imports WHERE id = ? FOR UPDATE',
      { replacements: [importId], type: QueryTypes.SELECT, transaction },
    );
    if (job?.status !== 'running') return false;
    const rejected = job.rejected;
    const room = Math.max(0, REJECTIONS_KEPT - rejected);
    const keep = chunk.rejections.slice(0, room);
    if (keep.length > 0) {
      await sequelize.query(
        `INSERT INTO reception_import_rejections (importId, rowNumber, columnName, reason) VALUES ${keep.map(() => '(?,?,?,?)').join(',')}`,
        { replacements: keep.flatMap((r) => [importId, r.rowNumber, r.column.slice(0, 120), r.reason.slice(0, 300)]), transaction },
      );
    }
    await sequelize.query(
      `UPDATE reception_imports SET imported = imported + ?, duplicates = duplicates + ?, rejected = rejected + ?,
         rowsRead = rowsRead + ?, bytesRead = ?, heartbeatAt = ?, updatedAt = ? WHERE id = ? AND status = 'running'`,
      {
        replacements: [chunk.accepted, chunk.duplicates, chunk.rejections.length, chunk.rowsRead, chunk.bytesRead, now, now, importId],
        transaction,
      },
    );
    return true;
  });
}

/** Bytes received and a sign of life while no chunk is due (a slow upload). */
export async function touchImport(sequelize: Sequelize, importId: number, bytesRead: number, now: Date) {
  await sequelize.query(`UPDATE reception_imports SET bytesRead = ?, heartbeatAt = ?, updatedAt = ? WHERE id = ? AND status = 'running'`, {
    replacements: [bytesRead, now, now, importId],
  });
}

export async function finishImport(
  sequelize: Sequelize,
  importId: number,
  end: { status: 'done' | 'failed'; error: string | null; bytesRead: number; bytesTotal?: number },
  now: Date,
) {
  await sequelize.query(
    `UPDATE reception_imports SET status = ?, error = ?, bytesRead = ?, bytesTotal = COALESCE(?, bytesTotal), finishedAt = ?, updatedAt = ?
      WHERE id = ? AND status = 'running'`,
    { replacements: [end.status, end.error?.slice(0, 1000) ?? null, end.bytesRead, end.bytesTotal ?? null, now, now, importId] },
  );
}

export async function findImport(sequelize: Sequelize, ownerId: number, importId: number) {
  const rows = await sequelize.query<ImportRow>('SELECT * FROM reception_imports WHERE id = ? AND ownerId = ?', {
    replacements: [importId, ownerId],
    type: QueryTypes.SELECT,
  });
  return rows[0] ? toStatus(rows[0]) : null;
}

export async function listImports(sequelize: Sequelize, ownerId: number, limit: number) {
  const rows = await sequelize.query<ImportRow>(
    'SELECT * FROM reception_imports WHERE ownerId = ? ORDER BY createdAt DESC, id DESC LIMIT ?',
    {
      replacements: [ownerId, limit],
      type: QueryTypes.SELECT,
    },
  );
  return rows.map(toStatus);
}

/** One page of an import's rejected rows, in row order, after a given rejection id. */
export async function rejectionsAfter(sequelize: Sequelize, importId: number, afterId: number, limit: number) {
  return sequelize.query<{ id: number; rowNumber: number; columnName: string; reason: string }>(
    'SELECT id, rowNumber, columnName, reason FROM reception_import_rejections WHERE importId = ? AND id > ? ORDER BY id LIMIT ?',
    { replacements: [importId, afterId, limit], type: QueryTypes.SELECT },
  );
}

export async function runningImports(sequelize: Sequelize) {
  return sequelize.query<{ id: number; processId: string | null; heartbeatAt: Date }>(
    "SELECT id, processId, heartbeatAt FROM reception_imports WHERE status = 'running'",
    { type: QueryTypes.SELECT },
  );
}

/**
 * Ends a job whose process died: its counts become exactly what its committed chunks stored (from the batch
 * records written with the reports) and the rejected rows kept, so nothing is half-counted.
 */
export async function failInterrupted(sequelize: Sequelize, importId: number, describe: (stored: StoredCounts) => string, now: Date) {
  return sequelize.transaction(async (transaction) => {
    const [job] = await sequelize.query<{ status: string }>('SELECT status FROM reception_imports WHERE id = ? FOR UPDATE', {
      replacements: [importId],
      type: QueryTypes.SELECT,
      transaction,
    });
    if (job?.status !== 'running') return null;
    const [stored] = await sequelize.query<{ imported: number | string | null; duplicates: number | string | null }>(
      'SELECT SUM(accepted) AS imported, SUM(duplicates) AS duplicates FROM reception_batches WHERE importId = ?',
      { replacements: [importId], type: QueryTypes.SELECT, transaction },
    );
    // Rejected rows are kept and counted in one transaction, so the job's own count is exact.
    const [{ rejected }] = await sequelize.query<{ rejected: number }>('SELECT rejected FROM reception_imports WHERE id = ?', {
      replacements: [importId],
      type: QueryTypes.SELECT,
      transaction,
    });
    const counts: StoredCounts = { imported: Number(stored?.imported ?? 0), duplicates: Number(stored?.duplicates ?? 0), rejected };
    const rowsRead = counts.imported + counts.duplicates + counts.rejected;
    await sequelize.query(
      `UPDATE reception_imports SET status = 'failed', imported = ?, duplicates = ?, rejected = ?, rowsRead = ?, error = ?,
         finishedAt = ?, updatedAt = ? WHERE id = ?`,
      {
        replacements: [counts.imported, counts.duplicates, counts.rejected, rowsRead, describe(counts).slice(0, 1000), now, now, importId],
        transaction,
      },
    );
    return { ...counts, rowsRead };
  });
}
export type StoredCounts = { imported: number; duplicates: number; rejected: number };

// ---------------------------------------------------------------------------------------------------------------
// Saved mappings

type MappingRow = { id: number; name: string; mapping: string; createdAt: Date };
const toSaved = (r: MappingRow): SavedMapping => ({
  id: r.id,
  name: r.name,
  mapping: JSON.parse(r.mapping) as ImportMapping,
  createdAt: new Date(r.createdAt).toISOString(),
});

export async function listMappings(sequelize: Sequelize, ownerId: number) {
  const rows = await sequelize.query<MappingRow>(
    'SELECT id, name, mapping, createdAt FROM reception_mappings WHERE ownerId = ? ORDER BY name',
    {
      replacements: [ownerId],
      type: QueryTypes.SELECT,
    },
  );
  return rows.map(toSaved);
}

/** Saves a mapping; null when the owner already has one by that name. */
export async function createMapping(sequelize: Sequelize, ownerId: number, name: string, mapping: ImportMapping, now: Date) {
  try {
    const [id] = await sequelize.query(
      'INSERT INTO reception_mappings (ownerId, name, mapping, createdAt, updatedAt) VALUES (?, ?, ?, ?, ?)',
      {
        replacements: [ownerId, name, JSON.stringify(mapping), now, now],
        type: QueryTypes.INSERT,
      },
    );
    return toSaved({ id: Number(id), name, mapping: JSON.stringify(mapping), createdAt: now });
  } catch (error) {
    if (error instanceof UniqueConstraintError) return null;
    throw error;
  }
}

export async function deleteMapping(sequelize: Sequelize, ownerId: number, mappingId: number): Promise<boolean> {
  const [result] = await sequelize.query('DELETE FROM reception_mappings WHERE id = ? AND ownerId = ?', {
    replacements: [mappingId, ownerId],
  });
  return Number((result as { affectedRows?: number }).affectedRows ?? 0) > 0;
}
