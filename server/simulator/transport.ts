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
