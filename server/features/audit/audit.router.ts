import { Router } from 'express';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as audit from './audit.service';

/** Mounted at /api/audit — an operator's own log (JSON, or CSV with ?format=csv). A club's log is under /api/clubs/:clubId/audit. */
export function auditRouter() {
  const router = Router();
  router.use(requireSignedIn);
  router.get('/', async (req, res) => {
    const entries = await audit.listForOwner(currentUser(req).id);
    if (req.query.format === 'csv') res.type('text/csv').attachment('faintline-my-log.csv').send(audit.toCsv(entries));
    else res.json(entries);
  });
  return router;
}
