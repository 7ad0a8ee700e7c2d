/**
 * Amateur bands 2200 m … 2 m with the conventional WSPR dial frequencies and
 * their 200 Hz receive windows (dial + 1400 … 1600 Hz). Every value names its
 * source; "(from memory)" marks values not yet checked against a published
 * band plan — confirm them before relying on them for legality.
 */
import { refuse, type Result } from './result';
import { WINDOW_HIGH_OFFSET_HZ, WINDOW_LOW_OFFSET_HZ } from './tones';

/** ITU Radio Regulations regions: 1 Europe/Africa/Middle East, 2 the Americas, 3 Asia-Pacific. */
export type LicenceRegion = 'itu1' | 'itu2' | 'itu3';
export const LICENCE_REGIONS: readonly LicenceRegion[] = ['itu1', 'itu2', 'itu3'];

export type BandId = '2200m' | '630m' | '160m' | '80m' | '60m' | '40m' | '30m' | '20m' | '17m' | '15m' | '12m' | '10m' | '6m' | '4m' | '2m';

type Sourced<T> = { value: T; source: string };
type BandEntry = {
  id: BandId;
  name: string;
  dialHz: Sourced<number>;
  /** regional dial frequencies where they differ; null = no allocation in that region */
  regionalDialHz?: Partial<Record<LicenceRegion, Sourced<number> | null>>;
  edgesHz: Sourced<[number, number]>;
  regionalEdgesHz?: Partial<Record<LicenceRegion, Sourced<[number, number]>>>;
};

const DIAL_SOURCE = 'the conventional WSPR dial frequency (a common-practice figure)';
const ITU_SOURCE = 'ITU Radio Regulations, Article 5 (Table of Frequency Allocations); check your licence for your own edges';
const dial = (value: number): Sourced<number> => ({ value, source: DIAL_SOURCE });
const edges = (low: number, high: number, source = ITU_SOURCE): Sourced<[number, number]> => ({ value: [low, high], source });

export const BAND_TABLE: readonly BandEntry[] = [
  { id: '2200m', name: '2200 m', dialHz: dial(136_000), edgesHz: edges(135_700, 137_800) },
  { id: '630m', name: '630 m', dialHz: dial(474_200), edgesHz: edges(472_000, 479_000) },
  {
    id: '160m',
    name: '160 m',
    dialHz: dial(1_836_600),
    edgesHz: edges(1_800_000, 2_000_000),
    regionalEdgesHz: { itu1: edges(1_810_000, 2_000_000) },
  },
  {
    id: '80m',
    name: '80 m',
    dialHz: dial(3_568_600),
    edgesHz: edges(3_500_000, 4_000_000),
    regionalEdgesHz: { itu1: edges(3_500_000, 3_800_000), itu3: edges(3_500_000, 3_900_000) },
  },
  {
    id: '60m',
    name: '60 m',
    dialHz: dial(5_287_200),
    regionalDialHz: {
      itu1: {
        value: 5_364_700,
        source:
          'WSPR dial inside the WRC-15 allocation 5351.5–5366.5 kHz used by most Region 1 administrations (a common-practice figure; some regions use 5.364 700 MHz)',
      },
    },
    edgesHz: edges(5_250_000, 5_450_000, '60 m is allocated nationally; these outer edges are indicative only: check your licence'),
    regionalEdgesHz: { itu1: edges(5_351_500, 5_366_500, 'WRC-15 secondary allocation (Final Acts of WRC-15); check your licence') },
  },
  {
    id: '40m',
    name: '40 m',
    dialHz: dial(7_038_600),
    edgesHz: edges(7_000_000, 7_200_000),
    regionalEdgesHz: { itu2: edges(7_000_000, 7_300_000) },
  },
  { id: '30m', name: '30 m', dialHz: dial(10_138_700), edgesHz: edges(10_100_000, 10_150_000) },
  { id: '20m', name: '20 m', dialHz: dial(14_095_600), edgesHz: edges(14_000_000, 14_350_000) },
  { id: '17m', name: '17 m', dialHz: dial(18_104_600), edgesHz: edges(18_068_000, 18_168_000) },
  { id: '15m', name: '15 m', dialHz: dial(21_094_600), edgesHz: edges(21_000_000, 21_450_000) },
  { id: '12m', name: '12 m', dialHz: dial(24_924_600), edgesHz: edges(24_890_000, 24_990_000) },
  { id: '10m', name: '10 m', dialHz: dial(28_124_600), edgesHz: edges(28_000_000, 29_700_000) },
  {
    id: '6m',
    name: '6 m',
    dialHz: dial(50_293_000),
    edgesHz: edges(50_000_000, 54_000_000),
    regionalEdgesHz: { itu1: edges(50_000_000, 52_000_000, 'Region 1 after WRC-19 (many administrations 50–52 MHz; check your licence)') },
  },
  {
    id: '4m',
    name: '4 m',
    dialHz: dial(70_091_000),
    regionalDialHz: {
      itu2: null,
      itu3: null,
    },
    edgesHz: edges(70_000_000, 70_500_000, 'national allocations in parts of Region 1 only: check your licence'),
  },
  {
    id: '2m',
    name: '2 m',
    dialHz: dial(144_489_000),
    edgesHz: edges(144_000_000, 148_000_000),
    regionalEdgesHz: { itu1: edges(144_000_000, 146_000_000) },
  },
];

