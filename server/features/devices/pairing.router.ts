import type { Sequelize } from 'sequelize';
import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { pairingApproveInput, pairingRequestInput, userCodeField } from '@/shared/schemas';
import type { Config } from '../../config';
import { AppError } from '../../lib/app-error';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as pairing from './pairing.service';

type Deps = { sequelize: Sequelize; config: Config; now: () => Date };

/** RFC 6749 §5.1: answers carrying codes or tokens are never stored by caches. */
function send(res: Response, answer: pairing.OAuthAnswer) {
  res.set({ 'Cache-Control': 'no-store', Pragma: 'no-cache' }).status(answer.status).json(answer.body);
}

const bodyOf = (req: Request) => (req.body && typeof req.body === 'object' ? (req.body as Record<string, unknown>) : {});

/**
 * The device's half of pairing (RFC 8628), under /api/device/v1 ahead of the bearer-token routes:
 * POST /pairing hands out the codes, POST /token is polled until the owner decides. Form-encoded
 * bodies (as the RFC's examples) and JSON are both read; errors are RFC 6749 §5.2 JSON.
 */
export function pairingDeviceRouter({ sequelize, config, now }: Deps) {
  const router = Router();
  const parse = [express.urlencoded({ extended: false, limit: '8kb' }), express.json({ limit: '8kb' })];
  const perAddress = (limit: number, windowMs: number, what: string, error: string) =>
    rateLimit({
      windowMs,
      limit,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: (_req, res) =>
        send(res, { status: 429, body: { error, error_description: `Too many ${what} from this address; wait and try again` } }),
    });

  router.post(
    '/pairing',
    perAddress(config.PAIRING_REQUESTS_PER_ADDRESS, 10 * 60_000, 'pairing requests', 'temporarily_unavailable'),
    ...parse,
    async (req, res) => {
      const input = pairingRequestInput.safeParse(bodyOf(req));
      if (!input.success) {
        const issue = input.error.issues[0];
        return send(res, {
          status: 400,
          body: { error: 'invalid_request', error_description: `${issue.path.join('.')}: ${issue.message}` },
        });
      }
      send(res, await pairing.requestPairing(input.data, config.WEB_ORIGIN, now()));
    },
  );

  // Devices waiting behind one address poll every few seconds each; this only stops a flood.
  router.post('/token', perAddress(600, 60_000, 'token requests', 'slow_down'), ...parse, async (req, res) => {
    send(res, await pairing.pollToken(sequelize, bodyOf(req), now()));
  });

  router.all(['/pairing', '/token'], (_req, res) =>
    send(res, { status: 400, body: { error: 'invalid_request', error_description: 'Use POST' } }),
  );

  // A body that cannot be read is the device's mistake, answered in the same shape.
  router.use((error: Error & { type?: string }, _req: Request, res: Response, next: NextFunction) => {
    if (!error.type?.startsWith('entity.') && error.type !== 'charset.unsupported' && error.type !== 'encoding.unsupported')
      return next(error);
    send(res, { status: 400, body: { error: 'invalid_request', error_description: 'The request body could not be read' } });
  });
  return router;
}

const limitsOf = (config: Config): pairing.AttemptLimits => ({
  perAccount: config.PAIRING_CODE_ATTEMPTS,
  perAddress: config.PAIRING_ADDRESS_ATTEMPTS,
});

/** The owner's half, at /api/pairing (cookie session): look a code up, approve it for a station, or refuse it. */
export function pairingRouter({ sequelize, config, now }: Deps) {
  const router = Router();
  router.use(requireSignedIn);
  const codeOf = (req: Request) => {
    const parsed = userCodeField.safeParse(String(req.params.userCode ?? ''));
    if (!parsed.success) throw new AppError('bad-request', parsed.error.issues[0].message, { code: parsed.error.issues[0].message });
    return parsed.data;
  };
  const addressOf = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');

  router.get('/:userCode', async (req, res) => {
    res.set('Cache-Control', 'no-store');
    res.json(await pairing.describe(currentUser(req), codeOf(req), addressOf(req), limitsOf(config), now()));
  });
  router.post('/:userCode/approve', async (req, res) => {
    const code = codeOf(req);
    const { targetId } = pairingApproveInput.parse(req.body ?? {});
    res.json(await pairing.approve(sequelize, currentUser(req), code, targetId, addressOf(req), limitsOf(config), now()));
  });
  router.post('/:userCode/refuse', async (req, res) => {
    res.json(await pairing.refuse(sequelize, currentUser(req), codeOf(req), addressOf(req), limitsOf(config), now()));
  });
  return router;
}
