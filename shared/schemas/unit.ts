import { BAND_IDS, type BandId } from '../domain/bands';
import { labelText, nameText, noteText } from './fields';
import { FILTER_SELECTIONS } from '../domain/workshop/filter-selection';
import { z } from './zod-setup';

export const TIME_SOURCES = ['network', 'gps', 'rtc'] as const;
export const GENERATOR_KINDS = ['pll', 'dds', 'other'] as const;
export const FILTER_TYPES = ['butterworth', 'chebyshev-0.1', 'chebyshev-0.5', 'elliptic', 'other'] as const;
export const ANTENNA_KINDS = ['dipole', 'end-fed', 'vertical', 'loop', 'dummy-load', 'other'] as const;

export const timeSourceLabels: Record<(typeof TIME_SOURCES)[number], string> = {
  network: 'Network time',
  gps: 'GPS receiver',
  rtc: 'Real-time clock',
};
export const generatorKindLabels: Record<(typeof GENERATOR_KINDS)[number], string> = {
  pll: 'Fractional-N PLL',
  dds: 'DDS',
  other: 'Other',
};

export const bandIdField = z.enum(BAND_IDS as [BandId, ...BandId[]], { message: `Use one of ${BAND_IDS.join(', ')}` });

const text = noteText;

export const lowPassFilterInput = z.object({
  bands: z.array(bandIdField).min(1, 'Name at least one band this filter serves').max(4),
  type: z.enum(FILTER_TYPES),
  order: z.number().int('The order is a whole number').min(1, 'The order is at least 1').max(11, 'The order is at most 11'),
  cutoffHz: z.number().positive('The cut-off must be above 0 Hz').max(500e6, 'The cut-off must be below 500 MHz'),
  /** switched filters: the control line or code the controller sets to put this filter in circuit */
  controlCode: z
    .string()
    .trim()
    .max(40, 'Use at most 40 characters for the control code')
    .regex(/^[\w .:#/+-]*$/, 'Use letters, digits and . : # / + - for the control code')
    .default(''),
});
export type LowPassFilterInput = z.infer<typeof lowPassFilterInput>;

export const amplifierInput = z.object({
  gainDb: z.number().min(0, 'Gain cannot be negative').max(60, 'Gain above 60 dB is not a beacon amplifier'),
  saturatedDbm: z.number().min(-10).max(50, 'Saturated output above 50 dBm (100 W) is beyond a beacon'),
  supplyV: z.number().min(0).max(60, 'Supply above 60 V is not supported'),
  supplyA: z.number().min(0).max(20),
});

export const antennaInput = z.object({
  kind: z.enum(ANTENNA_KINDS),
  bands: z.array(bandIdField).max(15),
  gainDbi: z.number().min(-30, 'Gain below −30 dBi is not plausible').max(20, 'Gain above 20 dBi is not plausible'),
});

export const unitInput = z.object({
  name: nameText(80).min(1, 'Give the unit a name'),
  serialLabel: labelText(60).default(''),
  controller: labelText(80).default(''),
  timeSource: z.enum(TIME_SOURCES),
  generatorKind: z.enum(GENERATOR_KINDS),
  referenceHz: z.number().min(1e6, 'The reference is at least 1 MHz').max(200e6, 'The reference is at most 200 MHz'),
  tolerancePpm: z
    .number()
    .min(0, 'A tolerance cannot be negative: give its size, e.g. 10 for ±10 ppm')
    .max(1000, 'A tolerance above 1000 ppm is not a crystal'),
  tempCoPpmPerC: z.number().min(0, 'Give the coefficient’s size (no sign)').max(50).nullable().default(null),
  disciplined: z.boolean().default(false),
  generatorLevelDbm: z.number().min(-40, 'Below −40 dBm is not a generator output').max(30, 'Above 30 dBm is not a generator output'),
  attenuatorDb: z.number().min(0, 'Attenuation cannot be negative').max(80).default(0),
  amplifier: amplifierInput.nullable().default(null),
  filters: z.array(lowPassFilterInput).max(12, 'At most 12 filters').default([]),
  /** how the filters are put in circuit: one fixed, swapped by hand, or switched by the controller */
  filterSelection: z.enum(FILTER_SELECTIONS, { message: 'Choose fixed, hand or switched' }).default('switched'),
  antenna: antennaInput.default({ kind: 'dipole', bands: [], gainDbi: 2.15 }),
  /** duty cycle of the generator's square-wave output, for the harmonic estimate */
  dutyCycle: z.number().min(0.05).max(0.95).default(0.5),
  notes: text(2000).default(''),
});
export type UnitInput = z.input<typeof unitInput>;
export type UnitValues = z.output<typeof unitInput>;

/** A partial update: only the fields sent are kept (defaults are not filled in). */
export const unitPatch = z.record(z.string(), z.unknown()).transform((body, ctx) => {
  const parsed = unitInput.partial().safeParse(body);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) ctx.addIssue({ ...issue, code: 'custom', message: issue.message, path: issue.path });
    return z.NEVER;
  }
  const sent = Object.keys(body);
  return Object.fromEntries(Object.entries(parsed.data).filter(([key]) => sent.includes(key))) as Partial<UnitValues>;
});

export type UnitPhoto = { id: number; url: string; thumbUrl: string; contentType: string; bytes: number; createdAt: string };

/** "I fitted this filter": recorded for a unit whose filters are swapped by hand. */
export const fittedFilterInput = z.object({
  filterIndex: z
    .number({ message: 'Choose the filter you fitted' })
    .int('Choose one of the unit’s filters')
    .min(0, 'Choose one of the unit’s filters'),
});
export type FittedFilterInput = z.infer<typeof fittedFilterInput>;

export type Unit = UnitValues & {
  id: number;
  /** hand-swapped filters: the one fitted now and when it was recorded (UTC) */
  fittedFilter: { index: number; atUtc: string } | null;
  ownerId: number;
  ownerName: string;
  photos: UnitPhoto[];
  createdAt: string;
  updatedAt: string;
};

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
