/** Reception reports across the HTTP boundary: listening posts, ingest, reading, reach and imports. */
import type { BandId } from '../domain/bands';

export type ListeningPost = {
  id: number;
  ownerId: number;
  name: string;
  callsign: string;
  locator: string;
  /** a device token exists (it is shown only once, when issued) */
  hasToken: boolean;
  tokenIssuedAt: string | null;
  lastReportAt: string | null;
  reports: number;
  createdAt: string;
};

export type IssuedToken = { token: string };

export type RejectedReport = { index: number; field: string; message: string };

/** 202 from POST /api/device/v1/receptions: a 202 means stored. */
export type ReceptionIngestResult = { accepted: number; duplicates: number; rejected: RejectedReport[] };

export type ReportSource = { kind: 'listening-post' | 'import'; id: number | null; name: string };

export type ReceptionReport = {
  id: number;
  slotUtc: string;
  bandId: BandId;
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
  /** heard minus the frequency the plan meant for that slot (the tones' centre); null when no plan covers it */
  frequencyErrorHz: number | null;
  stationId: number | null;
  /** two of the owner's stations could have sent it; counted for neither */
  ambiguous: boolean;
  source: ReportSource;
};

export type ReceptionPage = { reports: ReceptionReport[]; total: number; page: number; pageSize: number };

export type ReachReceiver = {
  callsign: string;
  locator: string;
  lat: number;
  lon: number;
  distanceKm: number;
  bearingDeg: number;
  reports: number;
  bestSnrDb: number;
  bands: BandId[];
  lastHeardUtc: string;
};

export type HourBandCount = { hour: number; bandId: BandId; reports: number };

export type Reach = {
  stationId: number;
  from: string;
  to: string;
  bandId: BandId | null;
  station: { callsign: string; locator: string; lat: number; lon: number };
  reports: number;
  receivers: number;
  furthestKm: number | null;
  medianKm: number | null;
  /** share (0–1) of the planned transmissions in the period that at least one receiver decoded; null without a plan */
  heardShare: number | null;
  plannedTransmissions: number;
  heardTransmissions: number;
  bestSnrDb: number | null;
  /** best SNR referred to 1 W */
  bestSnrPerWattDb: number | null;
  kmPerWatt: number | null;
  mapReceivers: ReachReceiver[];
  hourBand: HourBandCount[];
  /** SNR against distance, one point per receiver and band (best SNR) */
  snrByDistance: { distanceKm: number; snrDb: number; bandId: BandId }[];
};

/** The overview's line per station. */
export type StationAtAGlance = {
  stationId: number;
  transmitting: boolean;
  nextTransmission: { startUtc: string; bandId: BandId } | null;
  lastHeard: { slotUtc: string; rxCallsign: string; distanceKm: number | null } | null;
  last24h: { reports: number; receivers: number; furthestKm: number | null };
};

/** How one column of an imported file is read. */
export type ImportColumnRole =
  'ignore' | 'time' | 'band' | 'frequency' | 'txCallsign' | 'txLocator' | 'txPowerDbm' | 'rxCallsign' | 'rxLocator' | 'snrDb' | 'driftHz';

export type ImportTimeFormat = 'iso' | 'date-time' | 'epoch-seconds';
export type ImportFrequencyUnit = 'hz' | 'khz' | 'mhz';

export type ImportMapping = {
  delimiter: ',' | '\t' | ';';
  hasHeader: boolean;
  columns: { index: number; header: string; role: ImportColumnRole }[];
  timeFormat: ImportTimeFormat;
  frequencyUnit: ImportFrequencyUnit;
};

export type ImportPreview = {
  mapping: ImportMapping;
  /** the first rows as they will be read (or why each would be rejected) */
  rows: { rowNumber: number; cells: string[]; report: Record<string, string | number | null> | null; problem: string | null }[];
  /** what the proposal could not decide, in words */
  notes: string[];
};

export type ImportStatus = {
  id: number;
  fileName: string;
  status: 'running' | 'done' | 'failed';
  rowsRead: number;
  imported: number;
  duplicates: number;
  rejected: number;
  bytesRead: number;
  bytesTotal: number;
  error: string | null;
  createdAt: string;
  finishedAt: string | null;
};

export type SavedMapping = { id: number; name: string; mapping: ImportMapping; createdAt: string };
