/**
 * The one way reports come in (listening posts, file imports, the demo, the simulator): work out each report's
 * path from the shared path code, match it to a station of ours, then store the batch with its aggregates.
 */
import type { Sequelize } from 'sequelize';
import { pathBetweenLocators } from '@/shared/domain/path';
import { expectedHeardHz, slotStartMs, SLOT_MS } from '@/shared/domain/reception';
import type { ReceptionIngestResult, RejectedReport } from '@/shared/api/receptions';
import { receptionReportInput, type ReceptionReportValues } from '@/shared/schemas';
import { PlanMemo, stationPlans } from './plan-cache';
import { storeReports, type BatchOrigin, type StorableReport, type StoreResult } from './reports.repo';
import { candidatesFor, type MatchCandidate } from './station-match.repo';

/** A heard frequency further than this from a station's planned centre is not taken as that station's (our rule). */
export const MATCH_TOLERANCE_HZ = 25;
/** The nearest station must be at least this much nearer than the next one to be told apart (our rule). */
export const MATCH_SEPARATION_HZ = 4;

export type ReportToIngest = ReceptionReportValues & { rxCallsign: string; rxLocator: string };

type PathFigures = { distanceKm: number | null; bearingDeg: number | null };
const NO_PATH: PathFigures = { distanceKm: null, bearingDeg: null };
/**
 * Paths per transmitter and receiver locator pair: a receiver hears the same transmitters day after day, so the
 * geodesic (the costly part of storing a report) is worked out once per pair. Bounded: emptied when full.
 */
const pathCache = new Map<string, PathFigures>();
const PATH_CACHE_MAX = 200_000;

function pathOf(report: ReportToIngest): PathFigures {
  if (!report.txLocator) return NO_PATH;
  const key = `${report.txLocator}|${report.rxLocator}`;
  let found = pathCache.get(key);
  if (!found) {
    const path = pathBetweenLocators(report.txLocator, report.rxLocator);
    found = path.ok ? { distanceKm: path.distanceKm, bearingDeg: path.bearingDeg } : NO_PATH;
    if (pathCache.size >= PATH_CACHE_MAX) pathCache.clear();
    pathCache.set(key, found);
  }
  return found;
}

type Match = { stationId: number | null; ambiguous: boolean; frequencyErrorHz: number | null };
const NO_MATCH: Match = { stationId: null, ambiguous: false, frequencyErrorHz: null };

/**
 * The station a report belongs to. One fitting station takes it (with the frequency error when its plan covers the
 * slot). Several (one callsign on one band) are told apart by the plan: only those planned in that slot remain, then
 * the one whose planned tones' centre is clearly nearest the heard frequency; otherwise it is ambiguous.
 */
export function matchReport(
  report: { txCallsign: string; bandId: string; frequencyHz: number },
  slotMs: number,
  candidates: MatchCandidate[],
  carriers: (stationId: number) => Pick<PlanMemo, 'carrierAt'>,
): Match {
  const fitting = candidates.filter(
    (c) => c.callsign === report.txCallsign && c.bandId === report.bandId && c.createdAtMs <= slotMs + SLOT_MS,
  );
  if (fitting.length === 0) return NO_MATCH;
  const errorOf = (stationId: number) => {
    const carrier = carriers(stationId).carrierAt(slotMs, report.bandId);
    return carrier === null ? null : report.frequencyHz - expectedHeardHz(carrier);
  };
  if (fitting.length === 1) return { stationId: fitting[0].stationId, ambiguous: false, frequencyErrorHz: errorOf(fitting[0].stationId) };

  const planned = fitting
    .map((c) => ({ stationId: c.stationId, errorHz: errorOf(c.stationId) }))
    .filter((c): c is { stationId: number; errorHz: number } => c.errorHz !== null)
    .sort((a, b) => Math.abs(a.errorHz) - Math.abs(b.errorHz));
  if (planned.length === 1) return { stationId: planned[0].stationId, ambiguous: false, frequencyErrorHz: planned[0].errorHz };
  if (planned.length >= 2) {
    const [nearest, next] = planned;
    if (Math.abs(nearest.errorHz) <= MATCH_TOLERANCE_HZ && Math.abs(next.errorHz) - Math.abs(nearest.errorHz) >= MATCH_SEPARATION_HZ) {
      return { stationId: nearest.stationId, ambiguous: false, frequencyErrorHz: nearest.errorHz };
    }
  }
  return { stationId: null, ambiguous: true, frequencyErrorHz: null };
}

/** Prepares and stores reports that already passed the shared schema. Candidates and plans are loaded once per batch. */
export async function ingestReports(sequelize: Sequelize, reports: ReportToIngest[], origin: BatchOrigin, now: Date): Promise<StoreResult> {
  if (reports.length === 0) return { accepted: 0, duplicates: 0 };
  const candidates = await candidatesFor(sequelize, [...new Set(reports.map((r) => r.txCallsign))]);
  const plans = await stationPlans(sequelize, [...new Set(candidates.map((c) => c.stationId))], now.getTime());
  const none = new PlanMemo(null);
  const carriers = (stationId: number) => plans.get(stationId)?.memo ?? none;
  // Candidates indexed by callsign and band once per batch, so each report looks at only the stations that fit it.
  const byCallBand = new Map<string, MatchCandidate[]>();
  for (const c of candidates) {
    const key = `${c.callsign}|${c.bandId}`;
    byCallBand.set(key, [...(byCallBand.get(key) ?? []), c]);
  }
  const rows: StorableReport[] = reports.map((report) => {
    const slotMs = slotStartMs(Date.parse(report.slotUtc));
    const fitting = byCallBand.get(`${report.txCallsign}|${report.bandId}`);
    const path = pathOf(report);
    const match = fitting ? matchReport(report, slotMs, fitting, carriers) : NO_MATCH;
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
      distanceKm: path.distanceKm,
      bearingDeg: path.bearingDeg,
      stationId: match.stationId,
      ambiguous: match.ambiguous,
      frequencyErrorHz: match.frequencyErrorHz,
    };
  });
  return storeReports(sequelize, rows, origin, now);
}

/** A report this far after the server's clock is refused: receivers report slots that have begun. */
export const FUTURE_SLACK_MS = 5 * 60_000;

/**
 * What a listening post sent: each item is checked on its own with the shared schema, the good ones are stored
 * (as the post's receiver) and the bad ones come back with their index, field and reason.
 */
export async function ingestFromPost(
  sequelize: Sequelize,
  post: { postId: number; ownerId: number; callsign: string; locator: string },
  items: unknown[],
  now: Date,
): Promise<ReceptionIngestResult> {
  const rejected: RejectedReport[] = [];
  const good: ReportToIngest[] = [];
  items.forEach((item, index) => {
    const parsed = receptionReportInput.safeParse(item);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      rejected.push({ index, field: issue.path.join('.') || 'report', message: issue.message });
      return;
    }
    if (Date.parse(parsed.data.slotUtc) > now.getTime() + FUTURE_SLACK_MS) {
      rejected.push({ index, field: 'slotUtc', message: 'slotUtc lies in the future: check the receiver clock (UTC)' });
      return;
    }
    good.push({ ...parsed.data, rxCallsign: post.callsign, rxLocator: post.locator });
  });
  const stored = await ingestReports(sequelize, good, { importerId: post.ownerId, listeningPostId: post.postId }, now);
  return { ...stored, rejected };
}
