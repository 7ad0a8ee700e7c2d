/**
 * File import: propose how the columns of a file of reception reports are read, from the words in its header
 * and the values in its first rows (no preset for any particular program's layout), and read rows with a
 * mapping into reports or into a precise problem (which column, why).
 */
import type { ImportColumnRole, ImportFrequencyUnit, ImportMapping, ImportTimeFormat } from '../../api/receptions';
import { BAND_IDS, bandsFor, LICENCE_REGIONS, type BandId } from '../bands';
import { REPORT_CSV_COLUMNS } from './csv';

export type ImportDelimiter = ImportMapping['delimiter'];

/** The roles a file must provide (the band may instead come from the frequency). */
export const REQUIRED_ROLES: readonly ImportColumnRole[] = ['time', 'frequency', 'txCallsign', 'rxCallsign', 'rxLocator', 'snrDb'];

export const ROLE_LABELS: Record<ImportColumnRole, string> = {
  ignore: 'not imported',
  time: 'time (UTC)',
  band: 'band',
  frequency: 'frequency heard',
  txCallsign: "transmitter's callsign",
  txLocator: "transmitter's locator",
  txPowerDbm: "transmitter's power (dBm)",
  rxCallsign: "receiver's callsign",
  rxLocator: "receiver's locator",
  snrDb: 'SNR (dB)',
  driftHz: 'drift (Hz)',
};

// ---------------------------------------------------------------------------------------------------------------
// Delimiter and sample splitting

const DELIMITERS: readonly ImportDelimiter[] = [',', '\t', ';'];

/** Splits one line on a delimiter, honouring double quotes ("" inside quotes is one quote). */
export function splitLine(line: string, delimiter: ImportDelimiter): string[] {
  if (!line.includes('"')) return line.split(delimiter);
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i += 1) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cell += '"';
        i += 1;
      } else if (ch === '"') quoted = false;
      else cell += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === delimiter) {
      cells.push(cell);
      cell = '';
    } else cell += ch;
  }
  cells.push(cell);
  return cells;
}

/** The complete, non-blank lines of a sample (a cut-off last line is dropped unless it is the only one). */
export function sampleLines(text: string, complete = false): string[] {
  const withoutBom = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const lines = withoutBom.split(/\r?\n/);
  if (!complete && lines.length > 1) lines.pop();
  return lines.filter((line) => line.trim() !== '');
}

/** The delimiter that splits the first lines into the same, largest number of cells. */
export function detectDelimiter(lines: string[]): ImportDelimiter {
  const head = lines.slice(0, 20);
  let best: ImportDelimiter = ',';
  let bestScore = 0;
  for (const delimiter of DELIMITERS) {
    const counts = head.map((line) => splitLine(line, delimiter).length);
    if (counts.length === 0 || counts[0] < 2) continue;
    const consistent = counts.filter((c) => c === counts[0]).length / counts.length;
    const score = counts[0] * consistent;
    if (score > bestScore) {
      best = delimiter;
      bestScore = score;
    }
  }
  return best;
}

// ---------------------------------------------------------------------------------------------------------------
// Value readers

const ISO_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?$/i;
const DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})[ _](\d{2}):(\d{2})(?::(\d{2}))?(?: ?(?:Z|UTC))?$/i;
const EPOCH = /^\d{9,10}(\.\d+)?$/;
/** Epoch seconds of 2000-01-01 and 2100-01-01: a 9- or 10-digit number outside is no time of a report. */
const EPOCH_PLAUSIBLE = [946_684_800, 4_102_444_800] as const;

function utcMs(y: string, mo: string, d: string, h: string, mi: string, s: string | undefined): number | null {
  const [year, month, day, hour, minute, second] = [y, mo, d, h, mi, s ?? '0'].map(Number);
  if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59 || second > 60) return null;
  const ms = Date.UTC(year, month - 1, day, hour, minute, second);
  // Date.UTC rolls 31 February over into March; such a date does not exist.
  return new Date(ms).getUTCDate() === day ? ms : null;
}

