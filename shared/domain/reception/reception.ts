/**
 * Reception reports: one transmission decoded by one receiver. Pure helpers shared by the
 * ingest (listening posts and file imports), the reading API and the analyses.
 */
import { TONE_SPACING_HZ } from '../tones';

/** WSPR slots start on even UTC minutes and last two minutes. */
export const SLOT_MS = 120_000;

/**
 * Decoders report the centre of the four tones: 1.5 tone spacings above tone 0
 * (common practice, from memory: tone k sits at f + (k − 1.5) · 12000/8192 Hz from the reported centre).
 */
export const REPORTED_CENTRE_ABOVE_TONE0_HZ = 1.5 * TONE_SPACING_HZ;

/** The start of the two-minute slot a time falls in (ms since the epoch, UTC). */
export const slotStartMs = (ms: number): number => Math.floor(ms / SLOT_MS) * SLOT_MS;

/** The frequency a receiver should report for a transmission whose tone 0 is radiated at carrierHz. */
export const expectedHeardHz = (carrierHz: number): number => carrierHz + REPORTED_CENTRE_ABOVE_TONE0_HZ;

/** SNR referred to 1 W: SNR − (P_dBm − 30), so stations at different powers compare fairly. */
export const snrPerWattDb = (snrDb: number, powerDbm: number): number => snrDb - (powerDbm - 30);

/** Milliwatts from dBm. */
export const dbmToWatts = (powerDbm: number): number => 10 ** ((powerDbm - 30) / 10);

/** The key that makes a decode unique however it arrived. */
export const decodeKey = (r: { txCallsign: string; rxCallsign: string; slotStartMs: number; bandId: string }): string =>
  `${r.txCallsign}|${r.rxCallsign}|${r.slotStartMs}|${r.bandId}`;
