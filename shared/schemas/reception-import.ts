/** File imports of reception reports: the mapping a user confirms, saved mappings, and one mapped row's check. */
import type { ImportMapping } from '../api/receptions';
import { columnOfField, type MappedReport, type RowProblem } from '../domain/reception/import-mapping';
import { locatorField } from './fields';
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

/** Checks a mapped row with the shared schema; a problem names the file's column. */
export function checkMappedReport(
  report: MappedReport,
  mapping: ImportMapping,
): { ok: true; report: ImportedReport } | { ok: false; problem: RowProblem } {
  const parsed = importedReportInput.safeParse(report);
  if (parsed.success) return { ok: true, report: parsed.data };
  const issue = parsed.error.issues[0];
  return { ok: false, problem: { column: columnOfField(mapping, String(issue.path[0] ?? '')), reason: issue.message } };
}
