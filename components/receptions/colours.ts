import { BAND_IDS, type BandId } from '@/shared/domain/bands';

/**
 * Faintline's own band colours: long waves warm and earthy, the HF middle through greens and
 * teals, the high bands cool violets. Mid-tone so a dot reads on the daylight paper and the night ink.
 */
const BAND_COLOURS: Record<BandId, string> = {
  '2200m': '#8C5A3C',
  '630m': '#A8643A',
  '160m': '#C2552F',
  '80m': '#D4792A',
  '60m': '#C99A1E',
  '40m': '#8FA623',
  '30m': '#3E9E4A',
  '20m': '#17917F',
  '17m': '#1F86A8',
  '15m': '#3A6FC4',
  '12m': '#5B5FD0',
  '10m': '#7E55C8',
  '6m': '#A24FB5',
  '4m': '#B8478E',
  '2m': '#C2456A',
};

export function bandColour(bandId: BandId): string {
  return BAND_COLOURS[bandId] ?? '#777777';
}

/** Bands in their order on the dial (long waves first). */
export function sortBands(bandIds: Iterable<BandId>): BandId[] {
  return [...new Set(bandIds)].sort((a, b) => BAND_IDS.indexOf(a) - BAND_IDS.indexOf(b));
}

/** SNR steps of the map's second colouring: from barely decoded (deep blue) to loud (amber). */
export const SNR_STEPS: { fromDb: number; label: string; colour: string }[] = [
  { fromDb: -Infinity, label: 'below −24 dB', colour: '#3B4BA8' },
  { fromDb: -24, label: '−24 to −18 dB', colour: '#2F7FB8' },
  { fromDb: -18, label: '−18 to −12 dB', colour: '#23A08C' },
  { fromDb: -12, label: '−12 to −6 dB', colour: '#8DB33A' },
  { fromDb: -6, label: '−6 dB and above', colour: '#E0962A' },
];

export function snrColour(snrDb: number): string {
  let colour = SNR_STEPS[0]!.colour;
  for (const step of SNR_STEPS) if (snrDb >= step.fromDb) colour = step.colour;
  return colour;
}
