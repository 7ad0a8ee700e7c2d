/**
 * The glossary's words by id, for the "?" marks beside them (/help?term=id). The explanations live in glossary-text.ts, which
 * only the Help screen loads.
 */
export const GLOSSARY_TERMS: Readonly<Record<string, string>> = {
  dial: 'Dial frequency',
  'audio-offset': 'Audio offset',
  window: 'Window',
  tones: 'Tones',
  slot: 'Slot',
  'message-types': 'Message types',
  calibration: 'Calibration offset',
  ppm: 'ppm (parts per million)',
  dbm: 'dBm',
  dbc: 'dBc',
  harmonics: 'Harmonics and the low-pass filter',
  stagger: 'Stagger',
  registers: 'Synthesizer registers',
  snr: 'SNR',
  locator: 'Maidenhead locator',
};
