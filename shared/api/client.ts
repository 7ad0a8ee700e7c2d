import type { ApiErrorBody, ApiErrorCode } from './contracts';

/** The one typed fetch wrapper: the web app, the CLI and the device simulator use it. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ApiErrorCode | 'network',
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

let baseUrl = '/api';
export function setApiBaseUrl(url: string) {
  baseUrl = url.replace(/\/$/, '');
}

type ApiOptions = { method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE'; body?: unknown };

/** A multipart body goes as it is (the runtime sets its boundary); anything else is sent as JSON. */
const isFormData = (body: unknown): body is FormData => typeof FormData !== 'undefined' && body instanceof FormData;

export async function api<T>(path: string, options: ApiOptions = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`${baseUrl}${path}`, {
      method: options.method ?? 'GET',
      credentials: 'include',
      headers:
        options.body === undefined || isFormData(options.body)
          ? { Accept: 'application/json' }
          : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: options.body === undefined ? undefined : isFormData(options.body) ? options.body : JSON.stringify(options.body),
    });
  } catch {
    throw new ApiError(0, 'network', 'Faintline cannot reach its server. Check your connection and try again.');
  }
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  const data = text ? safeJson(text) : undefined;
  if (!response.ok) {
    const body = data as ApiErrorBody | undefined;
    throw new ApiError(
      response.status,
      body?.error?.code ?? (response.status >= 500 ? 'internal' : 'bad-request'),
      body?.error?.message ?? `The server answered ${response.status}`,
      body?.error?.fields ?? {},
    );
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
