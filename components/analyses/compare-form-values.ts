import { z } from 'zod';

import type { BandId } from '@/shared/domain/bands';
import { MAX_COMPARISON_DAYS } from '@/shared/schemas/comparison';

import { parseUtcInput, utcInputText } from '../receptions/period';
import type { ComparisonRequest } from './queries';

const DAY_MS = 86_400_000;
const utcText = (label: string) => z.string().refine((text) => parseUtcInput(text) !== null, `Write ${label} as YYYY-MM-DD HH:MM (UTC)`);
const chosen = (message: string) =>
  z
    .number({ message })
    .int(message)
    .positive(message)
    .nullable()
    .refine((v) => v !== null, message);

/** The Compare form: station ids from chips, band from chips, times typed as UTC text. */
export const compareFormSchema = z
  .object({
    mode: z.enum(['two-stations', 'two-periods']),
    a: chosen('Choose station A'),
    b: z.number().int().positive().nullable(),
    band: z
      .string()
      .nullable()
      .refine((v) => v !== null, 'Choose a band'),
    from: utcText('the start'),
    to: utcText('the end'),
    aFrom: utcText('the start'),
    aTo: utcText('the end'),
    bFrom: utcText('the start'),
    bTo: utcText('the end'),
  })
  .superRefine((v, ctx) => {
    const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (v.mode === 'two-stations') {
      if (v.b === null) issue('b', 'Choose station B');
      else if (v.b === v.a) issue('b', 'Choose two different stations, or compare one station in two periods');
    }
    const spans =
      v.mode === 'two-stations'
        ? [['from', 'to'] as const]
        : ([
            ['aFrom', 'aTo'],
            ['bFrom', 'bTo'],
          ] as const);
    for (const [fromField, toField] of spans) {
      const fromMs = parseUtcInput(v[fromField]);
      const toMs = parseUtcInput(v[toField]);
      if (fromMs === null || toMs === null) continue;
      if (toMs <= fromMs) issue(fromField, 'Choose a start before the end');
      else if (toMs - fromMs > MAX_COMPARISON_DAYS * DAY_MS) issue(fromField, `Choose a period of at most ${MAX_COMPARISON_DAYS} days`);
    }
  });
export type CompareFormValues = z.input<typeof compareFormSchema>;

/** Sensible starting values: the last 7 days; for two periods, the 7 days before against the last 7. */
export function compareDefaults(nowMs: number, a: number | null): CompareFormValues {
  const endMs = Math.ceil(nowMs / 3_600_000) * 3_600_000;
  const text = (ms: number) => utcInputText(ms);
  return {
    mode: 'two-stations',
    a,
    b: null,
    band: null,
    from: text(endMs - 7 * DAY_MS),
    to: text(endMs),
    aFrom: text(endMs - 14 * DAY_MS),
    aTo: text(endMs - 7 * DAY_MS),
    bFrom: text(endMs - 7 * DAY_MS),
    bTo: text(endMs),
  };
}

const iso = (text: string) => new Date(parseUtcInput(text)!).toISOString();

/** The request for checked values. */
export function requestOf(v: CompareFormValues): ComparisonRequest {
  const band = v.band as BandId;
  if (v.mode === 'two-stations') return { mode: v.mode, a: v.a!, b: v.b!, band, from: iso(v.from), to: iso(v.to) };
  return { mode: v.mode, a: v.a!, b: v.a!, band, aFrom: iso(v.aFrom), aTo: iso(v.aTo), bFrom: iso(v.bFrom), bTo: iso(v.bTo) };
}
