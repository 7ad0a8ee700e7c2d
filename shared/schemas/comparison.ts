/** Not re-exported from the index: only the server and the lazily loaded Compare form use it. */
import { reportTimeField } from './reception';
import { bandIdField } from './unit';
import { z } from './zod-setup';

/** The longest span one side of a comparison may cover: a comparison reads each report, not the aggregates. */
export const MAX_COMPARISON_DAYS = 92;
const DAY_MS = 86_400_000;

const stationRef = (side: 'A' | 'B') =>
  z.coerce
    .number({ message: `Choose station ${side}` })
    .int(`Choose station ${side}`)
    .positive(`Choose station ${side}`);

type TimeField = 'from' | 'to' | 'aFrom' | 'aTo' | 'bFrom' | 'bTo';

/**
 * GET /api/comparisons: two stations in one period (a ≠ b, from/to), or one station (or two) in two periods
 * (aFrom/aTo and bFrom/bTo, all four). Times are ISO UTC; a missing from/to means the last 7 days.
 */
export const comparisonQuery = z
  .object({
    a: stationRef('A'),
    b: stationRef('B'),
    band: bandIdField,
    from: reportTimeField('from').optional(),
    to: reportTimeField('to').optional(),
    aFrom: reportTimeField('aFrom').optional(),
    aTo: reportTimeField('aTo').optional(),
    bFrom: reportTimeField('bFrom').optional(),
    bTo: reportTimeField('bTo').optional(),
  })
  .superRefine((q, ctx) => {
    const issue = (path: TimeField | 'b', message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    const twoPeriods = q.aFrom !== undefined || q.aTo !== undefined || q.bFrom !== undefined || q.bTo !== undefined;
    if (twoPeriods) {
      for (const field of ['aFrom', 'aTo', 'bFrom', 'bTo'] as const) {
        if (q[field] === undefined) issue(field, 'Give both periods in full (start and end of each)');
      }
    } else if (q.a === q.b) {
      issue('b', 'Choose two different stations, or compare one station in two periods');
    }
    const spans: [TimeField, TimeField][] = twoPeriods
      ? [
          ['aFrom', 'aTo'],
          ['bFrom', 'bTo'],
        ]
      : [['from', 'to']];
    for (const [fromField, toField] of spans) {
      const fromText = q[fromField];
      const toText = q[toField];
      if (fromText === undefined || toText === undefined) continue;
      const spanMs = Date.parse(toText) - Date.parse(fromText);
      if (!(spanMs > 0)) issue(fromField, 'Choose a start before the end');
      else if (spanMs > MAX_COMPARISON_DAYS * DAY_MS) issue(fromField, `Choose a period of at most ${MAX_COMPARISON_DAYS} days`);
    }
  });
export type ComparisonQuery = z.output<typeof comparisonQuery>;

/** GET /api/clubs/:clubId/reach: the last 7 days unless told otherwise. */
export const clubReachQuery = z.object({
  from: reportTimeField('from').optional(),
  to: reportTimeField('to').optional(),
});
export type ClubReachQuery = z.output<typeof clubReachQuery>;
