/**
 * Band rotation schedules: per station an ordered rotation of steps, a cadence,
 * a frequency stagger, and the UTC days it runs. The domain reads the parsed
 * value as ScheduleRules (shared/domain/schedule/model.ts).
 */
import { dayNumber } from '../domain/schedule/dates';
import {
  MAX_NTH,
  MAX_STAGGER_SPAN_HZ,
  MAX_STAGGER_STEP_HZ,
  MAX_STEP_SLOTS,
  MAX_STEPS,
  MIN_NTH,
  MIN_STEP_SLOTS,
  type ScheduleRules,
} from '../domain/schedule/model';
import { nameText, utcTimestampField } from './fields';
import { bandIdField } from './unit';
import { z } from './zod-setup';

const hour = (label: string, max: number) =>
  z
    .number({ message: `Give the ${label} hour as a number from 0 to ${max}` })
    .int(`The ${label} hour is a whole hour (0 to ${max})`)
    .min(0, `The ${label} hour is at least 0`)
    .max(max, `The ${label} hour is at most ${max}`);

export const activeHoursField = z
  .object({ fromHour: hour('starting', 23), toHour: hour('ending', 24) })
  .refine((h) => h.fromHour !== h.toHour, {
    message: 'The starting and ending hours are the same, so the step would never run: to run all day, clear the hours',
    path: ['toHour'],
  });

export const rotationStepField = z.object({
  bandId: bandIdField,
  slots: z
    .number({ message: 'Give how many slots in a row this band holds' })
    .int('Slots are counted whole')
    .min(MIN_STEP_SLOTS, `A step holds at least ${MIN_STEP_SLOTS} slot`)
    .max(MAX_STEP_SLOTS, `A step holds at most ${MAX_STEP_SLOTS} slots in a row (one hour): add another step for more`),
  activeHoursUtc: activeHoursField.nullable().default(null),
});

export const cadenceField = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('every-slot') }),
    z.object({
      kind: z.literal('every-nth'),
      nth: z
        .number({ message: 'Give n for “every nth slot”' })
        .int('n is a whole number')
        .min(MIN_NTH, `n is at least ${MIN_NTH} (use “every slot” for 1)`)
        .max(MAX_NTH, `n is at most ${MAX_NTH}`),
    }),
    z.object({
      kind: z.literal('duty'),
      dutyPercent: z
        .number({ message: 'Give the share of slots to use, in percent' })
        .int('Give the share as a whole percent')
        .min(1, 'Use at least 1 % of the slots')
        .max(100, 'A share cannot exceed 100 %'),
    }),
  ],
  { message: 'Choose how often to transmit: every slot, every nth slot, or a share of the slots' },
);

export const staggerField = z.object({
  stepHz: z
    .number()
    .min(0, 'The stagger step cannot be negative')
    .max(MAX_STAGGER_STEP_HZ, `Move the offset by at most ${MAX_STAGGER_STEP_HZ} Hz per transmission`),
  spanHz: z
    .number()
    .min(0, 'The stagger span cannot be negative')
    .max(MAX_STAGGER_SPAN_HZ, `Keep the stagger within ${MAX_STAGGER_SPAN_HZ} Hz: the whole window is only 200 Hz`),
});

const dateField = (label: string) =>
  z
    .string()
    .trim()
    .refine((v) => dayNumber(v) !== null, `Give the ${label} date as YYYY-MM-DD, a real calendar day (UTC)`)
    .refine(
      (v) => dayNumber(v) === null || (v >= '2000-01-01' && v < '2100-01-01'),
      `Give the ${label} date between the years 2000 and 2099`,
    );

const fields = {
  name: nameText(80).min(1, 'Give the schedule a name'),
  steps: z
    .array(rotationStepField)
    .min(1, 'Add at least one band to the rotation')
    .max(MAX_STEPS, `A rotation has at most ${MAX_STEPS} steps`),
  cadence: cadenceField,
  stagger: staggerField,
  startDate: dateField('start'),
  endDate: dateField('end').nullable(),
  paused: z.boolean(),
};

const endNotBeforeStart = (value: { startDate?: string; endDate?: string | null }, ctx: z.RefinementCtx) => {
  if (!value.startDate || !value.endDate) return;
  const start = dayNumber(value.startDate);
  const end = dayNumber(value.endDate);
  if (start !== null && end !== null && end < start) {
    ctx.addIssue({
      code: 'custom',
      path: ['endDate'],
      message: `The end date ${value.endDate} is before the start date ${value.startDate}: move it later, or clear it`,
    });
  }
};

export const scheduleInput = z
  .object({
    ...fields,
    name: fields.name.default('Band rotation'),
    stagger: fields.stagger.default({ stepHz: 0, spanHz: 0 }),
    endDate: fields.endDate.default(null),
    paused: fields.paused.default(false),
  })
  .superRefine(endNotBeforeStart);
export type ScheduleInput = z.input<typeof scheduleInput>;
export type ScheduleValues = z.output<typeof scheduleInput>;

/**
 * A partial update: only the fields sent are checked and returned (no defaults are
 * filled in). The end-before-start rule needs the stored schedule: use applySchedulePatch.
 */
export const schedulePatch = z
  .strictObject(
    {
      name: fields.name.optional(),
      steps: fields.steps.optional(),
      cadence: fields.cadence.optional(),
      stagger: fields.stagger.optional(),
      startDate: fields.startDate.optional(),
      endDate: fields.endDate.optional(),
      paused: fields.paused.optional(),
    },
    {
      error: (issue) =>
        issue.code === 'unrecognized_keys'
          ? `Only name, steps, cadence, stagger, startDate, endDate and paused can be changed; remove ${issue.keys.join(', ')}`
          : undefined,
    },
  )
  .transform((patch) => Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) as Partial<ScheduleValues>)
  .superRefine(endNotBeforeStart);
export type SchedulePatch = z.input<typeof schedulePatch>;

export type Schedule = ScheduleValues & {
  id: number;
  stationId: number;
  createdAt: string;
  updatedAt: string;
};

/** The stored schedule with a parsed patch applied, checked again as a whole. */
export function applySchedulePatch(schedule: Schedule, patch: Partial<ScheduleValues>) {
  const { id, stationId, createdAt, updatedAt, ...values } = schedule;
  const merged = scheduleInput.safeParse({ ...values, ...patch });
  if (!merged.success) return merged;
  return { success: true as const, data: { ...merged.data, id, stationId, createdAt, updatedAt } satisfies Schedule };
}

// compile-time check: a stored schedule is what the domain plans from
const _asRules = (s: Schedule): ScheduleRules => s;
void _asRules;

/** GET …/plan?from=&to=: both optional ISO 8601 UTC times (the server fills in now and a day later). */
export const planQueryInput = z.object({
  from: utcTimestampField('from').optional(),
  to: utcTimestampField('to').optional(),
});
