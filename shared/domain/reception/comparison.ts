/**
 * Side-by-side comparison of two stations (or one station in two periods) on common ground only: the same receiver
 * within the same UTC hour (or, for two periods, the same UTC hour of day), SNR referred to 1 W. Each paired
 * receiver-hour gives one difference B − A; the centre and its 95 % interval come from the Hodges–Lehmann estimate with
 * the Wilcoxon signed-rank interval (Hollander & Wolfe, see signed-rank.ts), overall, per bearing sector and per
 * distance band. The verdict says no more than the numbers do.
 */
import { hodgesLehmann } from './signed-rank';

/** Below this many paired receiver-hours a group gets "too few to say", never a number. */
export const MIN_PAIRS = 10;
/** The verdict names at most this many directions (those with the most pairs). */
export const VERDICT_SECTORS = 3;

/** One side's reports of one receiver in one hour: their count and mean SNR per watt, with the receiver's path from the station. */
export type SideCell = {
  rxCallsign: string;
  rxLocator: string;
  /** the UTC hour (hours since an epoch) when comparing at the same time; the UTC hour of day (0–23) for two periods */
  hourKey: number;
  reports: number;
  snrWattDb: number;
  distanceKm: number | null;
  bearingDeg: number | null;
};

export const SECTORS = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'] as const;
export type Sector = (typeof SECTORS)[number];
export const SECTOR_WORDS: Record<Sector, string> = {
  N: 'north',
  NE: 'north-east',
  E: 'east',
  SE: 'south-east',
  S: 'south',
  SW: 'south-west',
  W: 'west',
  NW: 'north-west',
};

/** The eight 45° sectors centred on the compass points (N is 337.5° up to 22.5°). */
export function sectorOf(bearingDeg: number): Sector {
  const normalized = ((bearingDeg % 360) + 360) % 360;
  return SECTORS[Math.floor((normalized + 22.5) / 45) % 8];
}

/** Distance bands in km: [from, to); digit groups joined by a narrow no-break space, so a number never breaks. */
export const DISTANCE_BANDS = [
  { key: '0-500', fromKm: 0, toKm: 500, words: 'under 500 km' },
  { key: '500-1500', fromKm: 500, toKm: 1500, words: '500 to 1\u202f500 km' },
  { key: '1500-3000', fromKm: 1500, toKm: 3000, words: '1\u202f500 to 3\u202f000 km' },
  { key: '3000-6000', fromKm: 3000, toKm: 6000, words: '3\u202f000 to 6\u202f000 km' },
  { key: '6000+', fromKm: 6000, toKm: Infinity, words: 'over 6\u202f000 km' },
] as const;

export type GroupFigures = {
  key: string;
  words: string;
  pairs: number;
  reports: number;
  /** null when there are fewer than MIN_PAIRS pairs */
  medianDeltaDb: number | null;
  ci95: [number, number] | null;
  enough: boolean;
};

export type OneSideReceiver = { rxCallsign: string; rxLocator: string; reports: number; distanceKm: number | null };

export type ComparisonFigures = {
  commonReceivers: number;
  commonReports: number;
  /** paired receiver-hours: the n behind the figures */
  pairs: number;
  medianDeltaDb: number | null;
  ci95: [number, number] | null;
  enough: boolean;
  bySector: GroupFigures[];
  byDistance: GroupFigures[];
  onlyA: OneSideReceiver[];
  onlyB: OneSideReceiver[];
  verdict: string;
};

type Pair = { deltaDb: number; reports: number; rxCallsign: string; distanceKm: number | null; bearingDeg: number | null };

/** Pairs each receiver-hour heard by both sides: B − A in dB per watt. */
export function pairCells(a: SideCell[], b: SideCell[]): Pair[] {
  const bByKey = new Map(b.map((cell) => [`${cell.rxCallsign}|${cell.hourKey}`, cell]));
  const pairs: Pair[] = [];
  for (const cellA of a) {
    const cellB = bByKey.get(`${cellA.rxCallsign}|${cellA.hourKey}`);
    if (!cellB) continue;
    pairs.push({
      deltaDb: cellB.snrWattDb - cellA.snrWattDb,
      reports: cellA.reports + cellB.reports,
      rxCallsign: cellA.rxCallsign,
      distanceKm: cellA.distanceKm ?? cellB.distanceKm,
      bearingDeg: cellA.bearingDeg ?? cellB.bearingDeg,
    });
  }
  return pairs;
}

function groupFigures(key: string, words: string, pairs: Pair[]): GroupFigures {
  const reports = pairs.reduce((sum, p) => sum + p.reports, 0);
  const enough = pairs.length >= MIN_PAIRS;
  const found = enough ? hodgesLehmann(pairs.map((p) => p.deltaDb)) : null;
  return { key, words, pairs: pairs.length, reports, medianDeltaDb: found?.estimate ?? null, ci95: found?.ci95 ?? null, enough };
}

