/** Faintline's words for the trade's ideas, in plain language (loaded with the Help screen only). Each id matches GLOSSARY_TERMS. */
export type GlossaryEntry = { id: string; term: string; body: string };

export const GLOSSARY: readonly GlossaryEntry[] = [
  {
    id: 'dial',
    term: 'Dial frequency',
    body: 'The frequency a receiver is tuned to for WSPR on a band, for example 14.095 600 MHz on 20 m. Signals are not sent on the dial itself but a little above it, inside the window.',
  },
  {
    id: 'audio-offset',
    term: 'Audio offset',
    body: 'How far above the dial frequency your signal sits, in hertz. Receivers listen from 1400 to 1600 Hz above the dial; 1500 Hz is the middle. Faintline keeps all four tones inside that range.',
  },
  {
    id: 'window',
    term: 'Window',
    body: 'The 200 Hz a receiver decodes: dial + 1400 Hz to dial + 1600 Hz. A tone outside it is never heard. A cheap crystal can be off by tens of hertz, which is why each band is calibrated.',
  },
  {
    id: 'tones',
    term: 'Tones',
    body: 'A WSPR transmission is four tones 1.46 Hz apart; the beacon switches between them to send its message over about 110.6 seconds.',
  },
  {
    id: 'slot',
    term: 'Slot',
    body: 'Transmissions start at the beginning of an even UTC minute (00, 02, 04 …) and last just under two minutes. A schedule says which slots the beacon uses; a beacon whose clock is off by more than a second or two is not decoded.',
  },
  {
    id: 'message-types',
    term: 'Message types',
    body: 'What one transmission carries. The plain message holds a short callsign, a 4-character locator and the power. A longer callsign or a 6-character locator needs two messages in turn: one with the callsign and power, one with the locator and a hashed callsign.',
  },
  {
    id: 'calibration',
    term: 'Calibration offset',
    body: 'How far a band comes out from where it was meant to be, in hertz; positive means the station radiates high. Faintline subtracts it when it programs the generator, so the tones land where they should.',
  },
  {
    id: 'ppm',
    term: 'ppm (parts per million)',
    body: 'How far a crystal may be from its stated frequency: ±10 ppm on 14 MHz is ±140 Hz. The temperature coefficient (ppm per °C) says how much it moves as the board warms.',
  },
  {
    id: 'dbm',
    term: 'dBm',
    body: 'Power compared with one milliwatt: 0 dBm is 1 mW, 10 dBm is 10 mW, 20 dBm is 100 mW, 30 dBm is 1 W. WSPR messages report the power in dBm.',
  },
  {
    id: 'dbc',
    term: 'dBc',
    body: 'A level compared with the carrier (your wanted signal). A harmonic at −50 dBc is 50 dB (100 000 times) weaker than the carrier. Licences set how far below the carrier harmonics must be.',
  },
  {
    id: 'harmonics',
    term: 'Harmonics and the low-pass filter',
    body: 'A clock generator makes a square wave, which also radiates at 3, 5, 7 … times the frequency. A low-pass filter for each band removes them. Never transmit without the right filter in circuit.',
  },
  {
    id: 'stagger',
    term: 'Stagger',
    body: 'A small shift of the audio offset from one transmission to the next, so two beacons that chose the same offset do not collide every time.',
  },
  {
    id: 'registers',
    term: 'Synthesizer registers',
    body: 'The numbers the controller writes into the clock generator for each tone: the divider settings that turn the crystal’s frequency into the one wanted. Faintline works them out and shows what frequency they really make.',
  },
  {
    id: 'snr',
    term: 'SNR',
    body: 'Signal-to-noise ratio in dB as the receiver measured it, referred to a 2500 Hz bandwidth. Reports go down to about −28 dB; higher is stronger.',
  },
  {
    id: 'locator',
    term: 'Maidenhead locator',
    body: 'A short code for a place on Earth: 4 characters (JO01) name a square of about 100 × 200 km, 6 characters (JO01ab) one of about 4 × 8 km.',
  },
];