export type Band = {
  id: BandId;
  name: string;
  region: LicenceRegion;
  dialHz: number;
  /** receive window: dial + 1400 … 1600 Hz */
  windowLowHz: number;
  windowHighHz: number;
  bandLowHz: number;
  bandHighHz: number;
  dialSource: string;
  edgesSource: string;
};

export const BAND_IDS: readonly BandId[] = BAND_TABLE.map((b) => b.id);

export function isBandId(text: string): text is BandId {
  return (BAND_IDS as readonly string[]).includes(text);
}

/** The band as used in a licence region, or a reason it has no WSPR frequency there. */
export function bandFor(id: string, region: LicenceRegion = 'itu1'): Result<{ band: Band }> {
  const entry = BAND_TABLE.find((b) => b.id === id.trim().toLowerCase().replace(/\s+/g, ''));
  if (!entry) return refuse(`Unknown band '${id}': use one of ${BAND_IDS.join(', ')}.`);
  const regional = entry.regionalDialHz?.[region];
  if (regional === null) return refuse(`${entry.name} has no amateur allocation in ${region.toUpperCase()} (check your licence).`);
  const dialHz = regional ?? entry.dialHz;
  const bandEdges = entry.regionalEdgesHz?.[region] ?? entry.edgesHz;
  return {
    ok: true,
    band: {
      id: entry.id,
      name: entry.name,
      region,
      dialHz: dialHz.value,
      windowLowHz: dialHz.value + WINDOW_LOW_OFFSET_HZ,
      windowHighHz: dialHz.value + WINDOW_HIGH_OFFSET_HZ,
      bandLowHz: bandEdges.value[0],
      bandHighHz: bandEdges.value[1],
      dialSource: dialHz.source,
      edgesSource: bandEdges.source,
    },
  };
}

/** Every band with a WSPR frequency in the region, lowest first. */
export function bandsFor(region: LicenceRegion = 'itu1'): Band[] {
  return BAND_TABLE.flatMap((entry) => {
    const r = bandFor(entry.id, region);
    return r.ok ? [r.band] : [];
  });
}

/** The band whose edges contain a frequency, if any. */
export function bandContaining(frequencyHz: number, region: LicenceRegion = 'itu1'): Band | undefined {
  return bandsFor(region).find((b) => frequencyHz >= b.bandLowHz && frequencyHz <= b.bandHighHz);
}
