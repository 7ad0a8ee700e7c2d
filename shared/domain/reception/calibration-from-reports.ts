/**
 * Calibration from what receivers heard. Each stored report carries frequencyErrorHz: the heard frequency minus the
 * centre of the four tones the plan meant (dial + staggered audio offset + 1.5 tone spacings), before any correction.
 * A device commands carrier − calibrationOffsetHz, so what it radiates is off by (true offset − current offset):
 * the heard error is what the current correction still misses, and the proposal is current + median error
 * (positive = the station radiates high, the sign of calibrationOffsetHz).
 */
import { checkTonesInWindow, toneFrequenciesHz, type WindowCheck } from '../tones';
import { interquartileRange, median } from './statistics';

/** Fewer reports or receivers than this give no proposal (issue 14). */
export const MIN_REPORTS = 10;
export const MIN_RECEIVERS = 3;
/** Receivers disagree when the middle half of the reports spans more than this (our rule). */
export const DISAGREE_SPREAD_HZ = 5;
/** …or when two receivers' own medians lie further apart than this (our rule). */
export const DISAGREE_RECEIVERS_HZ = 10;

export type HeardError = { rxCallsign: string; frequencyErrorHz: number };

export type BandCalibrationFromReports = {
  bandId: string;
  reports: number;
  receivers: number;
  /** the median heard error, Hz (positive = heard high); null with too few reports or receivers */
  medianErrorHz: number | null;
  /** interquartile range of the heard errors, Hz */
  spreadHz: number | null;
  currentOffsetHz: number | null;
  proposedOffsetHz: number | null;
  enough: boolean;
  /** why there is no number, in words */
  reason: string | null;
  /** why the number may not be trustworthy, in words */
  warning: string | null;
};

const round2 = (hz: number) => Math.round(hz * 100) / 100;
const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The proposal for one band from its reports' heard errors. */
export function calibrationFromReports(
  bandId: string,
  currentOffsetHz: number | null,
  heard: readonly HeardError[],
): BandCalibrationFromReports {
  const byReceiver = new Map<string, number[]>();
  for (const h of heard) byReceiver.set(h.rxCallsign, [...(byReceiver.get(h.rxCallsign) ?? []), h.frequencyErrorHz]);
  const reports = heard.length;
  const receivers = byReceiver.size;
  const base = { bandId, reports, receivers, currentOffsetHz };
  if (reports < MIN_REPORTS || receivers < MIN_RECEIVERS) {
    return {
      ...base,
      medianErrorHz: null,
      spreadHz: null,
      proposedOffsetHz: null,
      enough: false,
      warning: null,
      reason:
        `too few reports: ${reports} of ${MIN_REPORTS} from ${receivers} of ${MIN_RECEIVERS} receivers. ` +
        `Faintline proposes an offset from at least ${plural(MIN_REPORTS, 'report', 'reports')} by at least ${MIN_RECEIVERS} different receivers.`,
    };
  }
  const errors = heard.map((h) => h.frequencyErrorHz);
  const medianErrorHz = median(errors);
  const spreadHz = interquartileRange(errors);
  const receiverMedians = [...byReceiver.entries()].map(([rx, values]) => ({ rx, medianHz: median(values) }));
  const lowest = receiverMedians.reduce((a, b) => (b.medianHz < a.medianHz ? b : a));
  const highest = receiverMedians.reduce((a, b) => (b.medianHz > a.medianHz ? b : a));
  const warnings: string[] = [];
  if (spreadHz > DISAGREE_SPREAD_HZ) {
    warnings.push(`the middle half of the reports spreads over ${spreadHz.toFixed(1)} Hz (more than ${DISAGREE_SPREAD_HZ} Hz)`);
  }
  if (highest.medianHz - lowest.medianHz > DISAGREE_RECEIVERS_HZ) {
    warnings.push(
      `${lowest.rx} hears you ${(highest.medianHz - lowest.medianHz).toFixed(1)} Hz lower than ${highest.rx} does (more than ${DISAGREE_RECEIVERS_HZ} Hz apart)`,
    );
  }
  return {
    ...base,
    medianErrorHz: round2(medianErrorHz),
    spreadHz: round2(spreadHz),
    proposedOffsetHz: round2((currentOffsetHz ?? 0) + medianErrorHz),
    enough: true,
    reason: null,
    warning: warnings.length
      ? `Receivers disagree: ${warnings.join('; ')}. Some receivers are off themselves; check the proposal before applying it.`
      : null,
  };
}

/** Where the four tones were heard on average: the planned carrier moved by the median heard error. */
export function heardWindow(dialHz: number, plannedCarrierHz: number, medianErrorHz: number): WindowCheck {
  return checkTonesInWindow(dialHz, toneFrequenciesHz(plannedCarrierHz + medianErrorHz));
}

/** "Heard off frequency" fires when a tone is heard this close to (or beyond) a window edge (issue 14). */
export const OFF_FREQUENCY_MARGIN_HZ = 10;