function onlyOneSide(side: SideCell[], other: SideCell[]): OneSideReceiver[] {
  const heardOther = new Set(other.map((c) => c.rxCallsign));
  const byReceiver = new Map<string, OneSideReceiver>();
  for (const cell of side) {
    if (heardOther.has(cell.rxCallsign)) continue;
    const seen = byReceiver.get(cell.rxCallsign);
    if (seen) seen.reports += cell.reports;
    else
      byReceiver.set(cell.rxCallsign, {
        rxCallsign: cell.rxCallsign,
        rxLocator: cell.rxLocator,
        reports: cell.reports,
        distanceKm: cell.distanceKm,
      });
  }
  return [...byReceiver.values()].sort((x, y) => y.reports - x.reports || x.rxCallsign.localeCompare(y.rxCallsign));
}

/** One decimal, a real minus sign. */
export const formatDb = (value: number) => {
  const text = Math.abs(value).toFixed(1);
  return value < 0 && text !== '0.0' ? `\u2212${text}` : text;
};

/** "B is 3.1 dB stronger (2.4 to 3.8 dB)", "B is 2.0 dB weaker (…)" or "no clear difference (−0.8 to 1.2 dB)". */
export function differenceWords(estimate: number, ci95: [number, number] | null): string {
  if (!ci95 || (ci95[0] <= 0 && ci95[1] >= 0)) {
    return ci95 ? `no clear difference (B \u2212 A between ${formatDb(ci95[0])} and ${formatDb(ci95[1])} dB)` : 'no clear difference';
  }
  if (estimate > 0) return `B is ${formatDb(estimate)} dB stronger (${formatDb(ci95[0])} to ${formatDb(ci95[1])} dB)`;
  return `B is ${formatDb(-estimate)} dB weaker (${formatDb(-ci95[1])} to ${formatDb(-ci95[0])} dB)`;
}

const joinWords = (items: string[]) =>
  items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
const capitalised = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

export function verdictOf(overall: GroupFigures, bySector: GroupFigures[], commonReceivers: number): string {
  const reports = `${overall.reports} common report${overall.reports === 1 ? '' : 's'}`;
  if (!overall.enough || overall.medianDeltaDb === null) {
    return (
      `Too few to say: ${overall.pairs} receiver-hour${overall.pairs === 1 ? '' : 's'} heard both (${reports} from ${commonReceivers} ` +
      `receiver${commonReceivers === 1 ? '' : 's'}); at least ${MIN_PAIRS} are needed. Try a longer period or another band.`
    );
  }
  const sentences = [`${capitalised(differenceWords(overall.medianDeltaDb, overall.ci95))}, from ${reports}.`];
  // the best-supported directions only (most pairs, in compass order): the table holds the rest
  const supported = bySector.filter((s) => s.enough && s.medianDeltaDb !== null);
  const shown = new Set([...supported].sort((x, y) => y.pairs - x.pairs).slice(0, VERDICT_SECTORS));
  const clauses = supported.filter((s) => shown.has(s)).map((s) => `${differenceWords(s.medianDeltaDb!, s.ci95)} towards the ${s.words}`);
  const tooFew = bySector.filter((s) => !s.enough && s.pairs > 0).map((s) => s.words);
  if (tooFew.length) clauses.push(`too few towards the ${joinWords(tooFew)} to say`);
  if (clauses.length) sentences.push(`By direction: ${clauses.join('; ')}.`);
  const more = supported.length - shown.size;
  if (more > 0) sentences.push(`${more} more direction${more === 1 ? '' : 's'} in the table by direction.`);
  return sentences.join(' ');
}

/** Everything the comparison shows, from both sides' receiver-hour cells. */
export function compareCells(a: SideCell[], b: SideCell[]): ComparisonFigures {
  const pairs = pairCells(a, b);
  const overall = groupFigures('all', 'all directions', pairs);
  const bySector = SECTORS.map((sector) =>
    groupFigures(
      sector,
      SECTOR_WORDS[sector],
      pairs.filter((p) => p.bearingDeg !== null && sectorOf(p.bearingDeg) === sector),
    ),
  );
  const byDistance = DISTANCE_BANDS.map((band) =>
    groupFigures(
      band.key,
      band.words,
      pairs.filter((p) => p.distanceKm !== null && p.distanceKm >= band.fromKm && p.distanceKm < band.toKm),
    ),
  );
  const commonReceivers = new Set(pairs.map((p) => p.rxCallsign)).size;
  return {
    commonReceivers,
    commonReports: overall.reports,
    pairs: pairs.length,
    medianDeltaDb: overall.medianDeltaDb,
    ci95: overall.ci95,
    enough: overall.enough,
    bySector,
    byDistance,
    onlyA: onlyOneSide(a, b),
    onlyB: onlyOneSide(b, a),
    verdict: verdictOf(overall, bySector, commonReceivers),
  };
}
