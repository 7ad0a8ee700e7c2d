import bcrypt from 'bcryptjs';
import type { Sequelize, Transaction } from 'sequelize';
import { bandFor, type BandId } from '@/shared/domain/bands';
import { predictedOffsetHz } from '@/shared/domain/calibration';
import { scheduleInput, unitInput, type UnitInput } from '@/shared/schemas';
import { ScheduleModel } from '../models/schedule.model';
import { DeviceTokenModel } from '../models/device.model';
import { hashToken } from '../../features/devices/tokens.service';
import { DEMO_DEVICES } from './demo-devices';
import { DEMO_REPORT_DAYS, seedDemoReceptions } from './demo-receptions';
import { ClubModel } from '../models/club.model';
import { MembershipModel } from '../models/membership.model';
import { StationBandModel } from '../models/station-band.model';
import { StationModel } from '../models/station.model';
import { UnitModel } from '../models/unit.model';
import { UserModel } from '../models/user.model';

/** The demo scenario: a fictional club and people. Q-prefixed callsigns are never issued to amateurs. */
export const DEMO_PASSWORD = 'faintline-demo';
export const DEMO_CLUB = 'Saltmarsh Beacon Circle';

const filter = (bands: BandId[], cutoffHz: number, type: 'butterworth' | 'chebyshev-0.5' = 'chebyshev-0.5', order = 5) => ({
  bands,
  type,
  order,
  cutoffHz,
});

type DemoSchedule = {
  name: string;
  steps: { bandId: BandId; slots: number; activeHoursUtc?: { fromHour: number; toHour: number } | null }[];
  nth: number;
  stepHz?: number;
  spanHz?: number;
};

type DemoStation = {
  name: string;
  callsign: string;
  locator: string;
  notes: string;
  unit?: string;
  audioOffsetHz?: number;
  transmitEnabled?: boolean;
  /** bands to enable, calibrated from this reference error in ppm (null = enabled but not calibrated) */
  bands?: { bandId: BandId; ppm: number | null }[];
  schedule?: DemoSchedule;
};
type DemoPerson = {
  email: string;
  displayName: string;
  callsign: string;
  role: 'admin' | 'member';
  units: UnitInput[];
  stations: DemoStation[];
};

const people: DemoPerson[] = [
  {
    email: 'admin@faintline.example',
    displayName: 'Hanne Stoll',
    callsign: 'Q3HST',
    role: 'admin',
    units: [
      {
        name: 'Clubhouse reference',
        serialLabel: 'SBC-01',
        controller: 'Wi-Fi microcontroller board',
        timeSource: 'gps',
        generatorKind: 'pll',
        referenceHz: 25e6,
        tolerancePpm: 0.5,
        tempCoPpmPerC: null,
        disciplined: true,
        generatorLevelDbm: 10,
        attenuatorDb: 0,
        amplifier: null,
        filters: [filter(['80m'], 4.2e6), filter(['40m'], 7.8e6), filter(['20m'], 15.6e6)],
        antenna: { kind: 'vertical', bands: ['80m', '40m', '20m'], gainDbi: 0 },
        notes: 'GPS-disciplined reference for the club.',
      },
    ],
    stations: [
      {
        name: 'Clubhouse reference',
        callsign: 'Q3HST',
        locator: 'JO32',
        notes: 'Roof-mounted vertical at the club hut.',
        unit: 'Clubhouse reference',
        audioOffsetHz: 1500,
        transmitEnabled: true,
        bands: [
          { bandId: '40m', ppm: 0.1 },
          { bandId: '20m', ppm: 0.1 },
        ],
        schedule: {
          name: 'Reference pair',
          steps: [
            { bandId: '40m', slots: 1 },
            { bandId: '20m', slots: 1 },
          ],
          nth: 5,
          stepHz: 2,
          spanHz: 8,
        },
      },
    ],
  },
  {
    email: 'operator@faintline.example',
    displayName: 'Ilse Marrow',
    callsign: 'Q1IMW',
    role: 'member',
    units: [
      {
        name: 'Loft board',
        serialLabel: 'IM-2',
        controller: 'Wi-Fi microcontroller board',
        timeSource: 'network',
        generatorKind: 'pll',
        referenceHz: 25e6,
        tolerancePpm: 10,
        tempCoPpmPerC: 0.4,
        disciplined: false,
        generatorLevelDbm: 10,
        attenuatorDb: 3,
        amplifier: null,
        filters: [filter(['40m'], 7.8e6), filter(['20m'], 15.6e6)],
        antenna: { kind: 'end-fed', bands: ['40m', '20m'], gainDbi: 0 },
        notes: 'Plug-in filters on a relay board.',
      },
    ],
    stations: [
      {
        name: 'Attic beacon',
        callsign: 'Q1IMW',
        locator: 'IO91WM',
        notes: 'End-fed wire under the roof tiles.',
        unit: 'Loft board',
        audioOffsetHz: 1520,
        transmitEnabled: true,
        bands: [
          { bandId: '40m', ppm: 4.2 },
          { bandId: '20m', ppm: 4.2 },
        ],
        schedule: {
          name: 'Day and night',
          steps: [
            { bandId: '20m', slots: 2, activeHoursUtc: { fromHour: 7, toHour: 19 } },
            { bandId: '40m', slots: 2, activeHoursUtc: { fromHour: 19, toHour: 7 } },
          ],
          nth: 5,
        },
      },
      { name: 'Garden mast', callsign: 'Q1IMW', locator: 'IO91', notes: '' },
    ],
  },
  {
    email: 'second@faintline.example',
    displayName: 'Tobin Reyle',
    callsign: 'Q2TRY',
    role: 'member',
    units: [
      {
        name: 'Shed kit',
        serialLabel: 'TR-A',
        controller: 'Wi-Fi microcontroller board',
        timeSource: 'network',
        generatorKind: 'pll',
        referenceHz: 27e6,
        tolerancePpm: 20,
        tempCoPpmPerC: 1.2,
        disciplined: false,
        generatorLevelDbm: 12,
        attenuatorDb: 0,
        amplifier: { gainDb: 12, saturatedDbm: 23, supplyV: 5, supplyA: 0.3 },
        filters: [filter(['30m'], 11.2e6), filter(['20m'], 15.6e6, 'butterworth', 3)],
        antenna: { kind: 'dipole', bands: ['30m', '20m'], gainDbi: 2.15 },
        notes: 'Small amplifier to about 200 mW.',
      },
    ],
    stations: [
      {
        name: 'Shed rig',
        callsign: 'Q2TRY',
        locator: 'JO22',
        notes: 'Dipole between the shed and the oak.',
        unit: 'Shed kit',
        audioOffsetHz: 1520,
        transmitEnabled: true,
        bands: [
          { bandId: '30m', ppm: -11.5 },
          { bandId: '20m', ppm: null },
        ],
        schedule: {
          name: 'Shed rotation',
          steps: [
            { bandId: '20m', slots: 2, activeHoursUtc: { fromHour: 7, toHour: 19 } },
            { bandId: '30m', slots: 2, activeHoursUtc: { fromHour: 19, toHour: 7 } },
          ],
          nth: 5,
        },
      },
      {
        name: 'Hilltop portable',
        callsign: 'Q2TRY/P',
        locator: 'JO22NB',
        notes: 'Weekend field station on batteries.',
        unit: 'Shed kit',
        audioOffsetHz: 1520,
        // 20 m enabled so its reports match it: it ran beside the shed rig on the demo's days (see demo-receptions.ts)
        bands: [{ bandId: '20m', ppm: null }],
      },
    ],
  },
];

