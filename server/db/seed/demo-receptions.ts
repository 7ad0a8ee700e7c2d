/**
 * The demo's reception reports: listening posts for the demo operators (and the simulator's posts), and a few
 * days of reports of the demo stations from fictional receivers on several continents, following our own
 * propagation model (distance, band, day or night on the path, power). Stored through ingestReports like any.
 */
import type { Sequelize } from 'sequelize';
import { locatorToLatLon, type LatLon } from '@/shared/domain/locator';
import { expectedHeardHz, SLOT_MS } from '@/shared/domain/reception';
import { modelledSnrDb } from '@/shared/domain/reception/propagation';
import { hashText, seededRandom } from '@/shared/domain/schedule';
import { hashToken } from '../../features/devices/tokens.service';
import { ingestReports, type ReportToIngest } from '../../features/receptions/ingest.service';
import { stationPlans } from '../../features/receptions/plan-cache';
import { ListeningPostModel } from '../models/listening-post.model';
import { StationModel } from '../models/station.model';
import { UserModel } from '../models/user.model';
import { DEMO_RECEIVERS, DEMO_SIM_POSTS } from './demo-receivers';

export const DEMO_REPORT_DAYS = 3;
const DAY_MS = 86_400_000;

const places = new Map<string, LatLon>();
const at = (locator: string): LatLon => {
  let place = places.get(locator);
  if (!place) {
    const found = locatorToLatLon(locator);
    if (!found.ok) throw new Error(`demo locator ${locator}: ${found.reason}`);
    places.set(locator, (place = { lat: found.lat, lon: found.lon }));
  }
  return place;
};

/** Transmitters outside Faintline that the operators' own receivers also hear (shown only to them). */
const OTHER_TRANSMITTERS = [
  { callsign: 'Q9OTA', locator: 'JN47', powerDbm: 30, bandId: '20m' },
  { callsign: 'Q9OTB', locator: 'IO63', powerDbm: 23, bandId: '40m' },
];

type Receiver = { callsign: string; locator: string; bands: string[]; origin: { importerId: number; listeningPostId: number | null } };

/**
 * Tobin's hilltop portable (Q2TRY/P) sent on 20 m in the slot after each of the shed rig's 20 m transmissions, from the
 * hill about 3 dB better heard; most receivers that heard one heard both, so the Compare screen has common ground.
 */
function addPortableBesideShed(stations: StationModel[], batches: Map<Receiver, ReportToIngest[]>, random: () => number, nowMs: number) {
  const portable = stations.find((s) => s.callsign === 'Q2TRY/P');
  if (!portable) return;
  for (const [receiver, reports] of batches) {
    // about one receiver in eight never hears the portable (screened from the hill), so "heard A only" has entries
    if (hashText(`portable:${receiver.callsign}`) % 8 === 0) continue;
    const fromShed = reports.filter((r) => r.txCallsign === 'Q2TRY' && r.bandId === '20m');
    for (const shed of fromShed) {
      if (random() < 0.15 || Date.parse(shed.slotUtc) + 2 * SLOT_MS > nowMs) continue; // not heard this time, or not sent yet
      reports.push({
        ...shed,
        slotUtc: new Date(Date.parse(shed.slotUtc) + SLOT_MS).toISOString(),
        txCallsign: portable.callsign,
        txLocator: portable.locator,
        snrDb: Math.max(-30, Math.min(20, Math.round(shed.snrDb + 3 + (random() + random() - 1) * 4))),
        rxCallsign: receiver.callsign,
      });
    }
  }
}

