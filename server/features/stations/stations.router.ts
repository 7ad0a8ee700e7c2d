import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import {
  calibrationFromReportsQuery,
  calibrationInput,
  measurementInput,
  stationBandInput,
  stationInput,
  stationPatch,
  bandIdField,
} from '@/shared/schemas';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import { AppError } from '../../lib/app-error';
import { fromReportsFor } from './calibration-from-reports.service';
import * as stations from './stations.service';

export function stationsRouter({ sequelize }: { sequelize: Sequelize }) {
  const router = Router();
  router.use(requireSignedIn);
  const id = (value: unknown) => parseId(value, 'Station');

  router.get('/', async (req, res) => {
    res.json(await stations.listFor(currentUser(req)));
  });
  router.post('/', async (req, res) => {
    const input = stationInput.parse(req.body) as Required<ReturnType<typeof stationInput.parse>>;
    res.status(201).json(await stations.create(sequelize, currentUser(req), input));
  });
  router.get('/:id', async (req, res) => {
    res.json(await stations.getFor(currentUser(req), id(req.params.id)));
  });
  router.patch('/:id', async (req, res) => {
    const patch = stationPatch.parse(req.body);
    res.json(await stations.update(sequelize, currentUser(req), id(req.params.id), patch));
  });
  router.delete('/:id', async (req, res) => {
    await stations.remove(sequelize, currentUser(req), id(req.params.id));
    res.status(204).end();
  });

  router.put('/:id/bands/:bandId', async (req, res) => {
    const bandId = bandIdField.safeParse(req.params.bandId);
    if (!bandId.success) throw new AppError('not-found', `There is no band ${req.params.bandId}`);
    res.json(await stations.setBand(sequelize, currentUser(req), id(req.params.id), bandId.data, stationBandInput.parse(req.body)));
  });
  router.post('/:id/calibration', async (req, res) => {
    res.json(await stations.saveCalibration(sequelize, currentUser(req), id(req.params.id), calibrationInput.parse(req.body)));
  });
  router.get('/:id/calibration/from-reports', async (req, res) => {
    const query = calibrationFromReportsQuery.parse(req.query);
    res.json(await fromReportsFor(sequelize, currentUser(req), id(req.params.id), query, Date.now()));
  });
  router.post('/:id/calibration/proposal', async (req, res) => {
    res.json(await stations.proposeCalibration(currentUser(req), id(req.params.id), measurementInput.parse(req.body)));
  });
  router.get('/:id/config', async (req, res) => {
    const config = await stations.configFor(currentUser(req), id(req.params.id));
    if (req.query.download !== undefined) {
      const name = `faintline-${config.station.callsign.replace(/\W+/g, '-')}-station-${config.station.id}.json`;
      res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
    }
    res.json(config);
  });
  return router;
}
