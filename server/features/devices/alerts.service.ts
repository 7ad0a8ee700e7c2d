import type { Sequelize } from 'sequelize';
import { bandFor } from '@/shared/domain/bands';
import { calibrationFromReports, heardWindow, OFF_FREQUENCY_MARGIN_HZ } from '@/shared/domain/reception';
import { bandOnAir } from '@/shared/domain/workshop';
import type { AlertRule, Station } from '@/shared/schemas';
import type { OutgoingMail } from '../../mail/mailer';
import { contactOf } from '../auth/auth.service';
import { planFor } from '../schedules/plan';
import { heardErrors, othersHeardOn, reportsOfStation } from '../receptions/receptions.service';
import { planInputsOf } from '../schedules/schedules.service';
import { stationById } from '../stations/stations.service';
import * as repo from './alerts.repo';
import { driftFor, settingsOf } from './beacon-status.service';
import * as heartbeats from './heartbeats.repo';
import * as tokens from './tokens.repo';
import * as transmissions from './transmissions.repo';

type Finding = { rule: AlertRule; message: string };

const JOB = 'alerts';

const ruleTitles: Record<AlertRule, string> = {
  silent: 'silent while scheduled',
  'clock-offset': 'clock off',
  'drift-out-of-window': 'drift leaves the window',
  'transmitting-while-suspended': 'transmitting while suspended',
  'unheard-while-transmitting': 'transmitting but unheard',
  'heard-off-frequency': 'heard off frequency',
};

const HOUR_MS = 3_600_000;
/** "Transmitting but unheard" looks back this far (our rule): a beacon with a sound antenna is heard within hours. */
export const UNHEARD_HOURS = 6;
/** "Heard off frequency" reads the last day's reports (our rule). */
const OFF_FREQUENCY_LOOKBACK_MS = 24 * HOUR_MS;

/** The two rules that read what receivers heard. */
async function reportFindingsFor(sequelize: Sequelize, station: Station, nowMs: number): Promise<Finding[]> {
  const findings: Finding[] = [];
  const { unit, schedule } = await planInputsOf(station);
  const sinceMs = nowMs - UNHEARD_HOURS * HOUR_MS;
  if (schedule && station.transmitEnabled && !station.suspension) {
    // sending all along: the device reported transmissions in the window's first hour and since, and the plan has them
    const sentEarly = await transmissions.countBetween(station.id, new Date(sinceMs), new Date(sinceMs + HOUR_MS));
    const sentLate = sentEarly > 0 ? await transmissions.countBetween(station.id, new Date(sinceMs + HOUR_MS), new Date(nowMs)) : 0;
    const planned = sentLate > 0 ? planFor(station, unit, schedule, sinceMs, nowMs).transmissions : [];
    if (planned.length > 0 && (await reportsOfStation(sequelize, station.id, sinceMs, nowMs)) === 0) {
      const bandIds = [...new Set(planned.map((t) => t.bandId as string))];
      if (await othersHeardOn(sequelize, station.id, bandIds, sinceMs, nowMs)) {
        findings.push({
          rule: 'unheard-while-transmitting',
          message: `The device says it transmitted on ${bandIds.join(', ')} for the last ${UNHEARD_HOURS} hours, but no receiver reported it while others on the same band were heard. Check the antenna, the filter and any amplifier.`,
        });
      }
    }
  }
  const enabled = station.bands.filter((b) => b.enabled);
  if (enabled.length === 0) return findings;
  const heard = await heardErrors(sequelize, station.id, nowMs - OFF_FREQUENCY_LOOKBACK_MS, nowMs);
  for (const band of enabled) {
    const found = bandFor(band.bandId, station.region);
    if (!found.ok) continue;
    const calibratedMs = band.calibratedAt ? Date.parse(band.calibratedAt) : 0;
    const result = calibrationFromReports(
      band.bandId,
      band.calibrationOffsetHz,
      heard.filter((h) => h.bandId === band.bandId && h.slotStartMs >= calibratedMs),
    );
    if (result.medianErrorHz === null) continue;
    const window = heardWindow(found.band.dialHz, found.band.dialHz + station.audioOffsetHz, result.medianErrorHz);
    if (window.marginHz < OFF_FREQUENCY_MARGIN_HZ) {
      findings.push({
        rule: 'heard-off-frequency',
        message: `Receivers hear ${found.band.name} ${Math.abs(result.medianErrorHz).toFixed(1)} Hz ${result.medianErrorHz >= 0 ? 'high' : 'low'} (median of ${result.reports} reports): a tone is ${window.marginHz < 0 ? 'outside the window' : `only ${window.marginHz.toFixed(1)} Hz from the window edge`}. Calibrate ${found.band.name} from reports.`,
      });
      break;
    }
  }
  return findings;
}

