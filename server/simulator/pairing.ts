/**
 * Pairing as a device does it (RFC 8628): ask for codes, show them, poll the token endpoint at the
 * interval it names (longer after each slow_down), and take the token once the owner approves.
 */
import { toString as qrText } from 'qrcode';
import { deviceRequest } from './transport';

const GRANT = 'urn:ietf:params:oauth:grant-type:device_code';

type Codes = {
  device_code: string;
  user_code: string;
  verification_uri: string;
  verification_uri_complete: string;
  expires_in: number;
  interval: number;
};

export type PairingOptions = {
  baseUrl: string;
  model?: string;
  firmware?: string;
  log: (line: string) => void;
  sleep?: (ms: number) => Promise<void>;
};

export type PairingResult = { ok: true; token: string } | { ok: false; reason: string };

const wait = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms));

export async function pairDevice({ baseUrl, model, firmware, log, sleep = wait }: PairingOptions): Promise<PairingResult> {
  const api = `${baseUrl.replace(/\/$/, '')}/api/device/v1`;
  const form: Record<string, string> = {};
  if (model) form.model = model;
  if (firmware) form.firmware = firmware;
  const asked = await deviceRequest(`${api}/pairing`, { method: 'POST', form });
  if (asked.status !== 200) return { ok: false, reason: `the server refused to pair: ${JSON.stringify(asked.body)}` };
  const codes = asked.body as Codes;
  log(`Pairing code: ${codes.user_code}`);
  log(`Open ${codes.verification_uri} and type the code, or scan this link: ${codes.verification_uri_complete}`);
  log(await qrText(codes.verification_uri_complete, { type: 'utf8', errorCorrectionLevel: 'L' }));
  log(`The code works for ${Math.round(codes.expires_in / 60)} minutes. Waiting for the owner (asking every ${codes.interval} s)…`);

  let intervalS = codes.interval;
  const giveUpAt = Date.now() + codes.expires_in * 1000;
  while (Date.now() < giveUpAt + intervalS * 1000) {
    await sleep(intervalS * 1000);
    const answer = await deviceRequest(`${api}/token`, { method: 'POST', form: { grant_type: GRANT, device_code: codes.device_code } });
    const body = answer.body as { access_token?: string; error?: string; error_description?: string; interval?: number };
    if (answer.status === 200 && body.access_token) return { ok: true, token: body.access_token };
    switch (body.error) {
      case 'authorization_pending':
        continue;
      case 'slow_down':
        // RFC 8628 §3.5: five seconds more, for this and every later poll
        intervalS = body.interval ?? intervalS + 5;
        log(`Asked to slow down: polling every ${intervalS} s now`);
        continue;
      case 'access_denied':
        return { ok: false, reason: 'The owner refused this device.' };
      case 'expired_token':
        return { ok: false, reason: 'The code expired before anyone approved it. Run again for a new code.' };
      default:
        return {
          ok: false,
          reason: `The token endpoint answered ${answer.status}: ${body.error ?? ''} ${body.error_description ?? ''}`.trim(),
        };
    }
  }
  return { ok: false, reason: 'The code expired before anyone approved it. Run again for a new code.' };
}

type FirstConfig = { identity?: { stationId?: number; callsign?: string }; status?: string; plan?: { transmissions?: unknown[] } };

/** The device's first configuration with its new token, summed up in one line. */
export async function firstConfiguration(baseUrl: string, token: string) {
  const answer = await deviceRequest(`${baseUrl.replace(/\/$/, '')}/api/device/v1/config`, { token });
  if (answer.status !== 200) return { ok: false as const, line: `The configuration answered ${answer.status}` };
  const config = answer.body as FirstConfig;
  return {
    ok: true as const,
    line: `First configuration: station ${config.identity?.stationId ?? '?'} (${config.identity?.callsign ?? '?'}), status ${config.status}, ${config.plan?.transmissions?.length ?? 0} transmissions planned`,
  };
}
