import fc from 'fast-check';
import { BAND_IDS, bandFor } from '@/shared/domain/bands';
import {
  createRowReader,
  detectDelimiter,
  proposeFromText,
  readBand,
  readTime,
  REPORT_CSV_COLUMNS,
  REPORT_CSV_HEADER,
  reportCsvLine,
  type ReportCsvRow,
} from '@/shared/domain/reception';
import type { ImportMapping } from '@/shared/api/receptions';
import { checkMappedReport, importedReportInput, quickImportedReport } from '@/shared/schemas';

const roleOf = (mapping: ImportMapping, header: string) => mapping.columns.find((c) => c.header === header)?.role;

/** Proposes, then reads every data row of a sample file. */
function readAll(text: string) {
  const proposal = proposeFromText(text, true);
  const read = createRowReader(proposal.mapping);
  const body = proposal.mapping.hasHeader ? proposal.rows.slice(1) : proposal.rows;
  const results = body.map((cells) => {
    const row = read(cells);
    return row.ok ? checkMappedReport(row.report, proposal.mapping) : row;
  });
  return { ...proposal, results };
}

// Test files made for these tests. Values are fictional (Q-prefixed callsigns).
// 20 m WSPR: dial 14.0956 MHz, reports near 14.0971 MHz (common practice, from memory).
const commaMhzIso = [
  'Time UTC,Heard,Grid,Power dBm,Reporter,Reporter grid,SNR,Freq MHz,Drift,Comment',
  '2026-12-02T10:04:00Z,Q1ABC,JO22,23,Q2XYZ,FN31pr,-21,14.097102,0,fine',
  '2026-12-02T10:06:00Z,Q1ABC,JO22,23,Q3RX,IO91wm,-7,14.097098,-1,',
  '2026-12-02T10:08:00Z,Q1ABC,JO22,23,Q2XYZ,FN31pr,-25,14.097101,1,weak',
].join('\n');

// 40 m WSPR: dial 7.0386 MHz (common practice, from memory); epoch seconds per POSIX (1796205840 = 2026-12-02T10:04:00Z,
// cross-checked with Date.UTC, the general-purpose reference).
const tabHzEpoch = [
  ['utc_epoch', 'band', 'sender', 'sender_locator', 'pwr', 'receiver', 'receiver_grid', 'signal_db', 'frequency', 'drift', 'distance_km'],
  ['1796205840', '40m', 'Q4TX', 'IO91', '37', 'Q5RX', 'PM95vq', '-18', '7040102', '0', '9200'],
  ['1796205960', '40m', 'Q4TX', 'IO91', '37', 'Q6RX', 'QF56od', '-3', '7040099', '2', '17000'],
]
  .map((r) => r.join('\t'))
  .join('\n');

// Vague headers, semicolons, kHz, "YYYY-MM-DD HH:MM", an unresolved hashed callsign in the first callsign column.
const semicolonKhzDateTime = [
  'when;call;loc;db;qrg;call;loc;pwr',
  '2026-12-02 10:04;<...>;;-12;10140.201;Q7RX;JN58td;',
  '2026-12-02 10:06;Q8TX;EM10;-20;10140.230;Q7RX;JN58td;30',
].join('\n');

