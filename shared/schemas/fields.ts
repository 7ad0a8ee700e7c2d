import { z } from './zod-setup';

const isControl = (code: number) => code <= 0x1f || (code >= 0x7f && code <= 0x9f);
const isLineBreakOrTab = (code: number) => code === 0x09 || code === 0x0a || code === 0x0d;
/** Embeddings, overrides and isolates (U+202A–U+202E, U+2066–U+2069): they can make a name read as another. */
const isBidiControl = (code: number) => (code >= 0x202a && code <= 0x202e) || (code >= 0x2066 && code <= 0x2069);

const noneOf = (test: (code: number) => boolean) => (value: string) => {
  for (let i = 0; i < value.length; i += 1) if (test(value.charCodeAt(i))) return false;
  return true;
};

export const CONTROL_MESSAGE = 'Remove control characters (such as NUL or escape): they cannot be shown to others';
export const BIDI_MESSAGE = 'Remove text-direction override characters (U+202A–U+202E, U+2066–U+2069): they can disguise a name';

/** Maidenhead locator, 4 or 6 characters: field letters A–R, square digits, subsquare letters a–x. */
export const LOCATOR_PATTERN = /^[A-R]{2}[0-9]{2}([A-X]{2})?$/;

export const callsignField = z
  .string()
  .refine(noneOf(isControl), CONTROL_MESSAGE)
  .trim()
  .toUpperCase()
  .min(3, 'A callsign has at least 3 characters')
  .max(10, 'A callsign has at most 10 characters (with any prefix or suffix)')
  .regex(/^[A-Z0-9/]+$/, 'Use only letters, digits and one "/"')
  .refine((value) => /[0-9]/.test(value), 'A callsign needs a digit')
  .refine((value) => (value.match(/\//g) ?? []).length <= 1, 'Only one "/" add-on is possible');

export const locatorField = z
  .string()
  .trim()
  // Field letters upper case, subsquare letters compared in upper case too.
  .transform((value) => value.toUpperCase())
  .pipe(
    z
      .string()
      .regex(
        LOCATOR_PATTERN,
        'Use a 4- or 6-character Maidenhead locator such as JO22 or JO22ab (field letters A–R, subsquare letters A–X)',
      ),
  );

export const emailField = z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(190);

export const passwordField = z.string().min(10, 'Use at least 10 characters').max(200, 'Use at most 200 characters');

export const idParam = z.coerce.number().int().positive();

/** The instants a client may send: 2000-01-01T00:00:00Z up to (not including) 2100-01-01T00:00:00Z. */
export const EARLIEST_UTC_MS = 946_684_800_000;
export const LATEST_UTC_MS = 4_102_444_800_000;

const ISO_PARTS = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})/;

/** Whether an ISO 8601 text names a real calendar time (no 30 February, no hour 25) that Date reads back. */
function survivesDate(value: string): boolean {
  const m = ISO_PARTS.exec(value);
  if (!m) return false;
  const [y, mo, d, h, mi] = m.slice(1).map(Number);
  const local = new Date(Date.UTC(2000, mo - 1, d, h, mi));
  // Year 2000 is a leap year, so only the month/day/hour/minute fields are checked here; the year by the range below.
  if (local.getUTCMonth() !== mo - 1 || local.getUTCDate() !== d || local.getUTCHours() !== h || local.getUTCMinutes() !== mi) return false;
  if (mo === 2 && d === 29 && !(y % 4 === 0 && (y % 100 !== 0 || y % 400 === 0))) return false;
  return Number.isFinite(Date.parse(value));
}

/**
 * An ISO 8601 time with a zone (Z or ±hh:mm) between the years 2000 and 2099 UTC. Anything else
 * (year 0999, 9999-12-31T23:59:59-10:00, 30 February) is refused with the field named.
 */
export const utcTimestampField = (label: string) =>
  z.iso
    .datetime({ offset: true, message: `Give ${label} as an ISO 8601 UTC time, e.g. 2026-12-02T10:00:01Z` })
    .refine(survivesDate, `Give ${label} as a real calendar time, e.g. 2026-12-02T10:00:01Z`)
    .refine((value) => {
      const ms = Date.parse(value);
      return ms >= EARLIEST_UTC_MS && ms < LATEST_UTC_MS;
    }, `Give ${label} between the years 2000 and 2099 (UTC)`);

/** One line shown to others (a person's, station's or club's name): no control or direction-override characters. */
export const nameText = (max: number) =>
  z
    .string()
    .refine(noneOf(isControl), CONTROL_MESSAGE)
    .refine(noneOf(isBidiControl), BIDI_MESSAGE)
    .trim()
    .max(max, `Use at most ${max} characters`);

/** Free text shown to others (notes, reasons): line breaks and tabs allowed, other control characters not. */
export const noteText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Use at most ${max} characters`)
    .refine(
      noneOf((code) => isControl(code) && !isLineBreakOrTab(code)),
      CONTROL_MESSAGE,
    );

/** A short machine-written label (firmware version, error code): printable only. */
export const labelText = (max: number) =>
  z.string().trim().max(max, `Use at most ${max} characters`).refine(noneOf(isControl), CONTROL_MESSAGE);
