import { createHash, randomBytes, randomInt } from 'node:crypto';
import type { SessionUser } from '@/shared/api/contracts';
import {
  PAIRING_TARGET_KINDS,
  USER_CODE_ALPHABET,
  USER_CODE_LENGTH,
  formatUserCode,
  normalizeUserCode,
  type PairingDecision,
  type PairingRequestInput,
  type PairingRequestView,
  type PairingTarget,
  type PairingTargetKind,
} from '@/shared/schemas';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import { getOwnedBy, listFor } from '../stations/stations.service';
import * as repo from './pairing.repo';
import { hashToken, newToken } from './tokens.service';

/** RFC 8628 §3.4: the grant type a polling device names. */
export const DEVICE_CODE_GRANT = 'urn:ietf:params:oauth:grant-type:device_code';
/** Both codes live 10 minutes. */
export const PAIRING_LIFETIME_S = 600;
/** The RFC's default polling interval, and what each slow_down adds to it (§3.5). */
export const POLL_INTERVAL_S = 5;
export const SLOW_DOWN_STEP_S = 5;
/** A poll arriving this much early still counts as on time (network jitter). */
export const POLL_GRACE_MS = 500;
/** Wrong codes are counted in windows of this length. */
export const ATTEMPT_WINDOW_MS = 15 * 60_000;

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');
const hashUserCode = (code: string) => sha256(`user-code:${normalizeUserCode(code)}`);

function drawUserCode() {
  let code = '';
  for (let i = 0; i < USER_CODE_LENGTH; i += 1) code += USER_CODE_ALPHABET[randomInt(USER_CODE_ALPHABET.length)];
  return code;
}

/** An answer in the shape of RFC 6749 §5.2 (errors) or §5.1 (the token). */
export type OAuthAnswer =
  | { status: 200; body: Record<string, string | number> }
  | { status: 400 | 429; body: { error: string; error_description: string; interval?: number } };

const oauthError = (error: string, description: string, extra: { interval?: number } = {}): OAuthAnswer => ({
  status: 400,
  body: { error, error_description: description, ...extra },
});

/** RFC 8628 §3.1–3.2: a device asks to be paired and gets its two codes. */
export async function requestPairing(input: PairingRequestInput, webOrigin: string, now: Date): Promise<OAuthAnswer> {
  const kind = (input.scope ?? 'station') as PairingTargetKind;
  if (!PAIRING_TARGET_KINDS.includes(kind)) {
    return oauthError('invalid_scope', `scope names what the device is: ${PAIRING_TARGET_KINDS.join(' or ')} (or leave it out)`);
  }
  // ended pairings are kept a day, then their user codes may be drawn again
  await repo.removeExpiredBefore(new Date(now.getTime() - 24 * 3600_000));
  for (let tries = 0; tries < 5; tries += 1) {
    const deviceCode = randomBytes(32).toString('base64url');
    const userCode = drawUserCode();
    const stored = await repo.insert({
      deviceCodeHash: sha256(deviceCode),
      userCodeHash: hashUserCode(userCode),
      targetKind: kind,
      model: input.model || null,
      firmware: input.firmware || null,
      intervalS: POLL_INTERVAL_S,
      expiresAt: new Date(now.getTime() + PAIRING_LIFETIME_S * 1000),
    });
    if (!stored) continue;
    const shown = formatUserCode(userCode);
    const verificationUri = `${webOrigin.replace(/\/$/, '')}/pair`;
    return {
      status: 200,
      body: {
        device_code: deviceCode,
        user_code: shown,
        verification_uri: verificationUri,
        verification_uri_complete: `${verificationUri}?code=${shown}`,
        expires_in: PAIRING_LIFETIME_S,
        interval: POLL_INTERVAL_S,
      },
    };
  }
  throw new AppError('unavailable', 'No free pairing code could be drawn; try again');
}

/**
 * RFC 8628 §3.4–3.5: a device polls for its token. The checks go in this order: the request
 * itself, an unknown or spent code, expiry, the owner's refusal, then approval (the token) or
 * waiting (authorization_pending, or slow_down when it polled before its interval was up).
 */
