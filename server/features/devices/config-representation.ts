import Negotiator from 'negotiator';
import { gzipSync } from 'node:zlib';

/**
 * A device configuration kept ready to send in both encodings, compressed once per change.
 * Each encoding has its own strong ETag (they are different representations of one version).
 */
export type ConfigRepresentations = {
  identity: { etag: string; body: Buffer };
  gzip: { etag: string; body: Buffer };
};

export const gzipEtagOf = (etag: string) => `${etag.slice(0, -1)}-gz"`;

/** One version's ETags: the plain one, the gzip one, and both for an If-None-Match check. */
export type ConfigEtags = { identity: string; gzip: string; all: readonly string[] };

export function etagsFor(identity: string): ConfigEtags {
  const gzip = gzipEtagOf(identity);
  return { identity, gzip, all: [identity, gzip] };
}

export function representationsOf(etags: ConfigEtags, document: unknown): ConfigRepresentations {
  const body = Buffer.from(JSON.stringify(document));
  return { identity: { etag: etags.identity, body }, gzip: { etag: etags.gzip, body: gzipSync(body) } };
}

// A fleet sends a handful of distinct Accept-Encoding headers: each is parsed once.
const gzipAnswers = new Map<string, boolean>();

/** True when the client takes gzip (Accept-Encoding, with q-values); most device libraries can ask for it. */
export function acceptsGzip(acceptEncoding: string | undefined) {
  if (!acceptEncoding) return false;
  let answer = gzipAnswers.get(acceptEncoding);
  if (answer === undefined) {
    answer = new Negotiator({ headers: { 'accept-encoding': acceptEncoding } }).encoding(['gzip', 'identity']) === 'gzip';
    if (gzipAnswers.size < 256) gzipAnswers.set(acceptEncoding, answer);
  }
  return answer;
}

/** If-None-Match by weak comparison (RFC 9110 §13.1.2): a list of tags, W/ prefixes, or "*". */
export function ifNoneMatchHits(ifNoneMatch: string | undefined, etags: readonly string[]) {
  if (!ifNoneMatch) return false;
  if (etags.includes(ifNoneMatch)) return true;
  return ifNoneMatch.split(',').some((raw) => {
    const tag = raw.trim();
    return tag === '*' || etags.includes(tag.startsWith('W/') ? tag.slice(2) : tag);
  });
}