describe('proposeMapping', () => {
  it('when the header names the columns in its own order with MHz and ISO times, maps each one and reads MHz', () => {
    const { mapping, results } = readAll(commaMhzIso);
    expect(mapping.delimiter).toBe(',');
    expect(mapping.hasHeader).toBe(true);
    expect(mapping.timeFormat).toBe('iso');
    expect(mapping.frequencyUnit).toBe('mhz');
    expect(mapping.columns.map((c) => c.role)).toEqual([
      'time',
      'txCallsign',
      'txLocator',
      'txPowerDbm',
      'rxCallsign',
      'rxLocator',
      'snrDb',
      'frequency',
      'driftHz',
      'ignore',
    ]);
    expect(results.every((r) => r.ok)).toBe(true);
    const first = results[0].ok ? results[0].report : null;
    expect(first).toMatchObject({
      slotUtc: '2026-12-02T10:04:00.000Z',
      bandId: '20m',
      txCallsign: 'Q1ABC',
      txLocator: 'JO22',
      txPowerDbm: 23,
      rxCallsign: 'Q2XYZ',
      rxLocator: 'FN31PR',
      snrDb: -21,
      driftHz: 0,
    });
    // 14.097102 MHz = 14 097 102 Hz (SI prefix M = 10^6)
    expect(first?.frequencyHz).toBe(14_097_102);
  });

  it('when the file is tab-separated with Hz, epoch seconds and a derived column, reads Hz and ignores the distance', () => {
    const { mapping, results } = readAll(tabHzEpoch);
    expect(mapping.delimiter).toBe('\t');
    expect(mapping.timeFormat).toBe('epoch-seconds');
    expect(mapping.frequencyUnit).toBe('hz');
    expect(roleOf(mapping, 'sender')).toBe('txCallsign');
    expect(roleOf(mapping, 'receiver')).toBe('rxCallsign');
    expect(roleOf(mapping, 'receiver_grid')).toBe('rxLocator');
    expect(roleOf(mapping, 'sender_locator')).toBe('txLocator');
    expect(roleOf(mapping, 'signal_db')).toBe('snrDb');
    expect(roleOf(mapping, 'pwr')).toBe('txPowerDbm');
    expect(roleOf(mapping, 'distance_km')).toBe('ignore');
    expect(roleOf(mapping, 'band')).toBe('band');
    expect(results.map((r) => (r.ok ? r.report.slotUtc : r.problem.reason))).toEqual([
      '2026-12-02T10:04:00.000Z',
      '2026-12-02T10:06:00.000Z',
    ]);
    expect(results.map((r) => (r.ok ? r.report.frequencyHz : null))).toEqual([7_040_102, 7_040_099]);
  });

  it('when headers are vague, decides the transmitter from the values and reads kHz and "YYYY-MM-DD HH:MM"', () => {
    const { mapping, notes, results } = readAll(semicolonKhzDateTime);
    expect(mapping.delimiter).toBe(';');
    expect(mapping.timeFormat).toBe('date-time');
    expect(mapping.frequencyUnit).toBe('khz');
    expect(mapping.columns.map((c) => c.role)).toEqual([
      'time',
      'txCallsign',
      'txLocator',
      'snrDb',
      'frequency',
      'rxCallsign',
      'rxLocator',
      'txPowerDbm',
    ]);
    expect(notes.join(' ')).toMatch(/band is worked out from the frequency/);
    // 10.1402 MHz lies in the 30 m band (ITU RR Art. 5: 10.100–10.150 MHz, from memory)
    expect(results.map((r) => (r.ok ? r.report.bandId : r.problem.reason))).toEqual(['30m', '30m']);
    expect(results[0].ok && results[0].report.txCallsign).toBe('<...>');
    expect(results[1].ok && results[1].report.frequencyHz).toBe(10_140_230);
  });

  it('when the file has no header, judges every column from its values', () => {
    const text = [
      '2026-12-02T10:04:00Z,Q1ABC,JO22,Q2XYZ,FN31pr,-21,14097102,20m',
      '2026-12-02T10:06:00Z,Q1ABC,JO22,Q3RX,IO91wm,-7,14097098,20m',
    ].join('\n');
    const { mapping, notes, results } = readAll(text);
    expect(mapping.hasHeader).toBe(false);
    expect(mapping.columns.map((c) => c.role)).toEqual([
      'time',
      'txCallsign',
      'txLocator',
      'rxCallsign',
      'rxLocator',
      'snrDb',
      'frequency',
      'band',
    ]);
    expect(notes.join(' ')).toMatch(/values alone/);
    expect(results.every((r) => r.ok)).toBe(true);
  });

  it("when the file is Faintline's own CSV, maps every column exactly as written", () => {
    const { mapping, notes } = proposeFromText(`${REPORT_CSV_HEADER}\n`, true);
    expect(mapping.columns.map((c) => c.role)).toEqual([
      'time',
      'band',
      'txCallsign',
      'txLocator',
      'txPowerDbm',
      'rxCallsign',
      'rxLocator',
      'snrDb',
      'frequency',
      'driftHz',
      'ignore',
      'ignore',
      'ignore',
    ]);
    expect(mapping.columns.map((c) => c.header)).toEqual([...REPORT_CSV_COLUMNS]);
    expect(mapping).toMatchObject({ delimiter: ',', hasHeader: true, timeFormat: 'iso', frequencyUnit: 'hz' });
    expect(notes).toHaveLength(1);
  });

  it('when there is no time column, says so', () => {
    const { mapping, notes } = proposeFromText('sender,receiver,grid,snr,freq\nQ1ABC,Q2XYZ,FN31,-20,14097100\n', true);
    expect(mapping.columns.some((c) => c.role === 'time')).toBe(false);
    expect(notes.join(' ')).toMatch(/No column looks like the time/);
  });
});