export async function pollToken(db: TransactionRunner, body: Record<string, unknown>, now: Date): Promise<OAuthAnswer> {
  const grantType = body.grant_type;
  if (typeof grantType !== 'string' || grantType === '') return oauthError('invalid_request', 'grant_type is missing');
  if (grantType !== DEVICE_CODE_GRANT)
    return { status: 400, body: { error: 'unsupported_grant_type', error_description: `Use grant_type=${DEVICE_CODE_GRANT}` } };
  const deviceCode = body.device_code;
  if (typeof deviceCode !== 'string' || deviceCode === '') return oauthError('invalid_request', 'device_code is missing');

  return db.transaction(async (transaction) => {
    const pairing = await repo.lockByDeviceCode(sha256(deviceCode), transaction);
    if (!pairing) return oauthError('invalid_grant', 'This device_code is not known: ask for a new pairing');
    if (pairing.status === 'spent') return oauthError('invalid_grant', 'This device_code has been used already: ask for a new pairing');
    if (now >= pairing.expiresAt)
      return oauthError('expired_token', 'The pairing code expired before it was approved: ask for a new pairing');
    if (pairing.status === 'refused') return oauthError('access_denied', 'The owner refused this device');

    if (pairing.status === 'approved' && pairing.targetId !== null) {
      if (!(await repo.stationExists(pairing.targetId, transaction))) {
        await repo.update(pairing.id, { status: 'spent', lastPolledAt: now }, transaction);
        return oauthError('access_denied', 'The station chosen for this device no longer exists');
      }
      const token = newToken();
      await repo.replaceStationToken(pairing.targetId, hashToken(token), transaction);
      await repo.update(pairing.id, { status: 'spent', lastPolledAt: now }, transaction);
      return { status: 200, body: { access_token: token, token_type: 'Bearer', scope: pairing.targetKind } };
    }

    const early = pairing.lastPolledAt && now.getTime() - pairing.lastPolledAt.getTime() < pairing.intervalS * 1000 - POLL_GRACE_MS;
    if (early) {
      const intervalS = pairing.intervalS + SLOW_DOWN_STEP_S;
      await repo.update(pairing.id, { intervalS, lastPolledAt: now }, transaction);
      return oauthError('slow_down', `Polled too soon: wait at least ${intervalS} s between polls from now on`, { interval: intervalS });
    }
    await repo.update(pairing.id, { lastPolledAt: now }, transaction);
    return oauthError('authorization_pending', 'Waiting for the owner to enter the code');
  });
}

/* ------------------------------------------------------------------ the owner's side */

export type AttemptLimits = { perAccount: number; perAddress: number };
const NO_SUCH_CODE = 'No device is waiting with this code. Check it on the device: a code works once, for 10 minutes.';

/**
 * Every code typed counts against the account and the address, in the database (shared by every
 * server process); a right code is taken back, so only wrong ones use up the allowance.
 */
async function guardedLookup<T>(
  user: SessionUser,
  address: string,
  limits: AttemptLimits,
  now: Date,
  lookup: () => Promise<T | null>,
): Promise<T> {
  const keys = [
    { key: `user:${user.id}`, limit: limits.perAccount },
    { key: `addr:${address}`.slice(0, 80), limit: limits.perAddress },
  ];
  const counts = await Promise.all(keys.map(({ key }) => repo.countAttempt(key, ATTEMPT_WINDOW_MS, now)));
  const over = keys.findIndex(({ limit }, i) => counts[i] > limit);
  if (over >= 0) {
    const endsAt = await repo.windowEndsAt(keys[over].key, ATTEMPT_WINDOW_MS);
    const minutes = endsAt ? Math.max(1, Math.ceil((endsAt.getTime() - now.getTime()) / 60_000)) : 15;
    throw new AppError('rate-limited', `Too many wrong codes. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`);
  }
  const found = await lookup();
  if (found === null) throw new AppError('not-found', NO_SUCH_CODE);
  await Promise.all(keys.map(({ key }) => repo.forgiveAttempt(key)));
  return found;
}

