import type { IncomingMessage, ServerResponse } from 'node:http';
import { LRUCache } from 'lru-cache';
import type { Sequelize } from 'sequelize';
import type { ApiErrorBody } from '@/shared/api/contracts';
import { buildDeviceConfig, planWindowStart } from '@/shared/domain/workshop';
import type { Config } from '../../config';
import { AppError, statusOf } from '../../lib/app-error';
import { onStationChanged } from '../../lib/change-feed';
import { SlidingWindowStore } from '../../lib/sliding-window-store';
import { createUnknownTokenGuard } from '../../lib/unknown-token-guard';
import { planInputsOf } from '../schedules/schedules.service';
import { stationById } from '../stations/stations.service';
import { isDatabaseUnavailable, UNAVAILABLE_MESSAGE } from '../../lib/db-errors';
import {
  acceptsGzip,
  etagsFor,
  ifNoneMatchHits,
  representationsOf,
  type ConfigEtags,
  type ConfigRepresentations,
} from './config-representation';
import { etagFor } from './device-config';
import { identify, type DeviceIdentity } from './tokens.service';

export const RATE_WINDOW_MS = 60_000;
const EMPTY = Buffer.alloc(0);

/**
 * What every device request goes through: the bearer token, the per-device rate limit, and the
 * configuration with its ETag. Known tokens and built configurations are kept in memory; any
 * change in this process drops them at once, other processes see it within DEVICE_CACHE_MS.
 */
export function createDeviceGateway({ sequelize, config }: { sequelize: Sequelize; config: Config }) {
  const known = new LRUCache<string, { device: DeviceIdentity; at: number }>({ max: 100_000 });
  // Bounded by bytes: a fleet of thousands keeps its most recently polled configurations ready.
  const configs = new LRUCache<number, ConfigRepresentations>({
    maxSize: config.DEVICE_CONFIG_CACHE_MB * 1024 * 1024,
    sizeCalculation: (r) => r.identity.body.length + r.gzip.body.length,
  });
  const store = new SlidingWindowStore({ windowMs: RATE_WINDOW_MS });
  const unknownTokens = createUnknownTokenGuard({ what: 'device', perAddressPerMinute: config.UNKNOWN_TOKENS_PER_ADDRESS });
  onStationChanged((stationId) => {
    if (stationId === 'all') known.clear();
    else for (const token of [...known.keys()]) if (known.peek(token)?.device.stationId === stationId) known.delete(token);
  });

  /** `address` is the client's address: unknown tokens are counted and throttled per address. */
  async function authenticate(authorization: string | undefined, address = ''): Promise<DeviceIdentity> {
    const match = /^Bearer\s+(\S+)$/i.exec(authorization ?? '');
    if (!match) throw new AppError('unauthenticated', 'Send the device token as "Authorization: Bearer <token>"');
    const token = match[1];
    const hit = known.get(token);
    if (hit && Date.now() - hit.at < config.DEVICE_CACHE_MS) return hit.device;
    unknownTokens.screen(token, address);
    const device = await identify(sequelize, token);
    if (!device) {
      known.delete(token);
      throw unknownTokens.remember(token, address);
    }
    known.set(token, { device, at: Date.now() });
    return device;
  }

  // A version's ETags last until the plan window moves on, so a poll hashes nothing.
  const etagMemo = new LRUCache<string, { windowStartMs: number; etags: ConfigEtags }>({ max: 100_000 });
  function etagsOf(version: string, nowMs: number) {
    const windowStartMs = planWindowStart(nowMs);
    const hit = etagMemo.get(version);
    if (hit?.windowStartMs === windowStartMs) return hit.etags;
    const etags = etagsFor(etagFor(version, nowMs));
    etagMemo.set(version, { windowStartMs, etags });
    return etags;
  }

  /** The configuration as the device asked for it: 304 while its ETag (either encoding's) is current, else the bytes. */
  async function config_(device: DeviceIdentity, request: { ifNoneMatch?: string; acceptEncoding?: string }, nowMs = Date.now()) {
    const etags = etagsOf(device.version, nowMs);
    const encoding = acceptsGzip(request.acceptEncoding) ? ('gzip' as const) : ('identity' as const);
    if (ifNoneMatchHits(request.ifNoneMatch, etags.all)) return { status: 304 as const, encoding, etag: etags[encoding], body: EMPTY };
    let cached = configs.get(device.stationId);
    if (cached?.identity.etag !== etags.identity) {
      const station = await stationById(device.stationId);
      if (!station) throw new AppError('unauthenticated', 'This device token is not valid (revoked or rotated?)');
      const { unit, schedule } = await planInputsOf(station);
      // Kept as bytes in both encodings, so a poll sends them without encoding anything again.
      cached = representationsOf(etags, buildDeviceConfig(station, unit, schedule, nowMs));
      configs.set(device.stationId, cached);
    }
    return { status: 200 as const, encoding, etag: cached[encoding].etag, body: cached[encoding].body };
  }

  /** The rate-limit store, shared with the Express limiter so both paths count the same requests. */
  async function countRequest(device: DeviceIdentity) {
    const { totalHits } = await store.increment(device.tokenHash);
    if (totalHits > config.DEVICE_RATE_LIMIT) {
      throw new AppError('rate-limited', `Too many requests from this device: at most ${config.DEVICE_RATE_LIMIT} a minute`);
    }
  }

  return { authenticate, config: config_, countRequest, store, unknownTokens };
}

