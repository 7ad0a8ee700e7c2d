import compression from 'compression';
import connectSessionSequelize from 'connect-session-sequelize';
import express, { type Request, type Response } from 'express';
import type { IncomingMessage, ServerResponse } from 'node:http';
import session from 'express-session';
import helmet from 'helmet';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { auditRouter } from './features/audit/audit.router';
import { accountRouter } from './features/auth/account.router';
import { authRouter } from './features/auth/auth.router';
import { configurePassport } from './features/auth/passport';
import { clubsRouter } from './features/clubs/clubs.router';
import { invitationsRouter } from './features/clubs/invitations.router';
import { proposalsRouter } from './features/clubs/proposals.router';
import { createDeviceGateway, withDeviceFastPath, type DeviceGateway } from './features/devices/device-gateway';
import { deviceRouter } from './features/devices/device.router';
import { clubBeaconsRouter, fleetRouter, stationDevicesRouter } from './features/devices/station-devices.router';
import { livenessRouter } from './features/liveness/liveness.router';
import { notificationsRouter } from './features/notifications/notifications.router';
import { pairingDeviceRouter, pairingRouter } from './features/devices/pairing.router';
import { deviceReceptionsRouter } from './features/receptions/device-receptions.router';
import { listeningPostsRouter } from './features/receptions/listening-posts.router';
import { receptionsRouter } from './features/receptions/receptions.router';
import { analysesRouter } from './features/receptions/analyses.router';
import { importsRouter } from './features/receptions/imports.router';
import { schedulesRouter } from './features/schedules/schedules.router';
import { stationsRouter } from './features/stations/stations.router';
import { unitsRouter } from './features/units/units.router';
import { createStorage, type FileStorage } from './storage';
import type { Logger } from './lib/logger';
import type { FakeSmtp } from './mail/fake-smtp';
import { inboxRouter } from './mail/inbox.router';
import type { Mailer } from './mail/mailer';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { originCheck } from './middleware/origin-check';
import { uploadLimit } from './middleware/upload-limit';
import { webAppRouter } from './web/static';

export type AppDeps = {
  config: Config;
  sequelize: Sequelize;
  mailer: Mailer;
  logger: Logger;
  /** The in-process fake SMTP server, when there is one: its inbox is served at /dev/inbox. */
  fakeSmtp?: FakeSmtp;
  /** Where uploads go; defaults to the driver named in the config. */
  storage?: FileStorage;
  /** The clock pairing codes are timed by (tests pass a controllable one). */
  now?: () => Date;
};

const CSP = {
  useDefaults: false,
  directives: {
    defaultSrc: ["'self'"],
    baseUri: ["'self'"],
    fontSrc: ["'self'"],
    formAction: ["'self'"],
    frameAncestors: ["'self'"],
    imgSrc: ["'self'", 'data:', 'blob:'],
    objectSrc: ["'none'"],
    scriptSrc: ["'self'"],
    scriptSrcAttr: ["'none'"],
    // react-native-web and expo-font add <style> elements at run time.
    styleSrc: ["'self'", "'unsafe-inline'"],
    connectSrc: ["'self'"],
  },
};

const LOOPBACK = /^(127\.\d+\.\d+\.\d+|::1|::ffff:127\.\d+\.\d+\.\d+)$/;

/** Only requests from this machine (after a loopback proxy, the client it names) get past; others see nothing there. */
function loopbackOnly(req: Request, res: Response, next: () => void) {
  if (LOOPBACK.test(req.ip ?? '')) return next();
  res.status(404).json({ error: { code: 'not-found', message: 'Not found' } });
}

