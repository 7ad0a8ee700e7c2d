import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '@/shared/api/contracts';
import { AppError, statusOf } from '../lib/app-error';
import { isDatabaseUnavailable, UNAVAILABLE_MESSAGE } from '../lib/db-errors';
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

type BodyParserError = Error & { type?: string; status?: number; statusCode?: number };

/** A 4xx the framework or a parser attached to its error (a path that cannot be decoded, a malformed upload). */
function clientStatusOf(error: BodyParserError): number | null {
  const status = error.status ?? error.statusCode;
  return typeof status === 'number' && status >= 400 && status < 500 ? status : null;
}

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
    } else if (error instanceof URIError) {
      // Express decodes path parameters; "%", "%zz" or an invalid UTF-8 sequence cannot be decoded.
      status = 400;
      const message = 'The address contains a malformed %-escape: write % as %25';
      body = { error: { code: 'bad-request', message, fields: { path: message } } };
    } else if (clientStatusOf(parserError) !== null) {
      status = clientStatusOf(parserError)!;
      const code =
        status === 415 ? 'unsupported-media-type' : status === 413 ? 'payload-too-large' : status === 404 ? 'not-found' : 'bad-request';
      body = { error: { code, message: parserError.message } };
    } else if (isDatabaseUnavailable(error)) {
      status = 503;
      logger.warn({ err: error, method: req.method, url: req.originalUrl }, 'database unavailable');
      body = { error: { code: 'unavailable', message: UNAVAILABLE_MESSAGE } };
    } else {
      status = 500;
      logger.error({ err: error, method: req.method, url: req.originalUrl }, 'unhandled error');
      body = { error: { code: 'internal', message: 'Something went wrong on the server. It has been logged.' } };
    }
    if (res.headersSent) return;
    if (status === 503) res.setHeader('Retry-After', '5');
    if (status === 429 && !res.getHeader('Retry-After')) res.setHeader('Retry-After', '60');
    res.status(status).json(body);
  };
}

export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not-found', message: `No API route ${req.method} ${req.originalUrl}` } } satisfies ApiErrorBody);
};
