import type { ActiveHoursUtc, Cadence } from '@/shared/domain/schedule';
import type { BandId } from '@/shared/domain';
import { regionLabels } from '@/shared/schemas';

import { bandName, cadenceLabel, hoursLabel } from '../schedules/schedule-words';
import { formatMHz, formatOffsetHz, formatSigned, formatUtcDateTime, formatValue } from '../ui/format';

/** One changed thing of a logged change, in words: "Audio offset: 1500 Hz → 1520 Hz". */
export type ChangeLine = { label: string; before: string | null; after: string | null };

type Entry = { action: string; before: unknown; after: unknown };
type Fields = Record<string, unknown>;

const isFields = (value: unknown): value is Fields => !!value && typeof value === 'object' && !Array.isArray(value);
const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
const num = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value);

/** How each known field reads: its label and its value in words. */
const fieldWords: Record<string, { label: string; text: (value: unknown) => string }> = {
  name: { label: 'Name', text: (v) => plain(v) },
  callsign: { label: 'Callsign', text: (v) => plain(v) },
  locator: { label: 'Locator', text: (v) => plain(v) },
  notes: { label: 'Notes', text: (v) => plain(v) },
  displayName: { label: 'Name', text: (v) => plain(v) },
  email: { label: 'E-mail', text: (v) => plain(v) },
  unitId: { label: 'Unit', text: (v) => (num(v) ? `unit no. ${v}` : 'no unit') },
  region: { label: 'Licence region', text: (v) => regionLabels[v as keyof typeof regionLabels] ?? plain(v) },
  audioOffsetHz: { label: 'Audio offset', text: (v) => (num(v) ? formatOffsetHz(v) : plain(v)) },
  transmitEnabled: { label: 'Transmitting', text: (v) => (v ? 'on' : 'off') },
  enabled: { label: 'Band', text: (v) => (v ? 'enabled' : 'disabled') },
  bandId: { label: 'Band', text: (v) => bandName(v as BandId) },
  calibrationOffsetHz: { label: 'Calibration offset', text: (v) => (num(v) ? formatSigned(v, 1, 'Hz') : 'not calibrated') },
  calibrationSource: {
    label: 'Calibration',
    text: (v) => (v === 'measured' ? 'measured' : v === 'typed' ? 'typed in' : v === 'reports' ? 'from reports' : 'none'),
  },
  calibratedAt: { label: 'Calibrated', text: (v) => (typeof v === 'string' ? formatUtcDateTime(v) : 'never') },
  referenceErrorPpm: { label: 'Reference error', text: (v) => (num(v) ? formatSigned(v, 2, 'ppm') : 'not given') },
  maxPowerDbm: { label: 'Power limit', text: (v) => (num(v) ? formatValue(v, 0, 'dBm') : plain(v)) },
  role: { label: 'Role', text: (v) => (v === 'admin' ? 'admin' : 'member') },
  suspended: { label: 'Station', text: (v) => (v ? 'suspended' : 'not suspended') },
  reason: { label: 'Reason', text: (v) => plain(v) },
  model: { label: 'Device', text: (v) => plain(v) },
  firmware: { label: 'Firmware', text: (v) => plain(v) },
  // units
  serialLabel: { label: 'Serial label', text: (v) => plain(v) },
  controller: { label: 'Controller', text: (v) => plain(v) },
  timeSource: { label: 'Time source', text: (v) => plain(v) },
  generatorKind: { label: 'Generator', text: (v) => plain(v) },
  referenceHz: { label: 'Reference', text: (v) => (num(v) ? formatMHz(v) : plain(v)) },
  tolerancePpm: { label: 'Tolerance', text: (v) => (num(v) ? `±${formatValue(v, 1, 'ppm')}` : plain(v)) },
  tempCoPpmPerC: { label: 'Temperature coefficient', text: (v) => (num(v) ? formatValue(v, 2, 'ppm/°C') : 'not given') },
  disciplined: { label: 'Disciplined reference', text: (v) => (v ? 'yes' : 'no') },
  generatorLevelDbm: { label: 'Generator level', text: (v) => (num(v) ? formatValue(v, 1, 'dBm') : plain(v)) },
  attenuatorDb: { label: 'Attenuator', text: (v) => (num(v) ? formatValue(v, 1, 'dB') : plain(v)) },
  amplifier: { label: 'Amplifier', text: (v) => (isFields(v) ? fieldList(v) : 'none') },
  filters: { label: 'Low-pass filters', text: (v) => filtersText(v) },
  filterSelection: { label: 'Filter selection', text: (v) => plain(v) },
  fittedFilter: { label: 'Fitted filter', text: (v) => (isFields(v) && num(v.index) ? `filter no. ${v.index + 1}` : 'none') },
  antenna: { label: 'Antenna', text: (v) => antennaText(v) },
  // schedules
  steps: { label: 'Rotation', text: (v) => stepsText(v) },
  cadence: { label: 'How often', text: (v) => (isFields(v) && typeof v.kind === 'string' ? cadenceLabel(v as Cadence) : plain(v)) },
  stagger: { label: 'Stagger', text: (v) => staggerText(v) },
  startDate: { label: 'Starts', text: (v) => plain(v) },
  endDate: { label: 'Ends', text: (v) => (typeof v === 'string' && v ? v : 'no end date') },
  paused: { label: 'Schedule', text: (v) => (v ? 'paused' : 'running') },
};

