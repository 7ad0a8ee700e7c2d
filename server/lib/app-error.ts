import type { ApiErrorCode } from '@/shared/api/contracts';

export const statusOf: Record<ApiErrorCode, number> = {
  'bad-request': 400,
  unauthenticated: 401,
  forbidden: 403,
  'not-found': 404,
  conflict: 409,
  'payload-too-large': 413,
  'unsupported-media-type': 415,
  'rate-limited': 429,
  unavailable: 503,
  internal: 500,
};

/** The one error a service throws: its code decides the HTTP status. */
export class AppError extends Error {
  constructor(
    readonly code: ApiErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}
