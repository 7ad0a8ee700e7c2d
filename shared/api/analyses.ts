/** Analyses of reception reports across the HTTP boundary: side-by-side comparisons and a club's reach. */
import type { BandId } from '../domain/bands';
import type { ComparisonFigures } from '../domain/reception/comparison';
import type { HourBandCount, ReachReceiver } from './receptions';

export type ComparisonSide = {
  stationId: number;
  name: string;
  callsign: string;
  locator: string;
  from: string;
  to: string;
};

/** GET /api/comparisons: delta = B − A in dB, SNR referred to 1 W. */
export type Comparison = ComparisonFigures & {
  /** 'same-time': pairs within the same UTC hour; 'two-periods': the same UTC hour of day */
  mode: 'same-time' | 'two-periods';
  bandId: BandId;
  a: ComparisonSide;
  b: ComparisonSide;
  /** receivers that heard one side only, beyond the lists given */
  onlyAMore: number;
  onlyBMore: number;
  /** reports left out because they carry no power */
  withoutPower: number;
};

export type ClubStationReach = {
  stationId: number;
  name: string;
  callsign: string;
  locator: string;
  ownerName: string;
  reports: number;
  receivers: number;
  furthestKm: number | null;
};

export type ClubPostHeard = {
  postId: number;
  name: string;
  callsign: string;
  locator: string;
  ownerName: string;
  reports: number;
  transmitters: number;
  furthestKm: number | null;
  bands: BandId[];
};

/** GET /api/clubs/:clubId/reach (club admins). */
export type ClubReach = {
  clubId: number;
  clubName: string;
  from: string;
  to: string;
  /** the map's centre: the first member station with a valid locator, or null when the club has none */
  centre: { callsign: string; locator: string; lat: number; lon: number } | null;
  reports: number;
  receivers: number;
  furthestKm: number | null;
  mapReceivers: ReachReceiver[];
  stations: ClubStationReach[];
  posts: ClubPostHeard[];
  /** reports per UTC hour and band from the members' stations: which bands were open from the club's area */
  hourBand: HourBandCount[];
};
