import type { heartbeatInput, transmissionLogInput } from '@/shared/schemas';
import { createGroupWriter } from '../../lib/group-writer';
import * as heartbeats from './heartbeats.repo';
import * as transmissions from './transmissions.repo';

type Heartbeat = ReturnType<typeof heartbeatInput.parse>;
type SentTransmissions = ReturnType<typeof transmissionLogInput.parse>['transmissions'];

/** What devices report: heartbeats (written a group per INSERT) and the transmissions they made. */
export function createReportStore() {
  // Heartbeats from many devices at once are stored a group per INSERT; each is acknowledged once written.
  const writeHeartbeat = createGroupWriter(heartbeats.insertMany);

  return {
    heartbeat: (stationId: number, report: Heartbeat, receivedAt = new Date()) =>
      writeHeartbeat({
        stationId,
        receivedAt,
        report: JSON.stringify(report),
        clockOffsetMs: report.clockOffsetMs,
        temperatureC: report.temperatureC,
      }),
    transmissions: (stationId: number, sent: SentTransmissions, receivedAt = new Date()) =>
      transmissions.insertMany(
        sent.map((t) => ({
          stationId,
          startedAt: new Date(t.startUtc),
          bandId: t.bandId,
          frequencyHz: t.frequencyHz,
          messageText: t.messageText,
          receivedAt,
        })),
      ),
  };
}