/** Which of our rules a station breaks right now. */
async function findingsFor(station: Station, nowMs: number, tokenIssuedMs: number): Promise<Finding[]> {
  const settings = await settingsOf(station.id);
  const [{ unit, schedule }, last] = await Promise.all([planInputsOf(station), heartbeats.lastAtOrBefore(station.id, new Date(nowMs))]);
  const findings: Finding[] = [];
  const silentMs = settings.silentMinutes * 60_000;
  const lastMs = last?.receivedAt.getTime() ?? null;
  // "Scheduled" means on a live plan today (transmissions within a day either side), not "a slot
  // fell in the last N minutes": the alert then stays open until the device is heard again.
  // A device never heard from gets the same grace, counted from when its token was issued.
  const heardOrIssuedMs = lastMs ?? tokenIssuedMs;
  if (schedule && station.transmitEnabled && !station.suspension && nowMs - heardOrIssuedMs > silentMs) {
    const onAir = planFor(station, unit, schedule, nowMs - 86_400_000, nowMs + 86_400_000).transmissions.length > 0;
    if (onAir) {
      const minutes = settings.silentMinutes === 1 ? 'a minute' : `${settings.silentMinutes} minutes`;
      findings.push({ rule: 'silent', message: `No word from the device for over ${minutes} while it is scheduled to transmit.` });
    }
  }
  const fresh = last && lastMs !== null && nowMs - lastMs <= silentMs;
  if (fresh && last.clockOffsetMs !== null && Math.abs(last.clockOffsetMs) > settings.clockOffsetMs) {
    findings.push({
      rule: 'clock-offset',
      message: `The device clock is ${Math.round(last.clockOffsetMs)} ms off (limit ${settings.clockOffsetMs} ms): check its time source.`,
    });
  }
  if (fresh && unit && last.temperatureC !== null) {
    const drift = driftFor(station, unit, last.temperatureC);
    if (drift !== null && drift > 0) {
      for (const band of station.bands.filter((b) => b.enabled)) {
        const air = bandOnAir(station, unit, band.bandId);
        if ('problem' in air) continue;
        if (air.window.marginHz < drift) {
          findings.push({
            rule: 'drift-out-of-window',
            message: `At ${last.temperatureC.toFixed(1)} °C the signal may move ${drift.toFixed(1)} Hz, more than the ${air.window.marginHz.toFixed(1)} Hz margin on ${air.band.name}.`,
          });
          break;
        }
      }
    }
  }
  if (station.suspension) {
    const since = new Date(station.suspension.at);
    const sent = await transmissions.countBetween(station.id, since, new Date(nowMs));
    if (sent > 0)
      findings.push({
        rule: 'transmitting-while-suspended',
        message: `The device reported ${sent} transmission${sent === 1 ? '' : 's'} since the club suspended the station.`,
      });
  }
  return findings;
}

/**
 * One evaluation round. Only the process that wins the job row's lock (FOR UPDATE SKIP LOCKED)
 * evaluates; the others skip, so several servers never open or mail an alert twice.
 * Returns the mails to send (once per opening), or null when another process holds the lock.
 */
export async function evaluateAlerts(sequelize: Sequelize, nowMs = Date.now()): Promise<OutgoingMail[] | null> {
  await repo.ensureJobRow(sequelize, JOB);
  return sequelize.transaction(async (transaction) => {
    if (!(await repo.claimJob(sequelize, JOB, transaction))) return null;
    const now = new Date(nowMs);
    for (const { stationId, updatedAt } of await tokens.findAllIssued(transaction)) {
      const station = await stationById(stationId, transaction);
      if (!station) continue;
      const findings = [
        ...(await findingsFor(station, nowMs, updatedAt.getTime())),
        ...(await reportFindingsFor(sequelize, station, nowMs)),
      ];
      const open = await repo.findOpen(stationId, transaction);
      for (const finding of findings) {
        const existing = open.find((a) => a.rule === finding.rule);
        if (existing) await repo.stillSeen(existing, finding.message, now, transaction);
        else await repo.open({ stationId, rule: finding.rule, message: finding.message }, now, transaction);
      }
      for (const alert of open) {
        if (!findings.some((f) => f.rule === alert.rule)) await repo.resolve(alert, now, transaction);
      }
    }
    const mails: OutgoingMail[] = [];
    for (const alert of await repo.findUnmailed(transaction)) {
      await repo.markMailed(alert, now, transaction);
      const station = await stationById(alert.stationId, transaction);
      const owner = station && (await contactOf(station.ownerId, transaction));
      if (!station || !owner) continue;
      mails.push({
        to: owner.email,
        subject: `Faintline alert: ${station.name} — ${ruleTitles[alert.rule as AlertRule]}`,
        text: `Hello ${owner.displayName},\n\n${alert.message}\n\nStation: ${station.name} (${station.callsign})\nOpened: ${alert.openedAt.toISOString().replace('T', ' ').slice(0, 19)} UTC\n\nThe alert closes by itself when the cause goes away; you get one mail per opening.\n`,
      });
    }
    await repo.stampJob(sequelize, JOB, now, transaction);
    return mails;
  });
}