async function addBands(stationId: number, audioOffsetHz: number, bands: DemoStation['bands'], transaction: Transaction) {
  for (const { bandId, ppm } of bands ?? []) {
    const found = bandFor(bandId, 'itu1');
    if (!found.ok) throw new Error(found.reason);
    const offset = ppm === null ? null : Number(predictedOffsetHz(found.band.dialHz + audioOffsetHz, ppm).toFixed(2));
    await StationBandModel.create(
      {
        stationId,
        bandId,
        enabled: true,
        calibrationOffsetHz: offset,
        calibrationSource: offset === null ? null : 'measured',
        // measured before the demo's reports begin, so calibration from reports counts them
        calibratedAt: offset === null ? null : new Date(Date.now() - 30 * 86_400_000),
      },
      { transaction },
    );
  }
}

export async function seedDemoIfEmpty(sequelize: Sequelize, bcryptCost: number): Promise<boolean> {
  if ((await UserModel.count()) > 0) return false;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, bcryptCost);
  await sequelize.transaction(async (transaction) => {
    const club = await ClubModel.create({ name: DEMO_CLUB }, { transaction });
    for (const person of people) {
      const user = await UserModel.create(
        { email: person.email, displayName: person.displayName, callsign: person.callsign, passwordHash },
        { transaction },
      );
      await MembershipModel.create({ clubId: club.id, userId: user.id, role: person.role }, { transaction });
      const unitIds = new Map<string, number>();
      for (const unit of person.units) {
        const { name, ...spec } = unitInput.parse(unit);
        const row = await UnitModel.create({ ownerId: user.id, name, spec: JSON.stringify(spec) }, { transaction });
        unitIds.set(name, row.id);
      }
      for (const s of person.stations) {
        const audioOffsetHz = s.audioOffsetHz ?? 1500;
        const row = await StationModel.create(
          {
            ownerId: user.id,
            name: s.name,
            callsign: s.callsign,
            locator: s.locator,
            notes: s.notes,
            unitId: s.unit ? unitIds.get(s.unit)! : null,
            region: 'itu1',
            audioOffsetHz,
            transmitEnabled: s.transmitEnabled ?? false,
            referenceErrorPpm: s.bands?.find((b) => b.ppm !== null)?.ppm ?? null,
          },
          { transaction },
        );
        await addBands(row.id, audioOffsetHz, s.bands, transaction);
        if (s.schedule) {
          const rules = scheduleInput.parse({
            name: s.schedule.name,
            steps: s.schedule.steps,
            cadence: { kind: 'every-nth', nth: s.schedule.nth },
            stagger: { stepHz: s.schedule.stepHz ?? 0, spanHz: s.schedule.spanHz ?? 0 },
            // started a few days ago, so the demo's reception reports fall inside the plan
            startDate: new Date(Date.now() - (DEMO_REPORT_DAYS + 1) * 86_400_000).toISOString().slice(0, 10),
          });
          await ScheduleModel.create({ stationId: row.id, spec: JSON.stringify(rules) }, { transaction });
        }
        const device = DEMO_DEVICES.find((d) => d.stationName === s.name);
        if (device) await DeviceTokenModel.create({ stationId: row.id, tokenHash: hashToken(device.token) }, { transaction });
      }
    }
  });
  await seedDemoReceptions(sequelize, Date.now());
  return true;
}

export const demoSignIns = people.map(({ email, role }) => ({ email, role, password: DEMO_PASSWORD }));
