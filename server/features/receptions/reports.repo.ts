/**
 * The reception report store: a bulk INSERT IGNORE (the decode key makes a repeat a no-op), then the
 * aggregates the screens read are brought up to date from exactly the rows this batch added, all in one
 * transaction. Concurrent batches carrying the same decode wait on its key, so nothing is counted twice.
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

/** One report ready to store: validated, matched to a station (or not), with its path worked out. */
export type StorableReport = {
  slotStartMs: number;
  bandId: string;
  txCallsign: string;
  txLocator: string | null;
  txPowerDbm: number | null;
  rxCallsign: string;
  rxLocator: string;
  snrDb: number;
  frequencyHz: number;
  driftHz: number;
  distanceKm: number | null;
  bearingDeg: number | null;
  frequencyErrorHz: number | null;
  stationId: number | null;
  ambiguous: boolean;
};

export type BatchOrigin = { importerId: number; listeningPostId?: number | null; importId?: number | null };
export type StoreResult = { accepted: number; duplicates: number };

const COLUMNS = [
  'slotStart',
  'bandId',
  'txCallsign',
  'txLocator',
  'txPowerDbm',
  'rxCallsign',
  'rxLocator',
  'snrDb',
  'frequencyHz',
  'driftHz',
  'distanceKm',
  'bearingDeg',
  'frequencyErrorHz',
  'stationId',
  'ambiguous',
  'importerId',
  'batchId',
] as const;
/** Rows per INSERT statement when the driver's bulk protocol is not at hand (placeholders stay far below the limits). */
const ROWS_PER_STATEMENT = 1000;
const INSERT_SQL = `INSERT IGNORE INTO reception_reports (${COLUMNS.join(',')}) VALUES (${COLUMNS.map(() => '?').join(',')})`;

const toSqlTime = (ms: number) => new Date(ms).toISOString().slice(0, 19).replace('T', ' ');

function rowValues(r: StorableReport, importerId: number, batchId: number): unknown[] {
  return [
    toSqlTime(r.slotStartMs),
    r.bandId,
    r.txCallsign,
    r.txLocator,
    r.txPowerDbm,
    r.rxCallsign,
    r.rxLocator,
    Math.round(r.snrDb),
    r.frequencyHz,
    Math.round(r.driftHz),
    r.distanceKm,
    r.bearingDeg,
    r.frequencyErrorHz,
    r.stationId,
    r.ambiguous ? 1 : 0,
    importerId,
    batchId,
  ];
}

type BulkResult = { affectedRows: number };
/** The MariaDB connector's connection under a Sequelize transaction (Sequelize keeps it as `transaction.connection`). */
type BulkConnection = { batch(sql: string, values: unknown[][]): Promise<BulkResult | BulkResult[]> };

function bulkConnection(transaction: Transaction): BulkConnection | null {
  const connection = (transaction as unknown as { connection?: Partial<BulkConnection> }).connection;
  return connection && typeof connection.batch === 'function' ? (connection as BulkConnection) : null;
}

/**
 * Stores the rows with the connector's bulk protocol: one prepared INSERT, the values sent in binary packets
 * (no SQL text to build, escape and parse per row). Falls back to multi-row INSERT statements elsewhere.
 */
async function insertRows(sequelize: Sequelize, rows: StorableReport[], importerId: number, batchId: number, transaction: Transaction) {
  const values = rows.map((r) => rowValues(r, importerId, batchId));
  const bulk = bulkConnection(transaction);
  if (bulk) {
    const result = await bulk.batch(INSERT_SQL, values);
    return (Array.isArray(result) ? result : [result]).reduce((sum, r) => sum + Number(r.affectedRows ?? 0), 0);
  }
  let inserted = 0;
  const rowPlaceholder = `(${COLUMNS.map(() => '?').join(',')})`;
  for (let start = 0; start < values.length; start += ROWS_PER_STATEMENT) {
    const chunk = values.slice(start, start + ROWS_PER_STATEMENT);
    const sql = `INSERT IGNORE INTO reception_reports (${COLUMNS.join(',')}) VALUES ${chunk.map(() => rowPlaceholder).join(',')}`;
    const [, affected] = await sequelize.query(sql, { replacements: chunk.flat(), type: QueryTypes.INSERT, transaction });
    inserted += Number(affected ?? 0);
  }
  return inserted;
}

