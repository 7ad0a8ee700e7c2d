/**
 * Callsign rules as WSPR can carry them (WSPR protocol description, K1JT):
 * a plain callsign packs into 28 bits as six characters whose third is a digit
 * (a one-letter prefix gets a leading space), followed by up to three letters.
 * A compound callsign adds one prefix of 1–3 characters, or one suffix of one
 * letter or digit, or two digits (10–99).
 */
import { refuse, type Result } from '../result';

export type PlainCallsign = { kind: 'plain'; callsign: string; base: string };
export type CompoundCallsign = {
  kind: 'compound';
  callsign: string;
  base: string;
  prefix?: string;
  suffix?: string;
};
export type CallsignInfo = PlainCallsign | CompoundCallsign;

const isDigit = (ch: string): boolean => ch >= '0' && ch <= '9';
const isLetter = (ch: string): boolean => ch >= 'A' && ch <= 'Z';
const isAlnum = (ch: string): boolean => isDigit(ch) || isLetter(ch);

export function normaliseCallsign(text: string): string {
  return text.trim().toUpperCase();
}

/**
 * The six-character form packed into the message: the digit that ends the
 * prefix sits third, so "K1ABC" becomes " K1ABC" and "KA1ABC" stays.
 * Returns null when the callsign has no such form.
 */
export function paddedCallsign(base: string): string | null {
  let six: string;
  if (base.length >= 3 && isDigit(base[2])) six = base;
  else if (base.length >= 2 && isDigit(base[1])) six = ' ' + base;
  else return null;
  return six.length > 6 ? null : six.padEnd(6, ' ');
}

/** A plain callsign (no '/'): what WSPR Type 1 carries. */
export function validatePlainCallsign(text: string): Result<PlainCallsign> {
  const callsign = normaliseCallsign(text);
  if (callsign === '') return refuse('Enter a callsign, for example K1ABC.');
  const bad = [...callsign].find((ch) => !isAlnum(ch));
  if (bad !== undefined) {
    return refuse(`A callsign uses only letters A–Z and digits 0–9; '${bad}' is not allowed.`);
  }
  if (![...callsign].some(isDigit)) {
    return refuse(`'${callsign}' has no digit: a callsign needs one in the 2nd or 3rd position, as in K1ABC or KA1ABC.`);
  }
  let digitAt: number;
  if (callsign.length >= 3 && isDigit(callsign[2])) digitAt = 2;
  else if (isDigit(callsign[1] ?? '')) digitAt = 1;
  else {
    const first = [...callsign].findIndex(isDigit) + 1;
    return refuse(
      `In '${callsign}' neither the 2nd nor the 3rd character is a digit (its first digit is character ${first}); WSPR needs the digit that ends the prefix there, as in K1ABC or KA1ABC.`,
    );
  }
  const tail = callsign.slice(digitAt + 1);
  if (tail.length === 0) return refuse(`'${callsign}' needs at least one letter after the digit, as in K1ABC.`);
  const tailBad = [...tail].findIndex((ch) => !isLetter(ch));
  if (tailBad >= 0) {
    return refuse(
      `In '${callsign}' only letters may follow the digit; character ${digitAt + 2 + tailBad} ('${tail[tailBad]}') is not a letter.`,
    );
  }
  if (tail.length > 3) {
    return refuse(`'${callsign}' has ${tail.length} letters after the digit; WSPR carries at most 3.`);
  }
  return { ok: true, kind: 'plain', callsign, base: callsign };
}

function validateSuffix(suffix: string): string | null {
  if (suffix.length === 1) return isAlnum(suffix) ? null : `The suffix '/${suffix}' must be a letter or a digit.`;
  if (suffix.length === 2 && isDigit(suffix[0]) && isDigit(suffix[1])) {
    return suffix[0] === '0' ? `A two-digit suffix runs from /10 to /99; '/${suffix}' is not possible (use /${suffix[1]}).` : null;
  }
  return `A suffix is one letter or digit (/P, /7) or two digits (/10 … /99); '/${suffix}' is not possible.`;
}

/** Any callsign WSPR can carry: plain, or with one prefix or one suffix. */
export function validateCallsign(text: string): Result<CallsignInfo> {
  const callsign = normaliseCallsign(text);
  const parts = callsign.split('/');
  if (parts.length === 1) return validatePlainCallsign(callsign);
  if (parts.length > 2) {
    return refuse(
      `'${callsign}' has ${parts.length - 1} add-ons; WSPR carries only one: a prefix (PJ4/K1ABC) or a suffix (K1ABC/P), not both.`,
    );
  }
  const [left, right] = parts;
  if (left === '' || right === '') return refuse(`'${callsign}' has nothing on one side of the '/'.`);
  const bad = [...left, ...right].find((ch) => !isAlnum(ch));
  if (bad !== undefined) return refuse(`A callsign uses only letters A–Z, digits 0–9 and one '/'; '${bad}' is not allowed.`);

  // The side that is a callsign by itself is the base; when both are (VE3AB/K1ABC) the right one is,
  // so the left one is a prefix, and one of more than three characters is too long.
  const asSuffix = right.length <= 2 || (left.length > 3 && validatePlainCallsign(left).ok && !validatePlainCallsign(right).ok);
  if (asSuffix) {
    const base = validatePlainCallsign(left);
    if (!base.ok) return refuse(`In '${callsign}': ${base.reason}`);
    const problem = validateSuffix(right);
    if (problem) return refuse(problem);
    return { ok: true, kind: 'compound', callsign, base: left, suffix: right };
  }
  if (left.length > 3) {
    return refuse(`The prefix '${left}/' has ${left.length} characters; WSPR carries a prefix of 1 to 3.`);
  }
  const base = validatePlainCallsign(right);
  if (!base.ok) return refuse(`In '${callsign}': ${base.reason}`);
  return { ok: true, kind: 'compound', callsign, base: right, prefix: left };
}