/** Bookkeeping fields a reader never needs to see. */
const hiddenFields = new Set(['id', 'stationId', 'ownerId', 'clubId', 'createdAt', 'updatedAt']);

/**
 * The changes of one logged action, in words. Each action kind has its own reading; an
 * unknown kind still reads field by field, with labels made from the field names.
 */
export function describeChange(entry: Entry): ChangeLine[] {
  const special = specialReadings[entry.action];
  if (special) return special(entry);
  return fieldChanges(entry.before, entry.after);
}

const specialReadings: Record<string, (entry: Entry) => ChangeLine[]> = {
  'schedule.create': ({ after }) => scheduleLines(null, after),
  'schedule.update': ({ before, after }) => scheduleLines(before, after),
  'schedule.delete': ({ before }) => scheduleLines(before, null),
  'calibration.save': ({ before, after }) => calibrationLines(before, after),
  'band.update': ({ before, after }) => fieldChanges(without(before, 'bandId'), without(after, 'bandId')),
  'sessions.end-others': () => [],
  'photo.add': () => [],
  'photo.delete': () => [],
};

/** Changed fields, one line each; fields present on one side only read "—" on the other. */
export function fieldChanges(before: unknown, after: unknown): ChangeLine[] {
  if (!isFields(before) && !isFields(after)) {
    if (before == null && after == null) return [];
    if (same(before, after)) return [];
    return [{ label: 'Value', before: before == null ? null : valueText(before), after: after == null ? null : valueText(after) }];
  }
  const a = isFields(before) ? before : null;
  const b = isFields(after) ? after : null;
  const keys = [...new Set([...Object.keys(a ?? {}), ...Object.keys(b ?? {})])].filter((key) => !hiddenFields.has(key));
  const empty = (value: unknown) => value === undefined || value === null || value === '';
  return keys
    .filter((key) => (a && b ? !same(a[key], b[key]) : !empty((a ?? b)?.[key])))
    .map((key) => {
      const words = fieldWords[key];
      const text = (value: unknown) => (words ? words.text(value) : valueText(value));
      return {
        label: words?.label ?? labelFromKey(key),
        before: a && key in a ? text(a[key]) : null,
        after: b && key in b ? text(b[key]) : null,
      };
    });
}

/** A schedule reads as one rotation line ("20 m for 1 slot, every 3rd slot") plus what else changed. */
function scheduleLines(before: unknown, after: unknown): ChangeLine[] {
  const rotation = (value: unknown) => (isFields(value) ? `${stepsText(value.steps)}, ${fieldWords.cadence.text(value.cadence)}` : null);
  const lines: ChangeLine[] = [];
  const rotationBefore = rotation(before);
  const rotationAfter = rotation(after);
  if (rotationBefore !== rotationAfter) lines.push({ label: 'Schedule', before: rotationBefore, after: rotationAfter });
  const rest = (value: unknown) => without(value, 'steps', 'cadence');
  return [...lines, ...fieldChanges(rest(before), rest(after))];
}

