import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '@/shared/api/contracts';
import { AppError, statusOf } from '../lib/app-error';
import type { Logger } from '../lib/logger';

function fieldsOf(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || 'body';
    fields[key] ??= issue.message;
  }
  return fields;
}

function describe(fields: Record<string, string>) {
  return `Check ${Object.keys(fields).join(', ')}: ${Object.values(fields)[0]}`;
}

type BodyParserError = Error & { type?: string; status?: number };

/** The one place that turns errors into `{ error: { code, message, fields } }`. Mounted last. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (error, req, res, _next) => {
    let body: ApiErrorBody;
    let status: number;
    const parserError = error as BodyParserError;
    if (error instanceof AppError) {
      status = statusOf[error.code];
      body = { error: { code: error.code, message: error.message, fields: error.fields } };
    } else if (error instanceof ZodError) {
      status = 400;
      const fields = fieldsOf(error);
      body = { error: { code: 'bad-request', message: describe(fields), fields } };
    } else if (parserError.type === 'entity.too.large') {
      status = 413;
      body = { error: { code: 'payload-too-large', message: 'The request body is too large' } };
    } else if (parserError.type === 'entity.parse.failed') {
      status = 400;
      body = { error: { code: 'bad-request', message: 'The request body is not valid JSON', fields: { body: 'Send valid JSON' } } };
    } else if (parserError.type && parserError.status && parserError.status < 500) {
      status = parserError.status;
      body = { error: { code: status === 415 ? 'unsupported-media-type' : 'bad-request', message: parserError.message } };
    } else {
      status = 500;
      logger.error({ err: error, method: req.method, url: req.originalUrl }, 'unhandled error');
      body = { error: { code: 'internal', message: 'Something went wrong on the server. It has been logged.' } };
    }
    if (res.headersSent) return;
    res.status(status).json(body);
  };
}

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not-found', message: `No API route ${req.method} ${req.originalUrl}` } } satisfies ApiErrorBody);
};