/** A time cell as milliseconds since the epoch (UTC), or null when it is not in that format. */
export function readTime(text: string, format: ImportTimeFormat): number | null {
  const value = text.trim();
  if (format === 'epoch-seconds') return EPOCH.test(value) ? Math.round(Number(value) * 1000) : null;
  if (format === 'date-time') {
    const m = DATE_TIME.exec(value);
    return m ? utcMs(m[1], m[2], m[3], m[4], m[5], m[6]) : null;
  }
  const m = ISO_TIME.exec(value);
  if (!m) return null;
  const base = utcMs(m[1], m[2], m[3], m[4], m[5], m[6]);
  if (base === null) return null;
  const fraction = m[7] ? Math.round(Number(m[7]) * 1000) : 0;
  const zone = m[8];
  if (!zone || zone.toUpperCase() === 'Z') return base + fraction;
  const sign = zone[0] === '-' ? -1 : 1;
  const digits = zone.slice(1).replace(':', '');
  const offsetMin = Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2));
  return base + fraction - sign * offsetMin * 60_000;
}

function timeFormatOf(text: string): ImportTimeFormat | null {
  const value = text.trim();
  if (ISO_TIME.test(value)) return 'iso';
  if (DATE_TIME.test(value)) return 'date-time';
  if (EPOCH.test(value) && Number(value) >= EPOCH_PLAUSIBLE[0] && Number(value) < EPOCH_PLAUSIBLE[1]) return 'epoch-seconds';
  return null;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
/** A number cell (a decimal comma is accepted when it is the only comma), or null. */
export function readNumber(text: string): number | null {
  let value = text.trim();
  if (value.includes(',') && !value.includes('.') && value.indexOf(',') === value.lastIndexOf(',')) value = value.replace(',', '.');
  return NUMBER.test(value) ? Number(value) : null;
}

const UNIT_FACTOR: Record<ImportFrequencyUnit, number> = { hz: 1, khz: 1e3, mhz: 1e6 };

type BandRange = { id: BandId; lowHz: number; highHz: number };
/** Every band's widest edges over the licence regions (a file may come from anywhere). */
const BAND_RANGES: BandRange[] = BAND_IDS.map((id) => {
  const regional = LICENCE_REGIONS.flatMap((region) => bandsFor(region).filter((b) => b.id === id));
  return { id, lowHz: Math.min(...regional.map((b) => b.bandLowHz)), highHz: Math.max(...regional.map((b) => b.bandHighHz)) };
});

/** The amateur band containing a frequency in any region, if any. */
export function bandOfFrequency(frequencyHz: number): BandId | null {
  for (const range of BAND_RANGES) if (frequencyHz >= range.lowHz && frequencyHz <= range.highHz) return range.id;
  return null;
}

/** "20m", "20 m", "20M", "20" → 20m; a number that names no band in metres is taken as MHz ("14" → 20m). */
export function readBand(text: string): BandId | null {
  const value = text.trim().toLowerCase().replace(/\s+/g, '');
  if ((BAND_IDS as readonly string[]).includes(value)) return value as BandId;
  if (/^\d+$/.test(value) && (BAND_IDS as readonly string[]).includes(`${value}m`)) return `${value}m` as BandId;
  const n = readNumber(value.replace(/mhz$/, ''));
  return n !== null ? bandOfFrequency(n * 1e6) : null;
}

const LOCATOR = /^[A-R]{2}[0-9]{2}([A-X]{2})?$/i;
const CALLSIGN = /^(<\.\.\.>|(?=[A-Z0-9/]*\d)(?=[A-Z0-9/]*[A-Z])[A-Z0-9/]{3,12})$/i;

// ---------------------------------------------------------------------------------------------------------------
// Proposal

/** Lower-case words of a header: "txCallsign" → tx callsign, "Heard-By (grid)" → heard by grid. */
export function headerWords(header: string): string[] {
  return header
    .replace(/dBm|dB|MHz|kHz|Hz/g, (unit) => ` ${unit.toLowerCase()} `)
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter(Boolean);
}

const has = (words: string[], ...any: string[]) => any.some((w) => words.includes(w));

/** Words that make a column something we compute ourselves or do not keep. */
const DERIVED_WORDS = ['distance', 'km', 'miles', 'mi', 'bearing', 'azimuth', 'az', 'error', 'offset', 'id', 'code', 'version', 'mode'];
const TX_WORDS = ['tx', 'transmitter', 'sender', 'sent', 'beacon', 'heard', 'source', 'from'];
const RX_WORDS = ['rx', 'receiver', 'reporter', 'listener', 'by', 'spotter', 'decoder', 'to'];

type Side = 'tx' | 'rx' | null;
function sideOf(words: string[]): Side {
  // "heard by" is the receiver; "heard" alone is what was heard, the transmitter.
  if (has(words, ...RX_WORDS)) return 'rx';
  if (has(words, ...TX_WORDS)) return 'tx';
  return null;
}

type Kind = 'time' | 'band' | 'frequency' | 'callsign' | 'locator' | 'power' | 'snr' | 'drift';

function kindFromWords(words: string[]): Kind | null {
  if (words.length === 0) return null;
  if (has(words, 'drift')) return 'drift';
  if (has(words, 'snr', 'signal')) return 'snr';
  if (has(words, ...DERIVED_WORDS)) return null;
  if (has(words, 'time', 'date', 'utc', 'timestamp', 'datetime', 'slot', 'when', 'epoch', 'unix')) return 'time';
  if (has(words, 'freq', 'frequency', 'qrg', 'mhz', 'khz', 'hz')) return 'frequency';
  if (has(words, 'band')) return 'band';
  if (has(words, 'locator', 'grid', 'loc', 'square', 'qth', 'maidenhead')) return 'locator';
  if (has(words, 'power', 'pwr', 'dbm')) return 'power';
  if (has(words, 'call', 'callsign', 'station', 'sign')) return 'callsign';
  if (has(words, 'db')) return 'snr';
  // A side word on its own ("reporter", "sender", "heard by") names the station, i.e. its callsign.
  if (sideOf(words)) return 'callsign';
  return null;
}

type ColumnSample = { index: number; header: string; values: string[] };

function share(values: string[], test: (v: string) => boolean): number {
  const filled = values.filter((v) => v.trim() !== '');
  return filled.length === 0 ? 0 : filled.filter((v) => test(v.trim())).length / filled.length;
}

/** The unit under which most sample values fall inside an amateur band (Hz wins a tie, then MHz). */
export function frequencyUnitOf(values: string[]): { unit: ImportFrequencyUnit; fit: number } {
  let best: { unit: ImportFrequencyUnit; fit: number } = { unit: 'hz', fit: 0 };
  for (const unit of ['hz', 'mhz', 'khz'] as const) {
    const fit = share(values, (v) => {
      const n = readNumber(v);
      return n !== null && bandOfFrequency(n * UNIT_FACTOR[unit]) !== null;
    });
    if (fit > best.fit) best = { unit, fit };
  }
  return best;
}

function kindFromValues(values: string[]): Kind | null {
  const filled = values.filter((v) => v.trim() !== '');
  if (filled.length === 0) return null;
  if (share(filled, (v) => timeFormatOf(v) !== null) >= 0.8) return 'time';
  if (share(filled, (v) => LOCATOR.test(v)) >= 0.8) return 'locator';
  if (share(filled, (v) => readBand(v) !== null && /m$/i.test(v)) >= 0.8) return 'band';
  if (share(filled, (v) => CALLSIGN.test(v) && !LOCATOR.test(v)) >= 0.8) return 'callsign';
  const numbers = filled.map(readNumber);
  if (numbers.some((n) => n === null)) return null;
  const nums = numbers as number[];
  if (frequencyUnitOf(filled).fit >= 0.8 && nums.some((n) => Math.abs(n) > 60)) return 'frequency';
  const whole = nums.every((n) => Number.isInteger(n));
  if (whole && nums.every((n) => n >= -5 && n <= 5)) return 'drift';
  if (nums.some((n) => n < 0) && nums.every((n) => n >= -45 && n <= 40)) return 'snr';
  if (whole && nums.every((n) => n >= 0 && n <= 60)) return 'power';
  return null;
}

export type MappingProposal = { mapping: ImportMapping; notes: string[] };

function looksLikeHeader(row: string[]): boolean {
  if (row.some((cell) => timeFormatOf(cell) !== null || readNumber(cell) !== null)) return false;
  return row.some((cell) => /[a-z]/i.test(cell) && !LOCATOR.test(cell.trim()) && !CALLSIGN.test(cell.trim()));
}

/** Where Faintline's own CSV is recognised: exactly its header, in its order. */
function isOwnLayout(header: string[]): boolean {
  return header.length === REPORT_CSV_COLUMNS.length && header.every((h, i) => h.trim() === REPORT_CSV_COLUMNS[i]);
}

const OWN_ROLES: Record<(typeof REPORT_CSV_COLUMNS)[number], ImportColumnRole> = {
  slot_utc: 'time',
  band: 'band',
  tx_callsign: 'txCallsign',
  tx_locator: 'txLocator',
  tx_power_dbm: 'txPowerDbm',
  rx_callsign: 'rxCallsign',
  rx_locator: 'rxLocator',
  snr_db: 'snrDb',
  frequency_hz: 'frequency',
  drift_hz: 'driftHz',
  distance_km: 'ignore',
  bearing_deg: 'ignore',
  frequency_error_hz: 'ignore',
};

/**
 * Proposes a mapping from the first rows of a file (rows already split into cells; the first may be a header).
 * Notes say in words what could not be decided for sure, so the user checks those columns.
 */
export function proposeMapping(rows: string[][], delimiter: ImportDelimiter): MappingProposal {
  const notes: string[] = [];
  const width = Math.max(0, ...rows.map((r) => r.length));
  const hasHeader = rows.length > 0 && looksLikeHeader(rows[0]);
  const header = hasHeader ? rows[0] : [];
  const body = (hasHeader ? rows.slice(1) : rows).slice(0, 200);
  const samples: ColumnSample[] = Array.from({ length: width }, (_, index) => ({
    index,
    header: (header[index] ?? '').trim() || `column ${index + 1}`,
    values: body.map((r) => r[index] ?? ''),
  }));

  if (hasHeader && isOwnLayout(header)) {
    return {
      mapping: {
        delimiter,
        hasHeader: true,
        columns: samples.map((s) => ({ index: s.index, header: s.header, role: OWN_ROLES[REPORT_CSV_COLUMNS[s.index]] })),
        timeFormat: 'iso',
        frequencyUnit: 'hz',
      },
      notes: ["This is Faintline's own report layout: every column is read as it was written."],
    };
  }
  if (!hasHeader) notes.push('The first line holds values, not column names: columns were judged from their values alone.');

  // 1. Each column's kind from its header words, else from its values; and its side (transmitter or receiver).
  const judged = samples.map((s) => {
    const words = hasHeader ? headerWords(s.header) : [];
    const byWords = kindFromWords(words);
    const kind = byWords ?? (words.length === 0 || !has(words, ...DERIVED_WORDS) ? kindFromValues(s.values) : null);
    return { ...s, words, kind, fromValues: byWords === null && kind !== null, side: sideOf(words) };
  });

  const roles: ImportColumnRole[] = judged.map(() => 'ignore');
  const take = (role: ImportColumnRole, index: number | undefined) => {
    if (index !== undefined && !roles.includes(role)) roles[index] = role;
  };
  const firstOf = (kind: Kind) => judged.filter((j) => j.kind === kind);

  for (const [kind, role] of [
    ['time', 'time'],
    ['band', 'band'],
    ['frequency', 'frequency'],
    ['snr', 'snrDb'],
    ['drift', 'driftHz'],
    ['power', 'txPowerDbm'],
  ] as const) {
    const candidates = firstOf(kind);
    take(role, candidates[0]?.index);
    if (candidates.length > 1)
      notes.push(`Several columns look like the ${ROLE_LABELS[role]}: took "${candidates[0].header}"; check the others.`);
    if (candidates[0]?.fromValues) notes.push(`"${candidates[0].header}" was judged the ${ROLE_LABELS[role]} from its values.`);
  }

  // 2. Callsigns and locators: header sides first, then values, then position.
  const powerIndex = roles.indexOf('txPowerDbm');
  for (const kind of ['callsign', 'locator'] as const) {
    const columns = firstOf(kind);
    const txRole = kind === 'callsign' ? 'txCallsign' : 'txLocator';
    const rxRole = kind === 'callsign' ? 'rxCallsign' : 'rxLocator';
    for (const c of columns) if (c.side) take(c.side === 'tx' ? txRole : rxRole, c.index);
    let open = columns.filter((c) => roles[c.index] === 'ignore');
    if (open.length === 0) continue;
    // An unresolved callsign ("<...>") is only ever the transmitter's.
    const hashed = open.find((c) => c.values.some((v) => v.trim() === '<...>'));
    if (hashed) take(txRole, hashed.index);
    open = open.filter((c) => roles[c.index] === 'ignore');
    // Pair a locator with its neighbouring callsign column's side.
    if (kind === 'locator') {
      for (const c of open) {
        const neighbour = [c.index - 1, c.index + 1].map((i) => roles[i]).find((r) => r === 'txCallsign' || r === 'rxCallsign');
        if (neighbour) take(neighbour === 'txCallsign' ? txRole : rxRole, c.index);
      }
      open = open.filter((c) => roles[c.index] === 'ignore');
    }
    if (open.length === 0) continue;
    // The transmitter's power usually sits beside the transmitter's details; otherwise the first is the transmitter.
    const ordered =
      powerIndex >= 0 && open.length > 1 ? [...open].sort((a, b) => Math.abs(a.index - powerIndex) - Math.abs(b.index - powerIndex)) : open;
    for (const c of ordered) {
      const role = !roles.includes(txRole) ? txRole : !roles.includes(rxRole) ? rxRole : null;
      if (!role) break;
      take(role, c.index);
      notes.push(`Could not tell from "${c.header}" whether it is the transmitter's or the receiver's: took the ${ROLE_LABELS[role]}.`);
    }
  }

  // 3. Formats from the values.
  const timeIndex = roles.indexOf('time');
  let timeFormat: ImportTimeFormat = 'iso';
  if (timeIndex >= 0) {
    const formats = samples[timeIndex].values.map(timeFormatOf).filter((f): f is ImportTimeFormat => f !== null);
    const counts = (['iso', 'date-time', 'epoch-seconds'] as const).map((f) => [f, formats.filter((x) => x === f).length] as const);
    const [format, count] = counts.reduce((a, b) => (b[1] > a[1] ? b : a));
    if (count > 0) timeFormat = format;
    else notes.push(`The values of "${samples[timeIndex].header}" are in no time format Faintline reads; choose the format.`);
  } else notes.push('No column looks like the time of the report: choose one.');

  const freqIndex = roles.indexOf('frequency');
  let frequencyUnit: ImportFrequencyUnit = 'hz';
  if (freqIndex >= 0) {
    const { unit, fit } = frequencyUnitOf(samples[freqIndex].values);
    const words = judged[freqIndex].words;
    frequencyUnit = has(words, 'mhz') ? 'mhz' : has(words, 'khz') ? 'khz' : has(words, 'hz') ? 'hz' : unit;
    if (fit === 0 && samples[freqIndex].values.length > 0)
      notes.push(`The values of "${samples[freqIndex].header}" fall in no amateur band in Hz, kHz or MHz; check the unit.`);
  }

  for (const role of REQUIRED_ROLES) if (!roles.includes(role) && role !== 'time') notes.push(`No column for the ${ROLE_LABELS[role]}.`);
  if (!roles.includes('band') && freqIndex >= 0) notes.push('No band column: the band is worked out from the frequency.');

  return {
    mapping: {
      delimiter,
      hasHeader,
      columns: samples.map((s, i) => ({ index: s.index, header: s.header, role: roles[i] })),
      timeFormat,
      frequencyUnit,
    },
    notes,
  };
}

/** Proposes a mapping from the start of a file as text. */
export function proposeFromText(text: string, complete = false): MappingProposal & { rows: string[][] } {
  const lines = sampleLines(text, complete);
  const delimiter = detectDelimiter(lines);
  const rows = lines.map((line) => splitLine(line, delimiter));
  return { ...proposeMapping(rows, delimiter), rows };
}

/** Roles the mapping lacks, in words ("the time (UTC)"), in the order they matter. */
export function missingRoles(mapping: ImportMapping): ImportColumnRole[] {
  const present = new Set(mapping.columns.map((c) => c.role));
  return REQUIRED_ROLES.filter((role) => !present.has(role));
}

// ---------------------------------------------------------------------------------------------------------------
// Reading rows

/** One mapped row, ready for the shared report schema (the receiver's identity included). */
export type MappedReport = {
  slotUtc: string;
  bandId: string;
  txCallsign: string;
  txLocator: string | null;
  txPowerDbm: number | null;
  rxCallsign: string;
  rxLocator: string;
  snrDb: number;
  frequencyHz: number;
  driftHz: number;
};

export type RowProblem = { column: string; reason: string };
export type RowResult = { ok: true; report: MappedReport } | { ok: false; problem: RowProblem };

const fail = (column: string, reason: string): RowResult => ({ ok: false, problem: { column, reason } });

/**
 * A reader for rows under a mapping: cells in, a report (values converted, not yet checked by the shared schema)
 * or the first problem found. Built once per import; reading a row allocates only the report.
 */
export function createRowReader(mapping: ImportMapping): (cells: string[]) => RowResult {
  const at = (role: ImportColumnRole) => mapping.columns.find((c) => c.role === role);
  const time = at('time');
  const band = at('band');
  const freq = at('frequency');
  const txCall = at('txCallsign');
  const txLoc = at('txLocator');
  const power = at('txPowerDbm');
  const rxCall = at('rxCallsign');
  const rxLoc = at('rxLocator');
  const snr = at('snrDb');
  const drift = at('driftHz');
  const factor = UNIT_FACTOR[mapping.frequencyUnit];
  const unitLabel = { hz: 'Hz', khz: 'kHz', mhz: 'MHz' }[mapping.frequencyUnit];
  const timeExample = { iso: '2026-12-02T10:04:00Z', 'date-time': '2026-12-02 10:04', 'epoch-seconds': '1796205840' }[mapping.timeFormat];
  const cellOf = (cells: string[], column: { index: number } | undefined) => (column ? (cells[column.index] ?? '').trim() : '');

  return (cells) => {
    if (!time) return fail('time', 'No column is read as the time');
    const timeText = cellOf(cells, time);
    if (timeText === '') return fail(time.header, 'The time is empty');
    const ms = readTime(timeText, mapping.timeFormat);
    if (ms === null) return fail(time.header, `"${timeText}" is not a time like ${timeExample}`);

    if (!freq) return fail('frequency', 'No column is read as the frequency');
    const freqText = cellOf(cells, freq);
    const freqValue = readNumber(freqText);
    if (freqValue === null) return fail(freq.header, freqText === '' ? 'The frequency is empty' : `"${freqText}" is not a number`);
    const frequencyHz = Math.round(freqValue * factor * 1000) / 1000;
    const heardBand = bandOfFrequency(frequencyHz);

    let bandId: BandId | null;
    if (band && cellOf(cells, band) !== '') {
      const bandText = cellOf(cells, band);
      bandId = readBand(bandText);
      if (!bandId) return fail(band.header, `"${bandText}" is not a band (use one of ${BAND_IDS.join(', ')})`);
      if (heardBand && heardBand !== bandId)
        return fail(freq.header, `${freqText} ${unitLabel} lies in the ${heardBand} band, not in ${bandId}`);
    } else {
      bandId = heardBand;
      if (!bandId) return fail(freq.header, `${freqText} ${unitLabel} lies in no amateur band (is the unit right?)`);
    }

    const snrText = cellOf(cells, snr);
    const snrDb = readNumber(snrText);
    if (!snr) return fail('snr', 'No column is read as the SNR');
    if (snrDb === null) return fail(snr.header, snrText === '' ? 'The SNR is empty' : `"${snrText}" is not a number of dB`);

    let driftHz = 0;
    if (drift && cellOf(cells, drift) !== '') {
      const d = readNumber(cellOf(cells, drift));
      if (d === null) return fail(drift.header, `"${cellOf(cells, drift)}" is not a number of Hz`);
      driftHz = d;
    }
    let txPowerDbm: number | null = null;
    if (power && cellOf(cells, power) !== '') {
      txPowerDbm = readNumber(cellOf(cells, power));
      if (txPowerDbm === null) return fail(power.header, `"${cellOf(cells, power)}" is not a number of dBm`);
    }
    if (!txCall) return fail('txCallsign', "No column is read as the transmitter's callsign");
    if (!rxCall) return fail('rxCallsign', "No column is read as the receiver's callsign");
    if (!rxLoc) return fail('rxLocator', "No column is read as the receiver's locator");
    const txLocator = cellOf(cells, txLoc);
    return {
      ok: true,
      report: {
        slotUtc: new Date(ms).toISOString(),
        bandId,
        txCallsign: cellOf(cells, txCall),
        txLocator: txLocator === '' ? null : txLocator,
        txPowerDbm,
        rxCallsign: cellOf(cells, rxCall),
        rxLocator: cellOf(cells, rxLoc),
        snrDb,
        frequencyHz,
        driftHz,
      },
    };
  };
}

/** The column header a schema field name belongs to under a mapping (for problems found by the shared schema). */
export function columnOfField(mapping: ImportMapping, field: string): string {
  const role: ImportColumnRole | undefined = (
    {
      slotUtc: 'time',
      bandId: 'band',
      frequencyHz: 'frequency',
      txCallsign: 'txCallsign',
      txLocator: 'txLocator',
      txPowerDbm: 'txPowerDbm',
      rxCallsign: 'rxCallsign',
      rxLocator: 'rxLocator',
      snrDb: 'snrDb',
      driftHz: 'driftHz',
    } as Record<string, ImportColumnRole>
  )[field];
  const column = role ? mapping.columns.find((c) => c.role === role) : undefined;
  return column?.header ?? (role === 'band' ? (mapping.columns.find((c) => c.role === 'frequency')?.header ?? field) : field);
}
