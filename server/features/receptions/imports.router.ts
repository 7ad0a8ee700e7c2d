/**
 * File imports of reception reports (mounted under /api):
 *   POST /reception-imports/preview  multipart: optional field `mapping` (JSON), then `file` (only its first 64 KB are read)
 *   POST /reception-imports          multipart: optional fields `mapping` (JSON) and `fileSize`, then `file` → 202 {id}
 *   GET  /reception-imports, /reception-imports/:id, /reception-imports/:id/rejected.csv
 *   GET/POST /reception-mappings, DELETE /reception-mappings/:id
 * Fields must come before the file part: the file is read as it arrives and never waits for a later field.
 */
import busboy from 'busboy';
import { Router, type NextFunction, type Request, type Response } from 'express';
import type { Readable } from 'node:stream';
import type { Sequelize } from 'sequelize';
import type { ImportMapping } from '@/shared/api/receptions';
import { importMappingSchema, savedMappingInput } from '@/shared/schemas';
import { AppError } from '../../lib/app-error';
import type { Logger } from '../../lib/logger';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as imports from './imports.service';

type Deps = { sequelize: Sequelize; logger: Logger; maxBytes: number };

type FilePart = { file: Readable; fileName: string; fields: Record<string, string> };

function mappingField(value: string | undefined): ImportMapping | null {
  if (value === undefined || value.trim() === '') return null;
  let json: unknown;
  try {
    json = JSON.parse(value);
  } catch {
    throw new AppError('bad-request', 'The field "mapping" is not valid JSON', { mapping: 'Send the mapping as JSON' });
  }
  const parsed = importMappingSchema.safeParse(json);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new AppError('bad-request', `The mapping is not usable: ${issue.message}`, {
      [`mapping.${issue.path.join('.')}`]: issue.message,
    });
  }
  return parsed.data;
}

/**
 * Reads a multipart request up to its `file` part and hands that part over as a stream (fields sent before it
 * come along). Anything wrong with the form itself becomes a 4xx.
 */
function withFilePart(req: Request, maxBytes: number, onFile: (part: FilePart) => Promise<void>): Promise<void> {
  return new Promise((resolve, reject) => {
    let form: busboy.Busboy;
    try {
      form = busboy({ headers: req.headers, limits: { files: 1, fields: 10, fileSize: maxBytes, fieldSize: 256 * 1024 } });
    } catch {
      req.resume();
      reject(
        new AppError('unsupported-media-type', 'Send the file as multipart/form-data in the field "file"', {
          file: 'Choose a file to upload',
        }),
      );
      return;
    }
    const fields: Record<string, string> = {};
    let handled = false;
    form.on('field', (name, value) => {
      fields[name] = value;
    });
    form.on('file', (name, file, info) => {
      if (name !== 'file' || handled) {
        file.resume();
        return;
      }
      handled = true;
      onFile({ file, fileName: info.filename || 'upload.csv', fields }).then(resolve, reject);
    });
    form.on('error', (error) => {
      if (handled) return;
      handled = true;
      reject(
        new AppError('bad-request', `The upload could not be read as a form: ${(error as Error).message}`, {
          file: 'Upload the file again',
        }),
      );
    });
    form.on('close', () => {
      if (handled) return;
      handled = true;
      reject(new AppError('bad-request', 'No file was sent: put it in the form field "file"', { file: 'Choose a file to upload' }));
    });
    req.pipe(form);
  });
}

/** Refuses a request whose declared size is above the limit before reading it (its body is read and dropped). */
function refuseOversize(req: Request, maxBytes: number) {
  const declared = Number(req.headers['content-length']);
  // The form's own boundaries and fields add a few KB around the file.
  if (Number.isFinite(declared) && declared > maxBytes + 64 * 1024) {
    req.resume();
    throw new AppError('payload-too-large', `The file is larger than the import limit of ${Math.round(maxBytes / 1024 / 1024)} MB`, {
      file: `Choose a file of at most ${Math.round(maxBytes / 1024 / 1024)} MB`,
    });
  }
}

export function importsRouter({ sequelize, logger, maxBytes }: Deps) {
  const router = Router();
  router.use(['/reception-imports', '/reception-mappings'], requireSignedIn);

  router.post('/reception-imports/preview', async (req: Request, res: Response) => {
    await withFilePart(req, maxBytes, async ({ file, fileName, fields }) => {
      let given: ImportMapping | null;
      try {
        given = mappingField(fields.mapping);
      } catch (error) {
        file.resume();
        throw error;
      }
      const { head, complete } = await imports.readHead(file);
      file.resume();
      res.json(imports.preview(fileName, head, complete, given));
    });
  });

  router.post('/reception-imports', async (req: Request, res: Response) => {
    const user = currentUser(req);
    refuseOversize(req, maxBytes);
    await withFilePart(req, maxBytes, async ({ file, fileName, fields }) => {
      let given: ImportMapping | null;
      try {
        given = mappingField(fields.mapping);
      } catch (error) {
        file.resume();
        throw error;
      }
      const declared = Number(fields.fileSize ?? req.headers['content-length'] ?? 0);
      const bytesTotal = Number.isFinite(declared) && declared > 0 ? Math.min(declared, maxBytes) : 0;
      const job = await imports.startImport({ sequelize, logger }, user.id, { fileName, bytesTotal, maxBytes, mapping: given, file });
      // Answered once the whole upload has been read: an HTTP/1.1 answer sent earlier stops clients from sending the
      // rest. The job is listed (running, with its progress) from its first 64 KB on; storing goes on after the answer.
      await job.received;
      res.status(202).json({ id: job.id });
    });
  });

  router.get('/reception-imports', async (req, res) => {
    res.json(await imports.recentImports(sequelize, currentUser(req).id));
  });
  router.get('/reception-imports/:id', async (req, res) => {
    res.json(await imports.statusOf(sequelize, currentUser(req).id, parseId(req.params.id, 'Import')));
  });
  router.get('/reception-imports/:id/rejected.csv', async (req: Request, res: Response, next: NextFunction) => {
    const importId = parseId(req.params.id, 'Import');
    const lines = imports.rejectedCsv(sequelize, currentUser(req).id, importId);
    // The first line is produced only after the ownership check, so a 404 is still possible here.
    const first = await lines.next();
    res.type('text/csv').attachment(`faintline-import-${importId}-rejected.csv`);
    res.write(first.value ?? '');
    try {
      for await (const chunk of lines) if (!res.write(chunk)) await new Promise((r) => res.once('drain', r));
      res.end();
    } catch (error) {
      res.destroy();
      next(error);
    }
  });

  router.get('/reception-mappings', async (req, res) => {
    res.json(await imports.listMappings(sequelize, currentUser(req).id));
  });
  router.post('/reception-mappings', async (req, res) => {
    const input = savedMappingInput.parse(req.body);
    res.status(201).json(await imports.saveMapping(sequelize, currentUser(req).id, input, new Date()));
  });
  router.delete('/reception-mappings/:id', async (req, res) => {
    await imports.removeMapping(sequelize, currentUser(req).id, parseId(req.params.id, 'Mapping'));
    res.status(204).end();
  });
  return router;
}
