/**
 * Everything a station puts on one band, computed from its unit and settings: the one
 * function the screens, the configuration export and the device API share.
 */
import { bandFor, type Band, type BandId, type LicenceRegion } from '../bands';
import { commandForBand, thermalDriftHz, type BandCommand } from '../calibration';
import { attenuationDb, FILTER_KINDS, type FilterKind } from '../filters';
import { chainOutput, dbmToMw, type PowerChainResult } from '../power';
import { planSynth, type SynthPlan } from '../synth';
import { checkTonesInWindow, toneFrequenciesHz, type WindowCheck } from '../tones';
import { encodeMessage } from '../wspr/encode';
import { planMessages } from '../wspr/message-plan';
import type { Coverage } from './coverage';
import { selectFilter, type FilterChoice, type FilterSelection, type SelectableFilter } from './filter-selection';
import { spuriousRequirement, type SpuriousLimit } from './spurious';

export type UnitHardware = {
  generatorKind: 'pll' | 'dds' | 'other';
  referenceHz: number;
  tolerancePpm: number;
  tempCoPpmPerC: number | null;
  disciplined: boolean;
  generatorLevelDbm: number;
  attenuatorDb: number;
  amplifier: { gainDb: number; saturatedDbm: number } | null;
  filters: readonly SelectableFilter[];
  /** how the filters are put in circuit; absent = switched by the controller */
  filterSelection?: FilterSelection;
  /** hand-swapped filters: the one fitted now */
  fittedFilter?: { index: number; atUtc?: string } | null;
  dutyCycle: number;
};

export type StationSettings = {
  callsign: string;
  locator: string;
  region: LicenceRegion;
  audioOffsetHz: number;
  bands: readonly { bandId: BandId; enabled: boolean; calibrationOffsetHz: number | null }[];
};

/** Typical insertion loss of a beacon's low-pass filter in its passband (common practice, no source). */
export const FILTER_LOSS_DB = 0.5;
export const WARM_UP_DEG_C = 10;

export function stationPower(unit: UnitHardware): PowerChainResult {
  return chainOutput({
    generatorDbm: unit.generatorLevelDbm,
    attenuatorDb: unit.attenuatorDb,
    amplifierGainDb: unit.amplifier?.gainDb,
    amplifierSaturationDbm: unit.amplifier?.saturatedDbm,
    filterLossDb: unit.filters.length ? FILTER_LOSS_DB : 0,
  });
}

export type MessageOnAir = { text: string; type: number; symbols: number[] };

export function stationMessages(station: StationSettings, unit: UnitHardware | null) {
  const powerDbm = unit ? stationPower(unit).report.reportedDbm : 0;
  const plan = planMessages({ callsign: station.callsign, locator: station.locator, powerDbm });
  if (!plan.ok) return plan;
  const messages: MessageOnAir[] = plan.texts.map((text) => {
    const encoded = encodeMessage(text);
    if (!encoded.ok) throw new Error(`planned message '${text}' does not encode: ${encoded.reason}`);
    return { text: encoded.message, type: encoded.type, symbols: Array.from(encoded.symbols) };
  });
  return { ok: true as const, messages, power: plan.power };
}

export type HarmonicCheck = {
  harmonic: number;
  frequencyHz: number;
  rawDbc: number | null;
  filterDb: number | null;
  resultDbc: number | null;
  pass: boolean | null;
};

export type HarmonicsVerdict = {
  limit: SpuriousLimit;
  harmonics: HarmonicCheck[];
  /** true = every harmonic meets the limit; null = cannot tell (no usable filter model) */
  pass: boolean | null;
  summary: string;
};

export function harmonicsVerdict(
  band: Band,
  unit: UnitHardware,
  coverage: Coverage,
  outputDbm: number,
  carrierHz: number = band.dialHz + 1500,
): HarmonicsVerdict {
  const { limit, harmonics: raw } = spuriousRequirement({
    region: band.region,
    carrierHz,
    powerW: dbmToMw(outputDbm) / 1000,
    dutyCycle: unit.dutyCycle,
  });
  const filter = coverage.covered ? coverage.filter : null;
  const modelled = filter && (FILTER_KINDS as readonly string[]).includes(filter.type) ? (filter.type as FilterKind) : null;
  const harmonics = raw.map((h) => {
    const filterDb = !filter ? 0 : modelled ? attenuationDb(modelled, filter.order, filter.cutoffHz, h.frequencyHz) : null;
    const resultDbc = h.levelDbc === null || filterDb === null ? null : h.levelDbc - filterDb;
    return {
      harmonic: h.harmonic,
      frequencyHz: h.frequencyHz,
      rawDbc: h.levelDbc,
      filterDb,
      resultDbc,
      pass: h.levelDbc === null ? true : resultDbc === null ? null : resultDbc <= -limit.limitDb,
    };
  });
  const failing = harmonics.filter((h) => h.pass === false);
  const unknown = harmonics.some((h) => h.pass === null);
  const pass = failing.length ? false : unknown ? null : true;
  const summary = harmonicsSummary(filter?.type ?? null, limit.limitDb, harmonics, failing.length > 0, unknown);
  return { limit, harmonics, pass: failing.length ? false : pass, summary };
}

