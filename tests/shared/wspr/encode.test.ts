import fc from 'fast-check';
import { encodeFields, encodeMessage, SYNC_VECTOR } from '@/shared/domain/wspr/encode';
import { callsignHash } from '@/shared/domain/wspr/hash';
import { formatMessage, parseMessage } from '@/shared/domain/wspr/message';
import { bytesToHex, fieldsFromBytes, packedBytes, packMessage } from '@/shared/domain/wspr/pack';
import { unpackBytes, unpackFields } from '@/shared/domain/wspr/unpack';
import { publishedPackedVectors, workedExample } from '../fixtures/wspr-vectors';
import { anyMessageText, type1Text, type2Text, type3Text } from './arbitraries';

const RUNS = { numRuns: 1000 };

function encodeOrThrow(text: string) {
  const r = encodeMessage(text);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

describe('encodeMessage', () => {
  // Worked example of the WSPR protocol description (K1JT), values in fixtures/wspr-vectors.ts
  it('when given the worked example, packs the published callsign and locator/power integers', () => {
    const r = encodeOrThrow(workedExample.message);
    expect(r.fields.callsignField).toBe(workedExample.callsignInteger);
    expect(r.fields.locatorPowerField).toBe(workedExample.locatorPowerInteger);
  });

  it('when given the worked example, packs the published bytes', () => {
    expect(bytesToHex(packedBytes(encodeOrThrow(workedExample.message).fields))).toBe(workedExample.packedHex);
  });

  it('when given the worked example, gives the published 162 symbols', () => {
    expect(Array.from(encodeOrThrow(workedExample.message).symbols)).toEqual(workedExample.symbols);
  });

  it.each(publishedPackedVectors.map((v) => [v.message, v.packedHex]))(
    'when given %s, packs the bytes of the reference decoder test',
    (message, hex) => {
      expect(bytesToHex(packedBytes(encodeOrThrow(message).fields))).toBe(hex);
    },
  );

  it.each([
    ['K1ABC FN42 36', 37],
    ['K1ABC FN42 35', 37],
    ['K1ABC FN42 1', 0],
    ['PJ4/K1ABC 22', 23],
  ])('when the power in %s is not a WSPR level, rounds it and reports the rounding', (text, reportedDbm) => {
    const r = encodeOrThrow(text);
    expect(r.power).toMatchObject({ rounded: true, reportedDbm });
    expect(r.message.endsWith(` ${reportedDbm}`)).toBe(true);
  });

  it.each([
    ['K1ABC FN42 61', /0 to 60/],
    ['KABC FN42 37', /no digit/],
    ['K1ABC ZZ99 37', /locator/],
    ['PJ4/K1ABC/P 37', /only one/],
    ['K1ABC 37', /locator/],
    ['K1ABC FN42AB 37', /Type 3/],
    ['<K1ABC> FN42 37', /6-character/],
    ['hello', /not a WSPR message/],
  ])('when given %s, refuses with a reason', (text, reason) => {
    const r = encodeMessage(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });

  it('when given any valid message, puts the sync vector in the low bit of every symbol', () => {
    fc.assert(
      fc.property(anyMessageText, (text) => {
        const symbols = encodeOrThrow(text).symbols;
        return symbols.length === 162 && symbols.every((s, i) => s <= 3 && (s & 1) === SYNC_VECTOR[i]);
      }),
      RUNS,
    );
  });
});

describe('unpackFields', () => {
  const roundTrip = (text: string): string => {
    const parsed = parseMessage(text);
    if (!parsed.ok) throw new Error(parsed.reason);
    const callsign = parsed.message.callsign;
    const bytes = packedBytes(packMessage(parsed.message));
    const back = unpackBytes(bytes, (hash) => (hash === callsignHash(callsign) ? callsign : undefined));
    if (!back.ok) throw new Error(back.reason);
    if (back.message.callsign === null) throw new Error('hash not resolved');
    return formatMessage(back.message);
  };

  it.each([
    ['Type 1', type1Text],
    ['Type 2', type2Text],
    ['Type 3', type3Text],
  ])('when packing then unpacking random %s messages, gives each message back', (_type, arbitrary) => {
    fc.assert(
      fc.property(arbitrary, (text) => roundTrip(text) === text),
      RUNS,
    );
  });

  it.each(publishedPackedVectors.map((v) => [v.packedHex, v.message]))('when reading the published bytes %s, gives %s', (hex, message) => {
    const bytes = hex.split(' ').map((h) => parseInt(h, 16));
    const callsign = message.match(/^<(.*)>/)?.[1];
    const r = unpackBytes(bytes, (hash) => (callsign && hash === callsignHash(callsign) ? callsign : undefined));
    expect(r.ok && r.message.callsign !== null && formatMessage(r.message)).toBe(message);
  });

  it('when a Type 3 hash is unknown, returns the hash unresolved', () => {
    const r = unpackFields(packMessage({ type: 3, callsign: 'K1ABC', locator: 'FN42AA', powerDbm: 33 }));
    expect(r).toMatchObject({ ok: true, message: { type: 3, callsign: null, hash: callsignHash('K1ABC'), locator: 'FN42AA' } });
  });

  it('when packed bytes are read back into fields, gives the same fields', () => {
    const fields = { callsignField: workedExample.callsignInteger, locatorPowerField: workedExample.locatorPowerInteger };
    expect(fieldsFromBytes(packedBytes(fields))).toEqual(fields);
  });
});

describe('encodeFields', () => {
  it('when given an output buffer, writes the symbols into it', () => {
    const out = new Uint8Array(162);
    const fields = { callsignField: workedExample.callsignInteger, locatorPowerField: workedExample.locatorPowerInteger };
    expect(encodeFields(fields, out)).toBe(out);
    expect(Array.from(out)).toEqual(workedExample.symbols);
  });
});