describe('row reader', () => {
  const { mapping } = proposeFromText(commaMhzIso, true);
  const read = createRowReader(mapping);
  const check = (cells: string[]) => {
    const row = read(cells);
    return row.ok ? checkMappedReport(row.report, mapping) : row;
  };
  const good = '2026-12-02T10:04:00Z,Q1ABC,JO22,23,Q2XYZ,FN31pr,-21,14.097102,0,'.split(',');
  const withCell = (index: number, value: string) => good.map((cell, i) => (i === index ? value : cell));

  it.each([
    ['a time that is no time', withCell(0, 'yesterday'), 'Time UTC', /"yesterday" is not a time/],
    ['an empty time', withCell(0, ''), 'Time UTC', /empty/],
    ['a frequency in no band', withCell(7, '15.5'), 'Freq MHz', /no amateur band/],
    ['a frequency that is not a number', withCell(7, 'abc'), 'Freq MHz', /not a number/],
    ['an SNR that is not a number', withCell(6, 'loud'), 'SNR', /not a number/],
    ['a receiver locator that is no locator', withCell(5, 'ZZ99'), 'Reporter grid', /Maidenhead/],
    ['a power above 60 dBm', withCell(3, '77'), 'Power dBm', /0–60 dBm/],
    ['a callsign with odd characters', withCell(1, 'Q1#A'), 'Heard', /letters, digits/],
    ['a time before 2000', withCell(0, '1999-12-31T23:58:00Z'), 'Time UTC', /between the years 2000 and 2099/],
  ])('when a row has %s, names the column and the reason', (_what, cells, column, reason) => {
    const r = check(cells);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.problem.column).toBe(column);
      expect(r.problem.reason).toMatch(reason);
    }
  });

  it('when the band column disagrees with the frequency, names the frequency', () => {
    const m: ImportMapping = { ...mapping, columns: [...mapping.columns.slice(0, 9), { index: 9, header: 'Comment', role: 'band' }] };
    const r = createRowReader(m)(withCell(9, '40m'));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problem).toEqual({ column: 'Freq MHz', reason: expect.stringMatching(/20m band, not in 40m/) });
  });
});

describe('value readers', () => {
  it.each([
    // ISO 8601 with an offset: 12:04+02:00 is 10:04 UTC (ISO 8601-1:2019 §4.3.13)
    ['2026-12-02T12:04:00+02:00', 'iso', '2026-12-02T10:04:00.000Z'],
    ['2026-12-02T10:04', 'iso', '2026-12-02T10:04:00.000Z'],
    ['2026-12-02 10:04', 'date-time', '2026-12-02T10:04:00.000Z'],
    ['2026-12-02 10:04:30', 'date-time', '2026-12-02T10:04:30.000Z'],
    // POSIX time: seconds since 1970-01-01T00:00:00Z; checked against Date.UTC
    ['1796205840', 'epoch-seconds', '2026-12-02T10:04:00.000Z'],
  ] as const)('reads %s as %s', (text, format, iso) => {
    expect(new Date(readTime(text, format) ?? NaN).toISOString()).toBe(iso);
  });

  it('refuses a date that does not exist', () => {
    expect(readTime('2026-02-31 10:04', 'date-time')).toBeNull();
  });

  it.each([
    ['20m', '20m'],
    ['20 M', '20m'],
    ['40', '40m'],
    ['14', '20m'],
  ])('reads the band %s as %s', (text, band) => expect(readBand(text)).toBe(band));

  it('picks the delimiter that splits lines consistently', () => {
    expect(detectDelimiter(['a;b;c', '1;2,5;3'])).toBe(';');
    expect(detectDelimiter(['a\tb\tc', '1\t2\t3'])).toBe('\t');
  });
});

