import type { Request, Response } from 'express';
import multer from 'multer';
import { AppError } from './app-error';

type SingleUpload = { field: string; maxBytes: number; types: readonly string[]; what: string; typesInWords: string };

/**
 * One file from a multipart form, held in memory. Every way the form can be wrong (too large,
 * wrong type, a malformed or control-character part header, a cut-off body) ends as a 4xx
 * AppError naming the field; the parser's own errors never reach the error handler as a 500.
 */
export function singleUpload({ field, maxBytes, types, what, typesInWords }: SingleUpload) {
  const mb = maxBytes / 1024 / 1024;
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 5, fieldNameSize: 100, headerPairs: 20, parts: 6 },
    fileFilter: (_req, file, done) => {
      if (types.includes(file.mimetype)) return done(null, true);
      done(
        new AppError('unsupported-media-type', `A ${what} must be ${typesInWords}; this file is ${file.mimetype}`, {
          [field]: `Choose a ${typesInWords} ${what}`,
        }),
      );
    },
  }).single(field);

  return (req: Request, res: Response) =>
    new Promise<Express.Multer.File>((resolve, reject) => {
      parse(req, res, (error: unknown) => {
        if (error instanceof AppError) return reject(error);
        if (error instanceof multer.MulterError) {
          return reject(
            error.code === 'LIMIT_FILE_SIZE'
              ? new AppError('payload-too-large', `A ${what} may be at most ${mb} MB`, { [field]: `Choose a ${what} of at most ${mb} MB` })
              : new AppError('bad-request', `Upload one ${what} in the field '${field}' (${error.message})`, {
                  [field]: `Upload one ${what}`,
                }),
          );
        }
        if (error) {
          // busboy: "Malformed part header", "Unexpected end of form", a missing boundary, a NUL in a header.
          const detail = error instanceof Error ? error.message : 'unreadable form';
          return reject(
            new AppError('bad-request', `The upload is not a well-formed multipart form (${detail})`, { [field]: `Upload one ${what}` }),
          );
        }
        if (!req.file) return reject(new AppError('bad-request', `No ${what} was sent`, { [field]: `Choose a ${what} to upload` }));
        resolve(req.file);
      });
    });
}
