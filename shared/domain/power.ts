/**
 * Power arithmetic: dBm = 10·log10(mW); the output of a chain
 * generator − attenuator + amplifier gain (capped at the amplifier's
 * saturated output) − filter loss; and the WSPR level to report, with each
 * step kept so a screen can show the working.
 */
import { nearestWsprLevel, type PowerRounding } from './wspr/power-levels';

export const dbmToMw = (powerDbm: number): number => 10 ** (powerDbm / 10);
export const mwToDbm = (powerMw: number): number => 10 * Math.log10(powerMw);

export type PowerChain = {
  generatorDbm: number;
  attenuatorDb?: number;
  amplifierGainDb?: number;
  /** the amplifier's saturated output; the output never exceeds it */
  amplifierSaturationDbm?: number;
  filterLossDb?: number;
};

export type PowerStep = { label: string; changeDb: number | null; levelDbm: number };

export type PowerChainResult = {
  outputDbm: number;
  outputMw: number;
  /** true when the amplifier's saturation limited the output */
  saturated: boolean;
  steps: PowerStep[];
  report: PowerRounding;
};

export function chainOutput(chain: PowerChain): PowerChainResult {
  const steps: PowerStep[] = [{ label: 'generator output', changeDb: null, levelDbm: chain.generatorDbm }];
  let level = chain.generatorDbm;
  if (chain.attenuatorDb) {
    level -= chain.attenuatorDb;
    steps.push({ label: 'attenuator', changeDb: -chain.attenuatorDb, levelDbm: level });
  }
  let saturated = false;
  if (chain.amplifierGainDb !== undefined || chain.amplifierSaturationDbm !== undefined) {
    const gain = chain.amplifierGainDb ?? 0;
    level += gain;
    steps.push({ label: 'amplifier gain', changeDb: gain, levelDbm: level });
    if (chain.amplifierSaturationDbm !== undefined && level > chain.amplifierSaturationDbm) {
      saturated = true;
      steps.push({ label: 'amplifier saturation', changeDb: chain.amplifierSaturationDbm - level, levelDbm: chain.amplifierSaturationDbm });
      level = chain.amplifierSaturationDbm;
    }
  }
  if (chain.filterLossDb) {
    level -= chain.filterLossDb;
    steps.push({ label: 'filter loss', changeDb: -chain.filterLossDb, levelDbm: level });
  }
  return { outputDbm: level, outputMw: dbmToMw(level), saturated, steps, report: reportedLevel(level) };
}

/** The WSPR level to put in the message for a measured or computed power (below 0 dBm reports 0, above 60 reports 60). */
export function reportedLevel(powerDbm: number): PowerRounding {
  return nearestWsprLevel(powerDbm);
}
