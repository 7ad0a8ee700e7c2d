/**
 * The one way reports come in (listening posts, file imports, the demo, the simulator): work out each report's
 * path from the shared path code, match it to a station of ours, then store the batch with its aggregates.
 */
import type { Sequelize } from 'sequelize';
import { pathBetweenLocators } from '@/shared/domain/path';
import { slotStartMs, SLOT_MS } from '@/shared/domain/reception';
import type { ReceptionReportValues } from '@/shared/schemas';
import { storeReports, type BatchOrigin, type StorableReport, type StoreResult } from './reports.repo';
import { candidatesFor, type MatchCandidate } from './station-match.repo';

function pathOf(report: ReportToIngest) {
  if (!report.txLocator) return { distanceKm: null, bearingDeg: null };
  const path = pathBetweenLocators(report.txLocator, report.rxLocator);
  return path.ok ? { distanceKm: path.distanceKm, bearingDeg: path.bearingDeg } : { distanceKm: null, bearingDeg: null };
}

/** The station a report belongs to, or ambiguous when two of ours could have sent it. */
function matchStation(report: ReportToIngest, slotMs: number, candidates: MatchCandidate[]) {
  const fitting = candidates.filter(
    (c) => c.callsign === report.txCallsign && c.bandId === report.bandId && c.createdAtMs <= slotMs + SLOT_MS,
  );
  if (fitting.length === 1) return { stationId: fitting[0].stationId, ambiguous: false };
  return { stationId: null, ambiguous: fitting.length > 1 };
}

export type ReportToIngest = ReceptionReportValues & { rxCallsign: string; rxLocator: string };

/** Prepares and stores reports that already passed the shared schema. */
export async function ingestReports(sequelize: Sequelize, reports: ReportToIngest[], origin: BatchOrigin, now: Date): Promise<StoreResult> {
  const candidates = await candidatesFor(sequelize, [...new Set(reports.map((r) => r.txCallsign))]);
  const rows: StorableReport[] = reports.map((report) => {
    const slotMs = slotStartMs(Date.parse(report.slotUtc));
    return {
      slotStartMs: slotMs,
      bandId: report.bandId,
      txCallsign: report.txCallsign,
      txLocator: report.txLocator ?? null,
      txPowerDbm: report.txPowerDbm ?? null,
      rxCallsign: report.rxCallsign,
      rxLocator: report.rxLocator,
      snrDb: report.snrDb,
      frequencyHz: report.frequencyHz,
      driftHz: report.driftHz ?? 0,
      ...pathOf(report),
      frequencyErrorHz: null,
      ...matchStation(report, slotMs, candidates),
    };
  });
  return storeReports(sequelize, rows, origin, now);
}
