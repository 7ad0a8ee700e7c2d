/**
 * WSPR message texts and their three types (WSPR protocol description, K1JT):
 *   Type 1  "K1ABC FN42 37"          plain callsign, 4-character locator, power
 *   Type 2  "PJ4/K1ABC 37"           compound callsign, power (no locator)
 *   Type 3  "<PJ4/K1ABC> FK52UD 37"  hash of the callsign, 6-character locator, power
 */
import { refuse, type Result } from '../result';
import { validateCallsign, validatePlainCallsign } from './callsign';
import { nearestWsprLevel, type PowerRounding } from './power-levels';

export type WsprMessageType = 1 | 2 | 3;
export type WsprMessage =
  | { type: 1; callsign: string; locator: string; powerDbm: number }
  | { type: 2; callsign: string; powerDbm: number }
  | { type: 3; callsign: string; locator: string; powerDbm: number };

const LOCATOR4 = /^[A-R]{2}[0-9]{2}$/;
const LOCATOR6 = /^[A-R]{2}[0-9]{2}[A-X]{2}$/;

/** A locator as WSPR carries it: 4 or 6 characters, returned upper-case. */
export function validateMessageLocator(text: string, length: 4 | 6): Result<{ locator: string }> {
  const locator = text.trim().toUpperCase();
  const pattern = length === 4 ? LOCATOR4 : LOCATOR6;
  if (pattern.test(locator)) return { ok: true, locator };
  const shape = length === 4 ? 'two letters A–R and two digits (FN42)' : 'two letters A–R, two digits and two letters A–X (FN42AB)';
  return refuse(`'${text.trim()}' is not a ${length}-character locator: use ${shape}.`);
}

/** Power as a whole dBm from 0 to 60; an in-between value is rounded to the nearest level and said so. */
export function validateMessagePower(value: number | string): Result<{ power: PowerRounding }> {
  const powerDbm = typeof value === 'number' ? value : /^-?\d+$/.test(value.trim()) ? Number(value) : NaN;
  if (!Number.isInteger(powerDbm)) return refuse(`Power must be a whole number of dBm from 0 to 60; '${value}' is not.`);
  if (powerDbm < 0 || powerDbm > 60) {
    return refuse(`Power ${powerDbm} dBm is outside what WSPR carries: use 0 to 60 dBm (last digit 0, 3 or 7).`);
  }
  return { ok: true, power: nearestWsprLevel(powerDbm) };
}

export type ParsedMessage = { message: WsprMessage; power: PowerRounding };

/** Reads a message text; power that is not an allowed level is rounded and reported in `power`. */
export function parseMessage(text: string): Result<ParsedMessage> {
  const tokens = text
    .trim()
    .split(/\s+/)
    .filter((t) => t !== '');
  if (tokens.length < 2 || tokens.length > 3) {
    return refuse(
      `'${text.trim()}' is not a WSPR message: write "CALLSIGN LOCATOR dBm", "PREFIX/CALLSIGN dBm" or "<CALLSIGN> LOCATOR6 dBm".`,
    );
  }
  const power = validateMessagePower(tokens[tokens.length - 1]);
  if (!power.ok) return power;
  const powerDbm = power.power.reportedDbm;
  const first = tokens[0];

  if (tokens.length === 2) {
    const call = validateCallsign(first);
    if (!call.ok) return call;
    if (call.kind === 'plain') {
      return refuse(`A plain callsign travels with its locator: write "${call.callsign} FN42 ${powerDbm}" (your locator).`);
    }
    return { ok: true, message: { type: 2, callsign: call.callsign, powerDbm }, power: power.power };
  }

  if (first.startsWith('<') && first.endsWith('>')) {
    const call = validateCallsign(first.slice(1, -1));
    if (!call.ok) return call;
    const loc = validateMessageLocator(tokens[1], 6);
    if (!loc.ok) return refuse(`Type 3 (<CALLSIGN>) carries a 6-character locator: ${loc.reason}`);
    return { ok: true, message: { type: 3, callsign: call.callsign, locator: loc.locator, powerDbm }, power: power.power };
  }

  const call = validatePlainCallsign(first);
  if (!call.ok) {
    if (first.includes('/')) {
      return refuse(
        `A compound callsign travels without a locator: write "${first.toUpperCase()} ${powerDbm}", and the locator in "<${first.toUpperCase()}> LOCATOR6 ${powerDbm}".`,
      );
    }
    return call;
  }
  if (tokens[1].trim().length === 6) {
    return refuse(
      `A 6-character locator travels in Type 3: write "<${call.callsign}> ${tokens[1].toUpperCase()} ${powerDbm}", or use its first 4 characters here.`,
    );
  }
  const loc = validateMessageLocator(tokens[1], 4);
  if (!loc.ok) return loc;
  return { ok: true, message: { type: 1, callsign: call.callsign, locator: loc.locator, powerDbm }, power: power.power };
}

export function formatMessage(message: WsprMessage): string {
  switch (message.type) {
    case 1:
      return `${message.callsign} ${message.locator} ${message.powerDbm}`;
    case 2:
      return `${message.callsign} ${message.powerDbm}`;
    case 3:
      return `<${message.callsign}> ${message.locator} ${message.powerDbm}`;
  }
}
