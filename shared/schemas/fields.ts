import { z } from './zod-setup';

/** Maidenhead locator, 4 or 6 characters: field letters A–R, square digits, subsquare letters a–x. */
export const LOCATOR_PATTERN = /^[A-R]{2}[0-9]{2}([A-X]{2})?$/;

export const callsignField = z
  .string()
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
