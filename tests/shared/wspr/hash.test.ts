import { callsignHash, hashLittle } from '@/shared/domain/wspr/hash';
import { packMessage } from '@/shared/domain/wspr/pack';

describe('hashLittle', () => {
  // Bob Jenkins, lookup3.c (2006), driver5(): the published self-test values
  it.each([
    ['', 0, 0xdeadbeef],
    ['', 0xdeadbeef, 0xbd5b7dde],
    ['Four score and seven years ago', 0, 0x17770551],
    ['Four score and seven years ago', 1, 0xcd628161],
  ])('when hashing %j with seed %i, gives the published value', (text, seed, expected) => {
    expect(hashLittle(text, seed)).toBe(expected);
  });
});

describe('callsignHash', () => {
  // The hash fields inside the reference decoder's unpack-test vectors (see fixtures/wspr-vectors.ts):
  // M of "<K1ABC> FN42AA 33" is 834718 = 128·6521 + 30, of "<PJ4/K1ABC> FK52UD 37" 2526106 = 128·19735 + 26
  it.each([
    ['K1ABC', 6521],
    ['PJ4/K1ABC', 19735],
  ])('when hashing %s, matches the 15-bit field of the published Type 3 vector', (callsign, expected) => {
    expect(callsignHash(callsign)).toBe(expected);
  });

  it('when packing a Type 3 message, puts the hash above the power bits', () => {
    const fields = packMessage({ type: 3, callsign: 'PJ4/K1ABC', locator: 'FK52UD', powerDbm: 37 });
    expect(fields.locatorPowerField >>> 7).toBe(callsignHash('PJ4/K1ABC'));
  });
});
