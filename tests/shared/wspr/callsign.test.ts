import { paddedCallsign, validateCallsign, validatePlainCallsign } from '@/shared/domain/wspr/callsign';

// Rules from the WSPR protocol description (K1JT): six characters with the digit third
// (a leading space when it is second), letters after it; one prefix of 1–3 or one suffix.
describe('paddedCallsign', () => {
  it.each([
    ['K1ABC', ' K1ABC'],
    ['KA1ABC', 'KA1ABC'],
    ['N1D', ' N1D  '],
    ['QA1IMW', 'QA1IMW'], // fictional: Q prefixes are never issued to amateurs
  ])('when given %s, gives the six-character form %j', (callsign, six) => {
    expect(paddedCallsign(callsign)).toBe(six);
  });
});

describe('validatePlainCallsign', () => {
  it.each(['K1ABC', 'ka1abc', 'N1D', '5N6OOO', 'Q2TRY'])('when given %s, accepts it', (text) => {
    expect(validatePlainCallsign(text)).toMatchObject({ ok: true, callsign: text.toUpperCase() });
  });

  it.each([
    ['', /Enter a callsign/],
    ['KABC', /no digit/],
    ['ABCD1', /first digit is character 5/],
    // 3DA0XY: the 2nd character 'D' and the 3rd 'A' are letters, so WSPR's six-character form cannot hold it
    ['3DA0XY', /neither the 2nd nor the 3rd character is a digit/],
    ['K1', /at least one letter after the digit/],
    ['K1AB2', /character 5 \('2'\) is not a letter/],
    ['K1ABCD', /4 letters after the digit/],
    ['K1-ABC', /'-' is not allowed/],
  ])('when given %j, refuses and says what to fix', (text, reason) => {
    const r = validatePlainCallsign(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});

describe('validateCallsign', () => {
  it.each([
    ['PJ4/K1ABC', { kind: 'compound', base: 'K1ABC', prefix: 'PJ4' }],
    ['K1ABC/P', { kind: 'compound', base: 'K1ABC', suffix: 'P' }],
    ['K1ABC/7', { kind: 'compound', base: 'K1ABC', suffix: '7' }],
    ['K1ABC/12', { kind: 'compound', base: 'K1ABC', suffix: '12' }],
    ['K1ABC', { kind: 'plain', base: 'K1ABC' }],
  ])('when given %s, says what WSPR can carry', (text, expected) => {
    expect(validateCallsign(text)).toMatchObject({ ok: true, ...expected });
  });

  it.each([
    ['PJ4/K1ABC/P', /only one.*not both/],
    ['K1ABC/07', /from \/10 to \/99/],
    ['K1ABC/PA', /two digits/],
    ['ABCD/K1ABC', /1 to 3/],
    // both sides are callsigns by themselves: the left one is a prefix, and five characters are too many
    ['VE3AB/K1ABC', /prefix 'VE3AB\/' has 5 characters/],
    ['K1ABC/', /nothing on one side/],
    ['PJ4/KABC', /no digit/],
  ])('when given %s, refuses and says what to fix', (text, reason) => {
    const r = validateCallsign(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});
