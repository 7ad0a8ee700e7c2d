import { LICENCE_REGIONS, type BandId, type LicenceRegion } from '../domain/bands';
import { validateCallsign } from '../domain/wspr/callsign';
import { WINDOW_HIGH_OFFSET_HZ, WINDOW_LOW_OFFSET_HZ } from '../domain/tones';
import { callsignField, locatorField, nameText, noteText, utcTimestampField } from './fields';
import { bandIdField } from './unit';
import { z } from './zod-setup';

export const regionLabels: Record<LicenceRegion, string> = {
  itu1: 'ITU Region 1 (Europe, Africa, Middle East)',
  itu2: 'ITU Region 2 (the Americas)',
  itu3: 'ITU Region 3 (Asia-Pacific)',
};

/** A callsign WSPR can carry: the shared format check, then the encoder's own rules. */
const encodableCallsign = callsignField.superRefine((value, ctx) => {
  const info = validateCallsign(value);
  if (!info.ok) ctx.addIssue({ code: 'custom', message: info.reason });
});

export const audioOffsetField = z
  .number()
  .min(WINDOW_LOW_OFFSET_HZ, `The audio offset must be ${WINDOW_LOW_OFFSET_HZ}–${WINDOW_HIGH_OFFSET_HZ} Hz`)
  .max(WINDOW_HIGH_OFFSET_HZ, `The audio offset must be ${WINDOW_LOW_OFFSET_HZ}–${WINDOW_HIGH_OFFSET_HZ} Hz`);

export const stationInput = z.object({
  name: nameText(80).min(1, 'Give the station a name'),
  callsign: encodableCallsign,
  locator: locatorField,
  notes: noteText(2000).optional().default(''),
  unitId: z.number().int().positive().nullable().optional().default(null),
  region: z
    .enum(LICENCE_REGIONS as [LicenceRegion, ...LicenceRegion[]])
    .optional()
    .default('itu1'),
  audioOffsetHz: audioOffsetField.optional().default(1500),
  transmitEnabled: z.boolean().optional().default(false),
});
export type StationInput = z.input<typeof stationInput>;

export const stationPatch = z
  .object({
    name: stationInput.shape.name,
    callsign: encodableCallsign,
    locator: locatorField,
    notes: noteText(2000),
    unitId: z.number().int().positive().nullable(),
    region: z.enum(LICENCE_REGIONS as [LicenceRegion, ...LicenceRegion[]]),
    audioOffsetHz: audioOffsetField,
    transmitEnabled: z.boolean(),
  })
  .partial();
export type StationPatch = z.input<typeof stationPatch>;

export type StationBand = {
  bandId: BandId;
  enabled: boolean;
  /** measured or typed error of the generator on this band, Hz (positive = radiates high); null = not calibrated */
  calibrationOffsetHz: number | null;
  calibrationSource: 'typed' | 'measured' | 'reports' | null;
  calibratedAt: string | null;
};

export type Station = {
  id: number;
  ownerId: number;
  ownerName: string;
  name: string;
  callsign: string;
  locator: string;
  notes: string;
  unitId: number | null;
  region: LicenceRegion;
  audioOffsetHz: number;
  transmitEnabled: boolean;
  /** the last guided measurement's reference error, ppm */
  referenceErrorPpm: number | null;
  bands: StationBand[];
  /** set while a club admin has stopped the station */
  /** who stopped the station and why; kept after the owner leaves the club, so that club's admins can still lift it */
  suspension: { at: string; reason: string; clubId: number | null; clubName: string | null; byName: string | null } | null;
  createdAt: string;
  updatedAt: string;
};

/** PUT /api/stations/:id/bands/:bandId */
export const stationBandInput = z.object({
  enabled: z.boolean(),
  calibrationOffsetHz: z
    .number()
    .min(-5000, 'A correction beyond ±5000 Hz means the reference is wrong: check the unit’s crystal')
    .max(5000, 'A correction beyond ±5000 Hz means the reference is wrong: check the unit’s crystal')
    .nullable()
    .optional(),
});
export type StationBandInput = z.input<typeof stationBandInput>;

/** POST /api/stations/:id/calibration: typed offsets, a guided measurement's accepted proposals, or the proposals from reports. */
export const calibrationInput = z.object({
  source: z.enum(['typed', 'measured', 'reports']),
  referenceErrorPpm: z.number().min(-1000).max(1000).nullable().optional(),
  offsets: z
    .array(z.object({ bandId: bandIdField, calibrationOffsetHz: stationBandInput.shape.calibrationOffsetHz.unwrap().unwrap() }))
    .min(1, 'Give at least one band’s offset')
    .max(15),
});
export type CalibrationInput = z.input<typeof calibrationInput>;

/** A guided measurement: "I commanded X on band B and my receiver heard Y". */
export const measurementInput = z.object({
  bandId: bandIdField,
  commandedHz: z.number().positive('Give the frequency you commanded, in Hz'),
  observedHz: z.number().positive('Give the frequency your receiver heard, in Hz'),
});
export type MeasurementInput = z.infer<typeof measurementInput>;

/** GET /api/stations/:id/calibration/from-reports?from=&to= (ISO UTC; the last 7 days unless told). */
export const calibrationFromReportsQuery = z.object({ from: utcTimestampField('from').optional(), to: utcTimestampField('to').optional() });

/** GET /api/stations/:id/stability?band=&from=&to= (the station's first enabled band and the last 7 days unless told). */
export const stabilityQuery = calibrationFromReportsQuery.extend({ band: bandIdField.optional() });
