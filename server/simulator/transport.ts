/**
 * The simulated beacon's only way onto the network: the three device API calls, over fetch.
 * (The lint rules allow fetch here and in shared/api/client.ts only.)
 */
export type DeviceTransport = ReturnType<typeof deviceTransport>;

export function deviceTransport({ baseUrl, token }: { baseUrl: string; token: string }) {
  const call = (path: string, init: RequestInit = {}) =>
    fetch(`${baseUrl}/api/device/v1${path}`, {
      ...init,
      headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json', ...(init.headers ?? {}) },
    });
  const post = (path: string, body: unknown) => call(path, { method: 'POST', body: JSON.stringify(body) });

  return {
    /** The configuration (a 304 while `etag` is current). Asks for gzip, as firmware with an inflater would; fetch inflates it. */
    async config(etag: string | null) {
      const res = await call('/config', { headers: { 'Accept-Encoding': 'gzip', ...(etag ? { 'If-None-Match': etag } : {}) } });
      return { status: res.status, etag: res.headers.get('etag'), document: res.ok ? ((await res.json()) as unknown) : null };
    },
    /** The HTTP status of the answer. */
    transmissions: async (body: unknown) => (await post('/transmissions', body)).status,
    heartbeat: async (body: unknown) => (await post('/heartbeat', body)).status,
  };
}

/** The simulator's way onto the network (the one server-side caller of fetch besides the benchmarks). */
export type DeviceAnswer = { status: number; headers: Headers; body: unknown };

export async function deviceRequest(
  url: string,
  init: { method?: 'GET' | 'POST'; token?: string; form?: Record<string, string>; headers?: Record<string, string> } = {},
): Promise<DeviceAnswer> {
  const headers: Record<string, string> = { Accept: 'application/json', ...(init.headers ?? {}) };
  if (init.token) headers.Authorization = `Bearer ${init.token}`;
  if (init.form) headers['Content-Type'] = 'application/x-www-form-urlencoded';
  const res = await fetch(url, {
    method: init.method ?? (init.form ? 'POST' : 'GET'),
    headers,
    body: init.form ? new URLSearchParams(init.form).toString() : undefined,
  });
  const text = await res.text();
  let body: unknown = text;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON: keep the text */
  }
  return { status: res.status, headers: res.headers, body };
}
