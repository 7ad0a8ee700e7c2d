import type { heartbeatInput, transmissionLogInput } from '@/shared/schemas';
import { isDatabaseUnavailable } from '../../lib/db-errors';
import type { TransactionRunner } from '../../db/transaction';
import { createGroupWriter } from '../../lib/group-writer';
import * as heartbeats from './heartbeats.repo';
import * as transmissions from './transmissions.repo';

type Heartbeat = ReturnType<typeof heartbeatInput.parse>;
type SentTransmissions = ReturnType<typeof transmissionLogInput.parse>['transmissions'];

/**
 * What devices report: heartbeats (written a group per INSERT) and the transmissions they made. Both go
 * through the runner's transaction, which retries a write that meets a conflict (on Galera, another node's).
 */
export function createReportStore(db: TransactionRunner) {
  // Heartbeats from many devices at once are stored a group per INSERT; each is acknowledged once written.
  // A database outage fails the whole group at once (503 to each device), so nothing unsaved is acknowledged.
  const writeHeartbeat = createGroupWriter<heartbeats.HeartbeatValues>(
    (rows) => db.transaction((transaction) => heartbeats.insertMany(rows, transaction)),
    { isUnavailable: isDatabaseUnavailable },
  );

  return {
    /** For a graceful shutdown: resolves once every heartbeat handed in is stored or refused. */
    drain: () => writeHeartbeat.drain(),
    heartbeat: (stationId: number, report: Heartbeat, receivedAt = new Date()) =>
      writeHeartbeat({
        stationId,
        receivedAt,
        report: JSON.stringify(report),
        clockOffsetMs: report.clockOffsetMs,
        temperatureC: report.temperatureC,
      }),
    transmissions: (stationId: number, sent: SentTransmissions, receivedAt = new Date()) =>
      db.transaction((transaction) =>
        transmissions.insertMany(
          sent.map((t) => ({
            stationId,
            startedAt: new Date(t.startUtc),
            bandId: t.bandId,
            frequencyHz: t.frequencyHz,
            messageText: t.messageText,
            receivedAt,
          })),
          transaction,
        ),
      ),
  };
}
