import type { IncomingMessage, ServerResponse } from 'node:http';
import { MemoryStore } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import type { ApiErrorBody } from '@/shared/api/contracts';
import type { Config } from '../../config';
import { AppError, statusOf } from '../../lib/app-error';
import { onStationChanged } from '../../lib/change-feed';
import * as schedulesRepo from '../schedules/schedules.repo';
import * as stationsRepo from '../stations/stations.repo';
import * as unitsRepo from '../units/units.repo';
import { deviceConfig, etagFor } from './device-config';
import { identify, type DeviceIdentity } from './tokens.service';

export const RATE_WINDOW_MS = 60_000;
const EMPTY = Buffer.alloc(0);

/**
 * What every device request goes through: the bearer token, the per-device rate limit, and the
 * configuration with its ETag. Known tokens and built configurations are kept in memory; any
 * change in this process drops them at once, other processes see it within DEVICE_CACHE_MS.
 */
export function createDeviceGateway({ sequelize, config }: { sequelize: Sequelize; config: Config }) {
  const known = new Map<string, { device: DeviceIdentity; at: number }>();
  const configs = new Map<number, { etag: string; body: Buffer }>();
  const store = new MemoryStore();
  onStationChanged((stationId) => {
    if (stationId === 'all') known.clear();
    else for (const [token, entry] of known) if (entry.device.stationId === stationId) known.delete(token);
  });

  async function authenticate(authorization: string | undefined): Promise<DeviceIdentity> {
    const match = /^Bearer\s+(\S+)$/i.exec(authorization ?? '');
    if (!match) throw new AppError('unauthenticated', 'Send the device token as "Authorization: Bearer <token>"');
    const token = match[1];
    const hit = known.get(token);
    if (hit && Date.now() - hit.at < config.DEVICE_CACHE_MS) return hit.device;
    const device = await identify(sequelize, token);
    if (!device) {
      known.delete(token);
      throw new AppError('unauthenticated', 'This device token is not valid (revoked or rotated?)');
    }
    known.set(token, { device, at: Date.now() });
    return device;
  }

  async function config_(device: DeviceIdentity, ifNoneMatch: string | undefined, nowMs = Date.now()) {
    const etag = etagFor(device.version, nowMs);
    if (ifNoneMatch === etag) return { status: 304 as const, etag, body: EMPTY };
    let cached = configs.get(device.stationId);
    if (!cached || cached.etag !== etag) {
      const station = await stationsRepo.findById(device.stationId);
      if (!station) throw new AppError('unauthenticated', 'This device token is not valid (revoked or rotated?)');
      const [unit, schedule] = await Promise.all([
        station.unitId === null ? null : unitsRepo.findById(station.unitId),
        schedulesRepo.findByStation(station.id),
      ]);
      // Kept as bytes, so a poll sends them without encoding anything again.
      cached = { etag, body: Buffer.from(JSON.stringify(deviceConfig(station, unit, schedule, nowMs))) };
      configs.set(device.stationId, cached);
    }
    return { status: 200 as const, etag, body: cached.body };
  }

  /** The rate-limit store, shared with the Express limiter so both paths count the same requests. */
  async function countRequest(device: DeviceIdentity) {
    const { totalHits } = await store.increment(device.tokenHash);
    if (totalHits > config.DEVICE_RATE_LIMIT) {
      throw new AppError('rate-limited', `Too many requests from this device: at most ${config.DEVICE_RATE_LIMIT} a minute`);
    }
  }

  return { authenticate, config: config_, countRequest, store };
}

export type DeviceGateway = ReturnType<typeof createDeviceGateway>;

function sendError(res: ServerResponse, error: unknown) {
  const appError = error instanceof AppError ? error : new AppError('internal', 'Something went wrong on the server. It has been logged.');
  const body = JSON.stringify({ error: { code: appError.code, message: appError.message } } satisfies ApiErrorBody);
  res.writeHead(statusOf[appError.code], { 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': Buffer.byteLength(body), 'X-Content-Type-Options': 'nosniff' });
  res.end(body);
}

/**
 * The hottest request of all, a beacon polling its configuration, answered straight from the
 * node:http layer with the same gateway the Express route uses. Anything else goes to Express.
 */
export function withDeviceFastPath(gateway: DeviceGateway, app: (req: IncomingMessage, res: ServerResponse) => void, onError: (error: unknown) => void) {
  return (req: IncomingMessage, res: ServerResponse) => {
    if (req.method !== 'GET' || req.url !== '/api/device/v1/config') return app(req, res);
    void (async () => {
      try {
        const device = await gateway.authenticate(req.headers.authorization);
        await gateway.countRequest(device);
        const ifNoneMatch = req.headers['if-none-match'];
        const answer = await gateway.config(device, Array.isArray(ifNoneMatch) ? ifNoneMatch[0] : ifNoneMatch);
        const headers = { ETag: answer.etag, 'Cache-Control': 'private, no-cache', 'X-Content-Type-Options': 'nosniff' };
        if (answer.status === 304) {
          res.writeHead(304, headers);
          res.end();
        } else {
          res.writeHead(200, { ...headers, 'Content-Type': 'application/json; charset=utf-8', 'Content-Length': answer.body.length });
          res.end(answer.body);
        }
      } catch (error) {
        if (!(error instanceof AppError)) onError(error);
        sendError(res, error);
      }
    })();
  };
}