export async function seedDemoReceptions(sequelize: Sequelize, nowMs: number) {
  const people = await UserModel.findAll({ order: [['id', 'ASC']] });
  const admin = people[0];
  const stations = await StationModel.findAll({ order: [['id', 'ASC']] });
  // The demo club has been on the air for a few days.
  const since = new Date(nowMs - (DEMO_REPORT_DAYS + 1) * DAY_MS);
  await sequelize.query('UPDATE stations SET createdAt = ?', { replacements: [since] });

  const receivers: Receiver[] = [];
  for (const person of people) {
    const own = stations.find((s) => s.ownerId === person.id);
    if (!person.callsign || !own) continue;
    const post = await ListeningPostModel.create({
      ownerId: person.id,
      name: `${person.displayName.split(' ')[0]}'s receiver`,
      callsign: person.callsign,
      locator: own.locator.length >= 6 ? own.locator : `${own.locator}MM`,
      tokenHash: null,
      tokenIssuedAt: null,
    });
    receivers.push({
      callsign: post.callsign,
      locator: post.locator,
      bands: ['80m', '40m', '30m', '20m'],
      origin: { importerId: person.id, listeningPostId: post.id },
    });
  }
  const simPostIds = new Map<string, number>();
  for (const sim of DEMO_SIM_POSTS) {
    const post = await ListeningPostModel.create({
      ownerId: admin.id,
      name: sim.name,
      callsign: sim.callsign,
      locator: sim.locator,
      tokenHash: hashToken(sim.token),
      tokenIssuedAt: since,
    });
    simPostIds.set(sim.callsign, post.id);
  }
  for (const r of DEMO_RECEIVERS) {
    receivers.push({ ...r, origin: { importerId: admin.id, listeningPostId: simPostIds.get(r.callsign) ?? null } });
  }

  const plans = await stationPlans(
    sequelize,
    stations.map((s) => s.id),
    nowMs,
  );
  const batches = new Map<Receiver, ReportToIngest[]>(receivers.map((r) => [r, []]));
  const random = seededRandom(hashText(`demo-receptions:${Math.floor(nowMs / DAY_MS)}`));
  const receiverOffsetHz = new Map(receivers.map((r) => [r, Math.round((random() - 0.5) * 6)]));
  const firstDay = Math.floor(nowMs / DAY_MS) - DEMO_REPORT_DAYS;
  for (const station of stations) {
    const entry = plans.get(station.id);
    if (!entry?.plan || !station.transmitEnabled) continue;
    const powerDbm = Number(/ (\d+)$/.exec(entry.plan.messages[0]?.text ?? '')?.[1] ?? 23);
    // each demo station's own small calibration error, and drift on one of them
    const errorHz = ((station.id * 7) % 5) - 2 + 0.4;
    const drifts = station.id % 3 === 0;
    const tx = at(station.locator);
    for (let day = firstDay; day <= firstDay + DEMO_REPORT_DAYS; day++) {
      for (const slot of entry.memo.day(day).slots) {
        if (slot.slotMs + SLOT_MS > nowMs || slot.slotMs < nowMs - DEMO_REPORT_DAYS * DAY_MS) continue;
        for (const receiver of receivers) {
          if (!receiver.bands.includes(slot.bandId) || receiver.callsign === station.callsign) continue;
          const snrDb = modelledSnrDb({ tx, rx: at(receiver.locator), bandId: slot.bandId, utcMs: slot.slotMs, powerDbm, random });
          if (snrDb === null) continue;
          batches.get(receiver)!.push({
            slotUtc: new Date(slot.slotMs).toISOString(),
            bandId: slot.bandId as ReportToIngest['bandId'],
            txCallsign: station.callsign,
            txLocator: station.locator,
            txPowerDbm: powerDbm,
            snrDb,
            frequencyHz: Math.round(expectedHeardHz(slot.carrierHz) + errorHz + receiverOffsetHz.get(receiver)!),
            driftHz: drifts && random() < 0.3 ? (random() < 0.5 ? -1 : 1) : 0,
            rxCallsign: receiver.callsign,
            rxLocator: receiver.locator,
          });
        }
      }
    }
  }
  addPortableBesideShed(stations, batches, random, nowMs);
  // The operators' own receivers also hear transmitters outside Faintline, every tenth slot or so.
  for (const receiver of receivers.filter((r) => r.origin.listeningPostId !== null && !simPostIds.has(r.callsign))) {
    for (const other of OTHER_TRANSMITTERS) {
      for (
        let slotMs = Math.floor((nowMs - DEMO_REPORT_DAYS * DAY_MS) / SLOT_MS) * SLOT_MS;
        slotMs < nowMs - SLOT_MS;
        slotMs += 10 * SLOT_MS
      ) {
        const snrDb = modelledSnrDb({
          tx: at(other.locator),
          rx: at(receiver.locator),
          bandId: other.bandId,
          utcMs: slotMs,
          powerDbm: other.powerDbm,
          random,
        });
        if (snrDb === null) continue;
        batches.get(receiver)!.push({
          slotUtc: new Date(slotMs).toISOString(),
          bandId: other.bandId as ReportToIngest['bandId'],
          txCallsign: other.callsign,
          txLocator: other.locator,
          txPowerDbm: other.powerDbm,
          snrDb,
          frequencyHz: other.bandId === '20m' ? 14_097_050 : 7_040_120,
          driftHz: 0,
          rxCallsign: receiver.callsign,
          rxLocator: receiver.locator,
        });
      }
    }
  }
  let stored = 0;
  for (const [receiver, reports] of batches) {
    for (let i = 0; i < reports.length; i += 2000) {
      const result = await ingestReports(sequelize, reports.slice(i, i + 2000), receiver.origin, new Date(nowMs));
      stored += result.accepted;
    }
  }
  return stored;
}