export type DeviceGateway = ReturnType<typeof createDeviceGateway>;

type ConfigAnswer = Awaited<ReturnType<DeviceGateway['config']>>;

/** Writes a config answer; the fast path and the Express route send exactly the same thing. */
export function sendConfig(res: ServerResponse, answer: ConfigAnswer) {
  // A 304 repeats only what a cache needs (RFC 9110 §15.4.5): the validator and the caching headers.
  if (answer.status === 304) {
    res.writeHead(304, ['ETag', answer.etag, 'Cache-Control', 'private, no-cache', 'Vary', 'Accept-Encoding']);
    return void res.end();
  }
  const headers = [
    'ETag',
    answer.etag,
    'Cache-Control',
    'private, no-cache',
    'Vary',
    'Accept-Encoding',
    'X-Content-Type-Options',
    'nosniff',
    'Content-Type',
    'application/json; charset=utf-8',
    'Content-Length',
    String(answer.body.length),
  ];
  if (answer.encoding === 'gzip') headers.push('Content-Encoding', 'gzip');
  res.writeHead(200, headers);
  res.end(answer.body);
}

function sendError(res: ServerResponse, error: unknown) {
  const appError =
    error instanceof AppError
      ? error
      : isDatabaseUnavailable(error)
        ? new AppError('unavailable', UNAVAILABLE_MESSAGE)
        : new AppError('internal', 'Something went wrong on the server. It has been logged.');
  const body = JSON.stringify({ error: { code: appError.code, message: appError.message } } satisfies ApiErrorBody);
  res.writeHead(statusOf[appError.code], {
    ...(appError.code === 'unavailable' ? { 'Retry-After': '5' } : appError.code === 'rate-limited' ? { 'Retry-After': '60' } : {}),
    'Content-Type': 'application/json; charset=utf-8',
    'Content-Length': Buffer.byteLength(body),
    'X-Content-Type-Options': 'nosniff',
  });
  res.end(body);
}

/**
 * The hottest request of all, a beacon polling its configuration, answered straight from the
 * node:http layer with the same gateway the Express route uses. Anything else goes to Express.
 */
export function withDeviceFastPath(
  gateway: DeviceGateway,
  app: (req: IncomingMessage, res: ServerResponse) => void,
  onError: (error: unknown) => void,
) {
  return (req: IncomingMessage, res: ServerResponse) => {
    if (req.method !== 'GET' || req.url !== '/api/device/v1/config') return app(req, res);
    void (async () => {
      try {
        const device = await gateway.authenticate(req.headers.authorization, req.socket.remoteAddress);
        await gateway.countRequest(device);
        const answer = await gateway.config(device, {
          ifNoneMatch: req.headers['if-none-match'],
          acceptEncoding: req.headers['accept-encoding'],
        });
        sendConfig(res, answer);
      } catch (error) {
        if (!(error instanceof AppError) && !isDatabaseUnavailable(error)) onError(error);
        sendError(res, error);
      }
    })();
  };
}
