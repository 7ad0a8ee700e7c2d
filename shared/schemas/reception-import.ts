/** File imports of reception reports: the mapping a user confirms, saved mappings, and one mapped row's check. */
import type { ImportMapping } from '../api/receptions';
import { columnOfField, type MappedReport, type RowProblem } from '../domain/reception/import-mapping';
import { isBandId } from '../domain/bands';
import { LOCATOR_PATTERN, locatorField } from './fields';
import { receptionReportInput } from './reception';
import { z } from './zod-setup';

export const IMPORT_MAX_BYTES = 200 * 1024 * 1024;
/** How much of a file the proposal and preview read. */
export const IMPORT_PREVIEW_BYTES = 64 * 1024;

const ROLES = [
  'ignore',
  'time',
  'band',
  'frequency',
  'txCallsign',
  'txLocator',
  'txPowerDbm',
  'rxCallsign',
  'rxLocator',
  'snrDb',
  'driftHz',
] as const;

export const importMappingSchema = z
  .object({
    delimiter: z.enum([',', '\t', ';'], { message: 'The delimiter is a comma, a tab or a semicolon' }),
    hasHeader: z.boolean(),
    columns: z
      .array(
        z.object({
          index: z.number().int().min(0).max(199),
          header: z.string().trim().max(120, 'A column name has at most 120 characters'),
          role: z.enum(ROLES, { message: `A column's role is one of ${ROLES.join(', ')}` }),
        }),
      )
      .min(1, 'Map at least one column')
      .max(200, 'A file may have at most 200 columns'),
    timeFormat: z.enum(['iso', 'date-time', 'epoch-seconds'], { message: 'The time format is iso, date-time or epoch-seconds' }),
    frequencyUnit: z.enum(['hz', 'khz', 'mhz'], { message: 'The frequency unit is hz, khz or mhz' }),
  })
  .superRefine((mapping, ctx) => {
    const seen = new Set<string>();
    const indexes = new Set<number>();
    for (const [i, column] of mapping.columns.entries()) {
      if (indexes.has(column.index))
        ctx.addIssue({ code: 'custom', path: ['columns', i, 'index'], message: `Column ${column.index + 1} is mapped twice` });
      indexes.add(column.index);
      if (column.role === 'ignore') continue;
      if (seen.has(column.role))
        ctx.addIssue({ code: 'custom', path: ['columns', i, 'role'], message: `Only one column can be read as ${column.role}` });
      seen.add(column.role);
    }
  }) satisfies z.ZodType<ImportMapping>;

export const savedMappingInput = z.object({
  name: z.string().trim().min(1, 'Give the mapping a name').max(80, 'Use at most 80 characters'),
  mapping: importMappingSchema,
});
export type SavedMappingInput = z.input<typeof savedMappingInput>;

const receiverCallsign = z
  .string()
  .trim()
  .toUpperCase()
  .min(1, "Give the receiver's callsign")
  .max(12, 'A callsign has at most 12 characters')
  .regex(/^[A-Z0-9/]+$/, 'Use only letters, digits and "/"');

/** One report read from a file: what a listening post sends, plus the receiver that heard it. */
export const importedReportInput = receptionReportInput.extend({ rxCallsign: receiverCallsign, rxLocator: locatorField });
export type ImportedReport = z.output<typeof importedReportInput>;

const EARLIEST_MS = Date.UTC(2000, 0, 1);
const LATEST_MS = Date.UTC(2100, 0, 1);
const DECODED_CALL = /^(<\.\.\.>|[A-Z0-9/]{1,12})$/;
const RECEIVER_CALL = /^[A-Z0-9/]{1,12}$/;
const ISO_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;
const whole = (n: number, low: number, high: number) => Number.isInteger(n) && n >= low && n <= high;

/**
 * The common case of `importedReportInput` without zod's per-field machinery (a large import checks millions of
 * rows): a report that passes every rule comes back as the schema would give it; anything else is null and goes
 * through the schema for its message. A property test holds the two to the same answers.
 */
export function quickImportedReport(r: MappedReport): ImportedReport | null {
  if (!ISO_UTC.test(r.slotUtc)) return null;
  const ms = Date.parse(r.slotUtc);
  if (!(ms >= EARLIEST_MS && ms < LATEST_MS)) return null;
  const txCallsign = r.txCallsign.trim().toUpperCase();
  const rxCallsign = r.rxCallsign.trim().toUpperCase();
  const rxLocator = r.rxLocator.trim().toUpperCase();
  const txLocator = r.txLocator === null ? null : r.txLocator.trim().toUpperCase();
  if (!isBandId(r.bandId) || !DECODED_CALL.test(txCallsign) || !RECEIVER_CALL.test(rxCallsign) || !LOCATOR_PATTERN.test(rxLocator))
    return null;
  if (txLocator !== null && !LOCATOR_PATTERN.test(txLocator)) return null;
  if (r.txPowerDbm !== null && !whole(r.txPowerDbm, 0, 60)) return null;
  if (!(r.snrDb >= -60 && r.snrDb <= 60) || !(r.frequencyHz > 0 && r.frequencyHz <= 500_000_000) || !whole(r.driftHz, -100, 100))
    return null;
  return {
    slotUtc: r.slotUtc,
    bandId: r.bandId,
    txCallsign,
    txLocator,
    txPowerDbm: r.txPowerDbm,
    snrDb: r.snrDb,
    frequencyHz: r.frequencyHz,
    driftHz: r.driftHz,
    rxCallsign,
    rxLocator,
  };
}

/** Checks a mapped row with the shared schema; a problem names the file's column. */
export function checkMappedReport(
  report: MappedReport,
  mapping: ImportMapping,
): { ok: true; report: ImportedReport } | { ok: false; problem: RowProblem } {
  const quick = quickImportedReport(report);
  if (quick) return { ok: true, report: quick };
  const parsed = importedReportInput.safeParse(report);
  if (parsed.success) return { ok: true, report: parsed.data };
  const issue = parsed.error.issues[0];
  return { ok: false, problem: { column: columnOfField(mapping, String(issue.path[0] ?? '')), reason: issue.message } };
}
