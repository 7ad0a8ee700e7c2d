/**
 * What a station sends: plain callsign + 4-character locator → Type 1 alone;
 * plain callsign + 6-character locator → Type 1 and Type 3 in turn;
 * compound callsign → Type 2 and Type 3 in turn (the locator only travels in Type 3).
 */
import { refuse, type Result } from '../result';
import { validateCallsign, type CallsignInfo } from './callsign';
import { formatMessage, validateMessageLocator, validateMessagePower, type WsprMessage } from './message';
import type { PowerRounding } from './power-levels';

export type MessagePlanInput = { callsign: string; locator: string; powerDbm: number | string };

export type MessagePlan = {
  callsign: CallsignInfo;
  locator: string;
  power: PowerRounding;
  /** messages to send in turn, one per transmission */
  messages: WsprMessage[];
  texts: string[];
  types: number[];
};

export function planMessages(input: MessagePlanInput): Result<MessagePlan> {
  const call = validateCallsign(input.callsign);
  if (!call.ok) return call;
  const power = validateMessagePower(input.powerDbm);
  if (!power.ok) return power;
  const powerDbm = power.power.reportedDbm;
  const locatorText = input.locator.trim();
  if (locatorText.length !== 4 && locatorText.length !== 6) {
    return refuse(`WSPR carries a locator of 4 or 6 characters (FN42 or FN42AB); '${locatorText}' has ${locatorText.length}.`);
  }
  const loc = validateMessageLocator(locatorText, locatorText.length as 4 | 6);
  if (!loc.ok) return loc;
  const locator = loc.locator;

  let messages: WsprMessage[];
  if (call.kind === 'plain') {
    const type1: WsprMessage = { type: 1, callsign: call.callsign, locator: locator.slice(0, 4), powerDbm };
    messages = locator.length === 6 ? [type1, { type: 3, callsign: call.callsign, locator, powerDbm }] : [type1];
  } else {
    if (locator.length !== 6) {
      return refuse(
        `A compound callsign sends its locator only in Type 3, which needs 6 characters: add the subsquare to '${locator}' (for example ${locator}AB).`,
      );
    }
    messages = [
      { type: 2, callsign: call.callsign, powerDbm },
      { type: 3, callsign: call.callsign, locator, powerDbm },
    ];
  }
  const { ok: _ok, ...callsign } = call;
  return {
    ok: true,
    callsign,
    locator,
    power: power.power,
    messages,
    texts: messages.map(formatMessage),
    types: messages.map((m) => m.type),
  };
}