function without(value: unknown, ...keys: string[]): unknown {
  if (!isFields(value)) return value;
  return Object.fromEntries(Object.entries(value).filter(([key]) => !keys.includes(key)));
}

/** Calibration: one line per band whose offset was saved, with the offset it replaced. */
function calibrationLines(before: unknown, after: unknown): ChangeLine[] {
  const previous = new Map<string, unknown>();
  if (Array.isArray(before)) for (const row of before) if (isFields(row)) previous.set(String(row.bandId), row.calibrationOffsetHz);
  const offsets = isFields(after) && Array.isArray(after.offsets) ? after.offsets.filter(isFields) : [];
  const lines: ChangeLine[] = offsets.map((row) => ({
    label: `Calibration on ${bandName(row.bandId as BandId)}`,
    before: fieldWords.calibrationOffsetHz.text(previous.get(String(row.bandId)) ?? null),
    after: fieldWords.calibrationOffsetHz.text(row.calibrationOffsetHz),
  }));
  if (isFields(after) && num(after.referenceErrorPpm)) {
    lines.push({ label: 'Reference error', before: null, after: fieldWords.referenceErrorPpm.text(after.referenceErrorPpm) });
  }
  return lines;
}

function stepsText(value: unknown): string {
  if (!Array.isArray(value) || value.length === 0) return 'no bands';
  return value
    .filter(isFields)
    .map((step) => {
      const slots = num(step.slots) ? step.slots : 1;
      const hours = isFields(step.activeHoursUtc) ? ` (${hoursLabel(step.activeHoursUtc as ActiveHoursUtc)})` : '';
      return `${bandName(step.bandId as BandId)} for ${slots} slot${slots === 1 ? '' : 's'}${hours}`;
    })
    .join(', then ');
}

function staggerText(value: unknown): string {
  if (!isFields(value) || !num(value.stepHz) || !num(value.spanHz) || value.stepHz === 0 || value.spanHz === 0) return 'none';
  return `${formatOffsetHz(value.stepHz)} steps within ${formatOffsetHz(value.spanHz)}`;
}

function filtersText(value: unknown): string {
  if (!Array.isArray(value) || value.length === 0) return 'none';
  return value
    .filter(isFields)
    .map((filter) => {
      const bands = Array.isArray(filter.bands) ? filter.bands.map((id) => bandName(id as BandId)).join(' and ') : '?';
      return `${bands}: cut-off ${num(filter.cutoffHz) ? formatMHz(filter.cutoffHz, 3) : '?'}`;
    })
    .join('; ');
}

function antennaText(value: unknown): string {
  if (!isFields(value)) return 'none';
  const bands =
    Array.isArray(value.bands) && value.bands.length ? ` for ${value.bands.map((id) => bandName(id as BandId)).join(', ')}` : '';
  const gain = num(value.gainDbi) ? `, ${formatValue(value.gainDbi, 2, 'dBi')}` : '';
  return `${plain(value.kind)}${bands}${gain}`;
}

function fieldList(value: Fields): string {
  return Object.entries(value)
    .filter(([key]) => !hiddenFields.has(key))
    .map(([key, item]) => `${(fieldWords[key]?.label ?? labelFromKey(key)).toLowerCase()} ${valueText(item)}`)
    .join(', ');
}

/** A value of an unknown field in words: never JSON. */
function valueText(value: unknown): string {
  if (value === undefined || value === null || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'number') return String(value).replace('-', '\u2212');
  if (typeof value === 'string') return plain(value);
  if (Array.isArray(value)) return value.length ? value.map(valueText).join(', ') : 'none';
  if (isFields(value)) return fieldList(value) || '—';
  return '—';
}

function plain(value: unknown): string {
  if (value === undefined || value === null || value === '') return '—';
  const text = String(value);
  return text.length > 80 ? `${text.slice(0, 77)}…` : text;
}

/** "maxPowerDbm" → "Max power dbm"; "serial_label" → "Serial label". */
export function labelFromKey(key: string): string {
  const words = key
    .replace(/[_-]+/g, ' ')
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .trim()
    .toLowerCase();
  return words ? words[0].toUpperCase() + words.slice(1) : 'Value';
}