const isOpen = (pairing: repo.Pairing, now: Date) => pairing.status === 'pending' && now < pairing.expiresAt;

async function targetsFor(user: SessionUser, kind: string): Promise<PairingTarget[]> {
  if (kind !== 'station') return [];
  const stations = await listFor(user);
  const withToken = await repo.stationsWithToken(stations.map((s) => s.id));
  return stations.map((s) => ({ kind: 'station', id: s.id, name: s.name, callsign: s.callsign, hasToken: withToken.has(s.id) }));
}

/** What is asking to be paired, and which of the owner's stations it may become. */
export async function describe(user: SessionUser, userCode: string, address: string, limits: AttemptLimits, now: Date) {
  const pairing = await guardedLookup(user, address, limits, now, async () => {
    const found = await repo.findByUserCode(hashUserCode(userCode));
    return found && isOpen(found, now) ? found : null;
  });
  return {
    userCode: formatUserCode(userCode),
    targetKind: pairing.targetKind as PairingTargetKind,
    model: pairing.model,
    firmware: pairing.firmware,
    requestedAtUtc: new Date(pairing.expiresAt.getTime() - PAIRING_LIFETIME_S * 1000).toISOString(),
    expiresAtUtc: pairing.expiresAt.toISOString(),
    targets: await targetsFor(user, pairing.targetKind),
  } satisfies PairingRequestView;
}

const deviceWords = (p: repo.Pairing) => [p.model, p.firmware && `firmware ${p.firmware}`].filter(Boolean).join(', ') || 'no model given';

/**
 * The owner approves: the device will be this station. Its previous token (if any) stops at once;
 * the device's next poll receives the new one. Audited in the same transaction.
 */
export async function approve(
  db: TransactionRunner,
  user: SessionUser,
  userCode: string,
  targetId: number,
  address: string,
  limits: AttemptLimits,
  now: Date,
): Promise<PairingDecision> {
  const station = await getOwnedBy(user, targetId);
  return guardedLookup(user, address, limits, now, () =>
    db.transaction(async (transaction) => {
      const pairing = await repo.findByUserCode(hashUserCode(userCode), transaction);
      if (!pairing || !isOpen(pairing, now)) return null;
      if (pairing.targetKind !== 'station')
        throw new AppError('bad-request', 'This device cannot become a station', { targetId: 'Choose another kind' });
      const hadToken = await repo.removeStationToken(station.id, transaction);
      await repo.update(pairing.id, { status: 'approved', targetId: station.id, decidedById: user.id, decidedAt: now }, transaction);
      await audit.record(
        {
          actor: user,
          ownerId: user.id,
          action: 'device.pair',
          entityType: 'station',
          entityId: station.id,
          summary: `Paired a device (${deviceWords(pairing)}) with ${station.name}${hadToken ? '; its previous token stopped' : ''}`,
          after: { model: pairing.model, firmware: pairing.firmware },
        },
        transaction,
      );
      const decision: PairingDecision = {
        status: 'approved',
        target: { kind: 'station', id: station.id, name: station.name, callsign: station.callsign, hasToken: true },
      };
      return decision;
    }),
  );
}

/** The owner refuses: the device's next poll gets access_denied. Audited. */
export async function refuse(
  db: TransactionRunner,
  user: SessionUser,
  userCode: string,
  address: string,
  limits: AttemptLimits,
  now: Date,
): Promise<PairingDecision> {
  return guardedLookup(user, address, limits, now, () =>
    db.transaction(async (transaction) => {
      const pairing = await repo.findByUserCode(hashUserCode(userCode), transaction);
      if (!pairing || !isOpen(pairing, now)) return null;
      await repo.update(pairing.id, { status: 'refused', decidedById: user.id, decidedAt: now }, transaction);
      await audit.record(
        {
          actor: user,
          ownerId: user.id,
          action: 'device.pair-refuse',
          entityType: 'station',
          entityId: null,
          summary: `Refused a device asking to be paired (${deviceWords(pairing)})`,
        },
        transaction,
      );
      const decision: PairingDecision = { status: 'refused' };
      return decision;
    }),
  );
}
