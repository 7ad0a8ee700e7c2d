import { callsignField, locatorField } from './fields';
import { bandIdField } from './unit';
import { z } from './zod-setup';

/** Plausible UTC times for reports: 2000 up to (not including) 2100. */
const EARLIEST_MS = Date.UTC(2000, 0, 1);
const LATEST_MS = Date.UTC(2100, 0, 1);

export const reportTimeField = (label: string) =>
  z.iso.datetime({ offset: true, message: `Give ${label} as an ISO 8601 UTC time, e.g. 2026-12-02T10:04:00Z` }).refine((value) => {
    const ms = Date.parse(value);
    return Number.isFinite(ms) && ms >= EARLIEST_MS && ms < LATEST_MS;
  }, `${label} must fall between the years 2000 and 2099`);

/** A callsign as decoded: a receiver may also report an unresolved hashed callsign as "<...>". */
const decodedCallsign = z
  .string()
  .trim()
  .toUpperCase()
  .min(1, 'Give the callsign')
  .max(12, 'A callsign has at most 12 characters')
  .regex(/^(<\.\.\.>|[A-Z0-9/]+)$/, 'Use only letters, digits and "/" (or <...> for a callsign the decoder could not resolve)');

/** What a listening post (or a file row, once mapped) says about one decode. */
export const receptionReportInput = z.object({
  slotUtc: reportTimeField('slotUtc'),
  bandId: bandIdField,
  txCallsign: decodedCallsign,
  txLocator: locatorField.nullable().optional().default(null),
  txPowerDbm: z
    .number()
    .int('txPowerDbm is whole dBm')
    .min(0, 'txPowerDbm is 0–60 dBm')
    .max(60, 'txPowerDbm is 0–60 dBm')
    .nullable()
    .optional()
    .default(null),
  snrDb: z.number().min(-60, 'snrDb is −60 to +60 dB').max(60, 'snrDb is −60 to +60 dB'),
  frequencyHz: z.number().positive('frequencyHz must be above 0').max(500_000_000, 'frequencyHz is in Hz (at most 500 MHz)'),
  driftHz: z
    .number()
    .int('driftHz is whole Hz')
    .min(-100, 'driftHz is −100 to +100 Hz')
    .max(100, 'driftHz is −100 to +100 Hz')
    .optional()
    .default(0),
});
export type ReceptionReportInput = z.input<typeof receptionReportInput>;
export type ReceptionReportValues = z.output<typeof receptionReportInput>;

/** POST /api/device/v1/receptions: the receiver's identity comes from its token. Items are checked one by one. */
export const receptionBatchInput = z.object({
  reports: z.array(z.unknown()).min(1, 'Send at least one report').max(500, 'Send at most 500 reports at a time'),
});

export const listeningPostInput = z.object({
  name: z.string().trim().min(1, 'Give the listening post a name').max(80, 'Use at most 80 characters'),
  callsign: callsignField,
  locator: locatorField,
});
export type ListeningPostInput = z.input<typeof listeningPostInput>;

const optionalTime = (label: string) => reportTimeField(label).optional();

/** ?from=&to=&band= for the reading routes (times ISO UTC; defaults chosen by the route). */
export const receptionQuery = z.object({
  from: optionalTime('from'),
  to: optionalTime('to'),
  band: bandIdField.optional(),
  page: z.coerce.number().int().min(1).max(100_000).optional().default(1),
  pageSize: z.coerce.number().int().min(1).max(500).optional().default(50),
  sort: z.enum(['time', 'distance', 'snr', 'band', 'receiver']).optional().default('time'),
  order: z.enum(['asc', 'desc']).optional().default('desc'),
  format: z.enum(['json', 'csv']).optional().default('json'),
});
export type ReceptionQuery = z.output<typeof receptionQuery>;
