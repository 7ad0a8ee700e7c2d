/**
 * Faintline's own CSV of reception reports: what the export writes and what an import reads back with no
 * mapping step. One header line, comma-separated, times ISO 8601 UTC, frequencies in Hz.
 */
export const REPORT_CSV_COLUMNS = [
  'slot_utc',
  'band',
  'tx_callsign',
  'tx_locator',
  'tx_power_dbm',
  'rx_callsign',
  'rx_locator',
  'snr_db',
  'frequency_hz',
  'drift_hz',
  'distance_km',
  'bearing_deg',
  'frequency_error_hz',
] as const;

export type ReportCsvRow = {
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
  distanceKm: number | null;
  bearingDeg: number | null;
  frequencyErrorHz: number | null;
};

const cell = (value: string | number | null) => (value === null ? '' : String(value));
const rounded = (value: number | null, digits: number) => (value === null ? null : Number(value.toFixed(digits)));

/** One CSV line (no line break) for a report; callsigns, locators and numbers never need quoting. */
export function reportCsvLine(r: ReportCsvRow): string {
  return [
    r.slotUtc,
    r.bandId,
    r.txCallsign,
    r.txLocator,
    r.txPowerDbm,
    r.rxCallsign,
    r.rxLocator,
    r.snrDb,
    r.frequencyHz,
    r.driftHz,
    rounded(r.distanceKm, 1),
    rounded(r.bearingDeg, 1),
    rounded(r.frequencyErrorHz, 1),
  ]
    .map(cell)
    .join(',');
}

export const REPORT_CSV_HEADER = REPORT_CSV_COLUMNS.join(',');