/** Adds what this batch stored (and nothing a repeat brought) to the per-hour, per-slot and per-receiver-day aggregates. */
async function updateAggregates(sequelize: Sequelize, batchId: number, transaction: Transaction) {
  // The hour roll-up first: a slot this batch heard for the first time (no slot row yet) adds one heard slot.
  await sequelize.query(
    `INSERT INTO reception_hour_counts (stationId, hourStart, bandId, reports, slots, bestSnrDb)
       SELECT b.stationId, b.hourStart, b.bandId, SUM(b.n), SUM(s.stationId IS NULL), MAX(b.best)
         FROM (SELECT stationId, slotStart, bandId, DATE_FORMAT(slotStart, '%Y-%m-%d %H:00:00') AS hourStart, COUNT(*) AS n, MAX(snrDb) AS best
                 FROM reception_reports WHERE batchId = ? AND stationId IS NOT NULL GROUP BY stationId, slotStart, bandId) b
         LEFT JOIN reception_slot_counts s ON s.stationId = b.stationId AND s.slotStart = b.slotStart AND s.bandId = b.bandId
        GROUP BY b.stationId, b.hourStart, b.bandId
     ON DUPLICATE KEY UPDATE reports = reports + VALUES(reports), slots = slots + VALUES(slots), bestSnrDb = GREATEST(bestSnrDb, VALUES(bestSnrDb))`,
    { replacements: [batchId], transaction },
  );
  await sequelize.query(
    `INSERT INTO reception_slot_counts (stationId, slotStart, bandId, reports, bestSnrDb)
       SELECT stationId, slotStart, bandId, COUNT(*), MAX(snrDb) FROM reception_reports
       WHERE batchId = ? AND stationId IS NOT NULL GROUP BY stationId, slotStart, bandId
     ON DUPLICATE KEY UPDATE reports = reports + VALUES(reports), bestSnrDb = GREATEST(bestSnrDb, VALUES(bestSnrDb))`,
    { replacements: [batchId], transaction },
  );
  await sequelize.query(
    `INSERT INTO reception_receiver_days
       (stationId, day, bandId, rxCallsign, rxLocator, distanceKm, bearingDeg, reports, bestSnrDb, bestSnrPerWattDb, bestKmPerWatt, lastSlotStart)
       SELECT stationId, DATE(slotStart), bandId, rxCallsign, MAX(rxLocator), MAX(distanceKm), MAX(bearingDeg), COUNT(*), MAX(snrDb),
              MAX(snrDb - (txPowerDbm - 30)), MAX(distanceKm / POW(10, (txPowerDbm - 30) / 10)), MAX(slotStart)
       FROM reception_reports WHERE batchId = ? AND stationId IS NOT NULL GROUP BY stationId, DATE(slotStart), bandId, rxCallsign
     ON DUPLICATE KEY UPDATE reports = reports + VALUES(reports), bestSnrDb = GREATEST(bestSnrDb, VALUES(bestSnrDb)),
       bestSnrPerWattDb = GREATEST(COALESCE(bestSnrPerWattDb, VALUES(bestSnrPerWattDb)), COALESCE(VALUES(bestSnrPerWattDb), bestSnrPerWattDb)),
       bestKmPerWatt = GREATEST(COALESCE(bestKmPerWatt, VALUES(bestKmPerWatt)), COALESCE(VALUES(bestKmPerWatt), bestKmPerWatt)),
       lastSlotStart = GREATEST(lastSlotStart, VALUES(lastSlotStart)), rxLocator = VALUES(rxLocator),
       distanceKm = VALUES(distanceKm), bearingDeg = VALUES(bearingDeg)`,
    { replacements: [batchId], transaction },
  );
}

/**
 * Stores a batch of reports with its origin. Returns how many were new and how many were repeats of decodes
 * already stored. Everything commits together or not at all, so an acknowledged batch is stored whole.
 */
export async function storeReports(
  sequelize: Sequelize,
  rows: StorableReport[],
  origin: BatchOrigin,
  receivedAt: Date,
): Promise<StoreResult> {
  if (rows.length === 0) return { accepted: 0, duplicates: 0 };
  return sequelize.transaction(async (transaction) => {
    const [batchId] = await sequelize.query(
      'INSERT INTO reception_batches (importerId, listeningPostId, importId, receivedAt) VALUES (?, ?, ?, ?)',
      {
        replacements: [origin.importerId, origin.listeningPostId ?? null, origin.importId ?? null, receivedAt],
        type: QueryTypes.INSERT,
        transaction,
      },
    );
    const accepted = await insertRows(sequelize, rows, origin.importerId, Number(batchId), transaction);
    // Only reports matched to one of our stations feed the aggregates: a batch of other transmitters skips that read.
    if (accepted > 0 && rows.some((r) => r.stationId !== null)) await updateAggregates(sequelize, Number(batchId), transaction);
    const duplicates = rows.length - accepted;
    await sequelize.query('UPDATE reception_batches SET accepted = ?, duplicates = ? WHERE id = ?', {
      replacements: [accepted, duplicates, batchId],
      transaction,
    });
    return { accepted, duplicates };
  });
}
