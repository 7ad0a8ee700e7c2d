/** fast-check generators of valid WSPR messages of every type (fictional callsigns built from the rules). */
import fc from 'fast-check';

const LETTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ'.split('');
const DIGITS = '0123456789'.split('');
const letter = fc.constantFrom(...LETTERS);
const digit = fc.constantFrom(...DIGITS);
const alnum = fc.constantFrom(...LETTERS, ...DIGITS);
const word = (chars: fc.Arbitrary<string>, min: number, max: number): fc.Arbitrary<string> =>
  fc.array(chars, { minLength: min, maxLength: max }).map((a) => a.join(''));

/** Plain callsign: the digit 2nd or 3rd, then 1–3 letters. */
export const plainCallsign: fc.Arbitrary<string> = fc.oneof(
  fc.tuple(alnum, digit, word(letter, 1, 3)).map(([a, d, t]) => a + d + t),
  fc.tuple(alnum, alnum, digit, word(letter, 1, 3)).map(([a, b, d, t]) => a + b + d + t),
);

export const suffix: fc.Arbitrary<string> = fc.oneof(alnum, fc.integer({ min: 10, max: 99 }).map(String));

export const compoundCallsign: fc.Arbitrary<string> = fc.oneof(
  fc.tuple(word(alnum, 1, 3), plainCallsign).map(([p, c]) => `${p}/${c}`),
  fc.tuple(plainCallsign, suffix).map(([c, s]) => `${c}/${s}`),
);

const FIELD = 'ABCDEFGHIJKLMNOPQR'.split('');
const SUB = 'ABCDEFGHIJKLMNOPQRSTUVWX'.split('');
export const locator4 = fc.tuple(fc.constantFrom(...FIELD), fc.constantFrom(...FIELD), digit, digit).map((p) => p.join(''));
export const locator6 = fc.tuple(locator4, fc.constantFrom(...SUB), fc.constantFrom(...SUB)).map((p) => p.join(''));

export const powerLevel = fc.constantFrom(0, 3, 7, 10, 13, 17, 20, 23, 27, 30, 33, 37, 40, 43, 47, 50, 53, 57, 60);

export const type1Text = fc.tuple(plainCallsign, locator4, powerLevel).map(([c, l, p]) => `${c} ${l} ${p}`);
export const type2Text = fc.tuple(compoundCallsign, powerLevel).map(([c, p]) => `${c} ${p}`);
export const type3Text = fc.tuple(fc.oneof(plainCallsign, compoundCallsign), locator6, powerLevel).map(([c, l, p]) => `<${c}> ${l} ${p}`);
export const anyMessageText = fc.oneof(type1Text, type2Text, type3Text);
