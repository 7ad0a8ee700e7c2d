/**
 * The simulated listening posts' HTTP calls (node:http, JSON in and out). Kept apart from the beacon simulator's
 * transport so both can change independently; it makes no call of its own.
 */
import { request as httpRequest } from 'node:http';
import { request as httpsRequest } from 'node:https';

export type JsonAnswer = { status: number; body: unknown };

export function sendJson(url: string, method: 'GET' | 'POST', token: string, body?: unknown): Promise<JsonAnswer> {
  const payload = body === undefined ? undefined : JSON.stringify(body);
  const request = url.startsWith('https:') ? httpsRequest : httpRequest;
  return new Promise((resolve, reject) => {
    const req = request(
      url,
      {
        method,
        headers: {
          Authorization: `Bearer ${token}`,
          Accept: 'application/json',
          ...(payload ? { 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(payload) } : {}),
        },
        timeout: 20_000,
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => {
          const text = Buffer.concat(chunks).toString('utf8');
          let parsed: unknown = text;
          try {
            parsed = text ? JSON.parse(text) : null;
          } catch {
            /* not JSON: keep the text */
          }
          resolve({ status: res.statusCode ?? 0, body: parsed });
        });
      },
    );
    req.on('timeout', () => req.destroy(new Error(`${method} ${url} timed out`)));
    req.on('error', reject);
    if (payload) req.write(payload);
    req.end();
  });
}
