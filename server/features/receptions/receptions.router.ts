import { Router, type Response } from 'express';
import type { Sequelize } from 'sequelize';
import { REPORT_CSV_HEADER, reportCsvLine } from '@/shared/domain/reception';
import { receptionQuery } from '@/shared/schemas';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as receptions from './receptions.service';

/** Writes the CSV a chunk at a time, waiting for the socket to drain: memory stays flat whatever the period. */
async function streamCsv(res: Response, fileName: string, chunks: AsyncGenerator<Parameters<typeof reportCsvLine>[0][]>) {
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
  res.setHeader('Cache-Control', 'no-store');
  res.write(`${REPORT_CSV_HEADER}\n`);
  for await (const chunk of chunks) {
    if (res.destroyed) break;
    const text = chunk.map((r) => `${reportCsvLine(r)}\n`).join('');
    if (!res.write(text)) await new Promise<void>((resolve) => res.once('drain', resolve).once('close', resolve));
  }
  res.end();
}

const day = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** Reading reception reports: per station, everything one brought in, reach figures and the overview. */
export function receptionsRouter({ sequelize }: { sequelize: Sequelize }) {
  const router = Router();
  router.use(['/stations/at-a-glance', '/stations/:id/receptions', '/stations/:id/reach', '/receptions'], requireSignedIn);
  const id = (value: unknown) => parseId(value, 'Station');

  router.get('/stations/at-a-glance', async (req, res) => {
    res.json(await receptions.atAGlance(sequelize, currentUser(req), Date.now()));
  });

  router.get('/stations/:id/receptions', async (req, res) => {
    const query = receptionQuery.parse(req.query);
    const stationId = id(req.params.id);
    if (query.format === 'csv') {
      const { scope, period, label } = await receptions.exportScope(sequelize, currentUser(req), { stationId }, query, Date.now());
      const name = `faintline-receptions-${label.replace(/\W+/g, '-')}-${day(period.fromMs)}-${day(period.toMs - 1)}.csv`;
      return streamCsv(res, name, receptions.reportChunks(sequelize, scope, period));
    }
    res.json(await receptions.stationReports(sequelize, currentUser(req), stationId, query, Date.now()));
  });

  router.get('/stations/:id/reach', async (req, res) => {
    res.json(await receptions.reach(sequelize, currentUser(req), id(req.params.id), receptionQuery.parse(req.query), Date.now()));
  });

  router.get('/receptions', async (req, res) => {
    const query = receptionQuery.parse(req.query);
    const importerId = req.query.importerId === undefined ? undefined : parseId(req.query.importerId, 'Person');
    if (query.format === 'csv') {
      const { scope, period, label } = await receptions.exportScope(sequelize, currentUser(req), { importerId }, query, Date.now());
      return streamCsv(
        res,
        `faintline-receptions-${label}-${day(period.fromMs)}-${day(period.toMs - 1)}.csv`,
        receptions.reportChunks(sequelize, scope, period),
      );
    }
    res.json(await receptions.importedReports(sequelize, currentUser(req), importerId, query, Date.now()));
  });
  return router;
}