export type BandOnAir = {
  band: Band;
  enabled: boolean;
  /** the filter in circuit for this band (and how to select it), or why there is none */
  coverage: FilterChoice;
  calibrated: boolean;
  calibrationOffsetHz: number;
  command: BandCommand;
  /** the window with the tones as radiated after calibration */
  window: WindowCheck;
  /** where the tones could sit without calibration, given the unit's stated tolerance */
  toleranceHz: number;
  /** frequency change for a warm-up of WARM_UP_DEG_C; null when the unit states no coefficient */
  warmUpDriftHz: number | null;
  /** the window after that drift, worst direction */
  driftedWindow: WindowCheck | null;
  synth: SynthPlan | null;
  synthProblem: string | null;
  harmonics: HarmonicsVerdict;
};

export function bandOnAir(station: StationSettings, unit: UnitHardware, bandId: BandId): BandOnAir | { problem: string } {
  const found = bandFor(bandId, station.region);
  if (!found.ok) return { problem: found.reason };
  const { band } = found;
  const setting = station.bands.find((b) => b.bandId === bandId);
  const calibrationOffsetHz = setting?.calibrationOffsetHz ?? 0;
  const command = commandForBand(band.dialHz, station.audioOffsetHz, { referenceErrorPpm: 0, bandOffsetHz: calibrationOffsetHz });
  const coverage = selectFilter(unit, band);
  const window = checkTonesInWindow(band.dialHz, command.tonesHz);
  const carrierHz = command.carrierHz;
  const warmUpDriftHz = unit.disciplined
    ? 0
    : unit.tempCoPpmPerC === null
      ? null
      : thermalDriftHz(carrierHz, unit.tempCoPpmPerC, WARM_UP_DEG_C);
  const driftedWindow =
    warmUpDriftHz === null
      ? null
      : (() => {
          const up = checkTonesInWindow(band.dialHz, toneFrequenciesHz(carrierHz + warmUpDriftHz));
          const down = checkTonesInWindow(band.dialHz, toneFrequenciesHz(carrierHz - warmUpDriftHz));
          return up.marginHz < down.marginHz ? up : down;
        })();
  let synth: SynthPlan | null = null;
  let synthProblem: string | null = null;
  if (unit.generatorKind === 'pll') {
    const plan = planSynth({ referenceHz: unit.referenceHz, targetsHz: command.commandTonesHz });
    if (plan.ok) synth = plan;
    else synthProblem = plan.reason;
  } else {
    synthProblem = 'Divider settings are computed for fractional-N PLL generators only.';
  }
  return {
    band,
    enabled: setting?.enabled ?? false,
    coverage,
    calibrated: setting?.calibrationOffsetHz !== null && setting?.calibrationOffsetHz !== undefined,
    calibrationOffsetHz,
    command,
    window,
    toleranceHz: unit.disciplined ? 0 : (carrierHz * unit.tolerancePpm) / 1e6,
    warmUpDriftHz,
    driftedWindow,
    synth,
    synthProblem,
    harmonics: harmonicsVerdict(band, unit, coverage, stationPower(unit).outputDbm, carrierHz),
  };
}

const ordinal = (n: number) => `${n}${n % 10 === 2 && n % 100 !== 12 ? 'nd' : n % 10 === 3 && n % 100 !== 13 ? 'rd' : 'th'}`;

/** The verdict in words, with the worst harmonic's margin against the limit (not only the limit). */
function harmonicsSummary(
  filterType: string | null,
  limitDb: number,
  harmonics: HarmonicCheck[],
  failing: boolean,
  unknown: boolean,
): string {
  const known = harmonics.filter((h) => h.rawDbc !== null && h.resultDbc !== null);
  const worst = known.reduce<HarmonicCheck | null>((w, h) => (w === null || h.resultDbc! > w.resultDbc! ? h : w), null);
  const limit = `the limit is ${limitDb.toFixed(1)} dB`;
  if (filterType === null)
    return `No usable filter: the harmonics go out almost unattenuated${
      worst ? ` (the ${ordinal(worst.harmonic)} is only ${(-worst.resultDbc!).toFixed(1)} dB below the carrier)` : ''
    } and fail the limit of ${limitDb.toFixed(1)} dB.`;
  if (unknown) return `The filter type '${filterType}' has no model here: measure the harmonics with an analyser before transmitting.`;
  if (!worst) return `Every harmonic is at least ${limitDb.toFixed(1)} dB below the carrier.`;
  const below = -worst.resultDbc!;
  const margin = Math.abs(below - limitDb).toFixed(1);
  return failing
    ? `The worst harmonic (the ${ordinal(worst.harmonic)}) is only ${below.toFixed(1)} dB below the carrier; ${limit}, so it is ${margin} dB short. Use a steeper filter or a lower cut-off.`
    : `The worst harmonic (the ${ordinal(worst.harmonic)}) is ${below.toFixed(1)} dB below the carrier; ${limit}, so there are ${margin} dB to spare.`;
}