/** The whole HTTP app without listen(), so tests drive it with supertest. */
export function createApp({
  config,
  sequelize,
  mailer,
  logger,
  fakeSmtp,
  storage = createStorage(config),
  now = () => new Date(),
}: AppDeps) {
  const app = express();
  const secureCookies = config.COOKIE_SECURE === 'true' || (config.COOKIE_SECURE === 'auto' && config.WEB_ORIGIN.startsWith('https:'));
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  // Devices first: bearer tokens only, no cookies or sessions, and the fewest layers on the hottest path.
  const deviceGateway = createDeviceGateway({ sequelize, config });
  app.locals.deviceGateway = deviceGateway;
  app.use('/api/device/v1/receptions', deviceReceptionsRouter({ sequelize, config }));
  app.use('/api/device/v1', pairingDeviceRouter({ sequelize, config, now }));
  const devices = deviceRouter({ db: sequelize, gateway: deviceGateway, config });
  app.locals.drainWrites = devices.drainWrites;
  app.use('/api/device/v1', devices);
  app.use(helmet({ contentSecurityPolicy: CSP, hsts: secureCookies, crossOriginEmbedderPolicy: false }));

  app.use('/api/health', livenessRouter(sequelize));

  const SessionStore = connectSessionSequelize(session.Store);
  const store = new SessionStore({ db: sequelize, checkExpirationInterval: 15 * 60_000, expiration: 14 * 24 * 3600_000 });
  // Refreshing a session's expiry happens after the answer is sent; if the database is down then, the
  // failure is logged, not handed to the next middleware (which would cut the already-answered connection).
  const touch = store.touch.bind(store);
  store.touch = (sid, data, callback) =>
    touch(sid, data, (error?: unknown) => {
      if (error) logger.warn({ err: error }, 'could not refresh a session expiry');
      callback?.(undefined);
    });
  const passport = configurePassport(config.BCRYPT_COST);
  const api = express.Router();
  api.use(originCheck([config.WEB_ORIGIN]));
  api.use(express.json({ limit: config.JSON_LIMIT }));
  api.use(
    session({
      name: 'faintline.sid',
      secret: config.SESSION_SECRET,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: false,
      cookie: { httpOnly: true, sameSite: 'lax', secure: secureCookies, maxAge: 14 * 24 * 3600_000 },
    }),
  );
  api.use(passport.session());
  // Answers for a signed-in person are never kept by a browser or proxy cache.
  api.use((req, res, next) => {
    if (req.user) res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.use('/auth', authRouter({ config, sequelize, mailer, logger }));
  api.use('/auth', accountRouter({ config, sequelize, mailer, logger, storage }));
  const uploads = uploadLimit(config.UPLOADS_PER_USER);
  for (const path of ['/units/:id/photos', '/reception-imports', '/reception-imports/preview']) api.post(path, uploads);
  const offlineAfterS = config.DEVICE_OFFLINE_AFTER_S;
  api.use(receptionsRouter({ sequelize }));
  api.use(analysesRouter({ sequelize }));
  api.use('/listening-posts', listeningPostsRouter({ sequelize }));
  api.use('/stations/:id', schedulesRouter({ sequelize }));
  api.use('/stations/:id', stationDevicesRouter({ sequelize, offlineAfterS }));
  api.use('/stations', stationsRouter({ sequelize }));
  api.use('/units', unitsRouter({ sequelize, storage, logger }));
  api.use('/fleet', fleetRouter({ offlineAfterS }));
  api.use('/clubs/:clubId/health', clubBeaconsRouter({ offlineAfterS }));
  api.use('/clubs', clubsRouter({ sequelize, mailer, logger, config }));
  api.use('/invitations', invitationsRouter({ sequelize }));
  api.use('/offset-proposals', proposalsRouter({ sequelize }));
  api.use('/notifications', notificationsRouter());
  api.use('/audit', auditRouter());
  api.use('/pairing', pairingRouter({ sequelize, config, now }));
  api.use(importsRouter({ sequelize, logger, maxBytes: config.IMPORT_MAX_MB * 1024 * 1024 }));
  api.use(apiNotFound);
  app.use('/api', api);

  // The local test inbox: development only, and only for requests from this machine.
  if (fakeSmtp && config.NODE_ENV !== 'production') app.use('/dev/inbox', loopbackOnly, inboxRouter(fakeSmtp));
  // The web app's bundle and fonts travel compressed (they are most of what a first visit downloads).
  app.use(compression());
  app.use(webAppRouter(config.WEB_DIST_DIR));
  app.use(errorHandler(logger));
  return app;
}

/** The app behind node:http, with device configuration polls answered on the fast path. */
export function createHttpHandler(app: ReturnType<typeof createApp>, logger: Logger) {
  const handleError = errorHandler(logger);
  // Express's final handler, for an error that arrives after the error handler already answered (a
  // middleware calling next(error) late): logged; a connection whose answer is complete is kept.
  const routed = (req: IncomingMessage, res: ServerResponse) =>
    app(req as Request, res as Response, (error?: unknown) => {
      if (!error) return;
      if (!res.headersSent) return handleError(error, req as Request, res as Response, () => undefined);
      logger.warn({ err: error, method: req.method, url: req.url }, 'error after the answer was sent');
      if (!res.writableEnded) res.destroy();
    });
  return withDeviceFastPath(app.locals.deviceGateway as DeviceGateway, routed, (error) =>
    logger.error({ err: error }, 'device config failed'),
  );
}