describe('export then import', () => {
  const letters = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ';
  const callsign = fc
    .tuple(fc.constantFrom(...'123456789'), fc.string({ unit: fc.constantFrom(...letters), minLength: 1, maxLength: 3 }))
    .map(([digit, suffix]) => `Q${digit}${suffix}`);
  const locator = fc
    .tuple(
      fc.constantFrom(...'ABCDEFGHIJKLMNOPQR'),
      fc.constantFrom(...'ABCDEFGHIJKLMNOPQR'),
      fc.integer({ min: 0, max: 99 }),
      fc.option(fc.tuple(fc.constantFrom(...'abcdefghijklmnopqrstuvwx'), fc.constantFrom(...'abcdefghijklmnopqrstuvwx')), { nil: null }),
    )
    .map(([a, b, n, sub]) => `${a}${b}${String(n).padStart(2, '0')}${sub ? sub.join('') : ''}`.toUpperCase());
  const band = fc.constantFrom(...BAND_IDS.filter((id) => bandFor(id).ok));
  const report: fc.Arbitrary<ReportCsvRow> = fc
    .record({
      slotMinute: fc.integer({ min: 0, max: 60 * 24 * 365 * 30 }),
      bandId: band,
      offsetHz: fc.integer({ min: 1400, max: 1600 }),
      txCallsign: fc.oneof(callsign, fc.constant('<...>')),
      txLocator: fc.option(locator, { nil: null }),
      txPowerDbm: fc.option(fc.integer({ min: 0, max: 60 }), { nil: null }),
      rxCallsign: callsign,
      rxLocator: locator,
      snrDb: fc.integer({ min: -35, max: 30 }),
      driftHz: fc.integer({ min: -4, max: 4 }),
      distanceKm: fc.option(fc.double({ min: 0, max: 20000, noNaN: true }), { nil: null }),
    })
    .map((r) => {
      const found = bandFor(r.bandId);
      const dialHz = found.ok ? found.band.dialHz : 0;
      return {
        slotUtc: new Date(Date.UTC(2001, 0, 1) + r.slotMinute * 120_000 - (r.slotMinute % 2) * 60_000).toISOString(),
        bandId: r.bandId,
        txCallsign: r.txCallsign,
        txLocator: r.txLocator,
        txPowerDbm: r.txPowerDbm,
        rxCallsign: r.rxCallsign,
        rxLocator: r.rxLocator,
        snrDb: r.snrDb,
        frequencyHz: dialHz + r.offsetHz,
        driftHz: r.driftHz,
        distanceKm: r.distanceKm,
        bearingDeg: r.distanceKm === null ? null : 42.5,
        frequencyErrorHz: null,
      };
    });

  it('gives back the same reports for any exported file', () => {
    fc.assert(
      fc.property(fc.array(report, { minLength: 1, maxLength: 30 }), (reports) => {
        const text = [REPORT_CSV_HEADER, ...reports.map(reportCsvLine)].join('\n') + '\n';
        const { results } = readAll(text);
        expect(results).toHaveLength(reports.length);
        results.forEach((r, i) => {
          const original = reports[i];
          expect(r.ok).toBe(true);
          if (!r.ok) return;
          expect(r.report).toEqual({
            slotUtc: new Date(original.slotUtc).toISOString(),
            bandId: original.bandId,
            txCallsign: original.txCallsign,
            txLocator: original.txLocator,
            txPowerDbm: original.txPowerDbm,
            rxCallsign: original.rxCallsign,
            rxLocator: original.rxLocator,
            snrDb: original.snrDb,
            frequencyHz: original.frequencyHz,
            driftHz: original.driftHz,
          });
        });
      }),
      { numRuns: 200 },
    );
  });
});

describe('the quick check of a mapped row', () => {
  const cell = (...values: string[]) => fc.constantFrom(...values);
  const mapped = fc.record({
    slotUtc: cell('2026-12-02T10:04:00.000Z', '1999-12-31T23:58:00.000Z', '2100-01-01T00:00:00.000Z', '2026-12-02T10:04:00Z', 'soon'),
    bandId: cell('20m', '40m', '11m', ''),
    txCallsign: cell('Q1ABC', 'q1abc', ' Q1ABC ', '<...>', 'Q1#A', '', 'Q1ABCDEFGHIJKL', 'QQQ'),
    txLocator: fc.constantFrom(null, 'JO22', 'jo22ab', 'ZZ99', 'JO2', ''),
    txPowerDbm: fc.constantFrom(null, 0, 23, 60, 61, -1, 23.5),
    rxCallsign: cell('Q2XYZ', 'q2xyz', '<...>', '', 'Q/2'),
    rxLocator: cell('FN31pr', 'FN31', 'FN31PR', 'SS00', 'FN31p', ''),
    snrDb: fc.constantFrom(-60, -21, 0, 60, 61, -61, 3.5, Number.NaN),
    frequencyHz: fc.constantFrom(14_097_102, 0.5, 0, -1, 500_000_000, 500_000_001, Number.NaN),
    driftHz: fc.constantFrom(0, -100, 100, 101, 1.5),
  });

  it('accepts exactly what the shared schema accepts and gives the same values', () => {
    fc.assert(
      fc.property(mapped, (report) => {
        const quick = quickImportedReport(report);
        const schema = importedReportInput.safeParse(report);
        if (quick) {
          expect(schema.success).toBe(true);
          expect(quick).toEqual(schema.data);
        } else if (schema.success) {
          // Only spellings the quick check leaves to the schema (a time without milliseconds) may differ.
          expect(report.slotUtc).toBe('2026-12-02T10:04:00Z');
        }
      }),
      { numRuns: 3000 },
    );
  });
});
