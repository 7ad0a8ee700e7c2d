import { acceptsGzip, gzipEtagOf, ifNoneMatchHits } from '@/server/features/devices/config-representation';

describe('If-None-Match', () => {
  const current = ['"xyzzy"', gzipEtagOf('"xyzzy"')];

  it('when the header lists tags, matches any current one by weak comparison', () => {
    // RFC 9110 §13.1.2 gives these forms: a single tag, a list, W/ weak tags, and "*"
    expect(ifNoneMatchHits('"xyzzy"', current)).toBe(true);
    expect(ifNoneMatchHits('"r2d2xxxx", "c3piozzzz", "xyzzy"', current)).toBe(true);
    expect(ifNoneMatchHits('W/"xyzzy"', current)).toBe(true);
    expect(ifNoneMatchHits('*', current)).toBe(true);
    expect(ifNoneMatchHits('"xyzzy-gz"', current)).toBe(true);
  });

  it('when no tag is current or the header is missing, does not match', () => {
    expect(ifNoneMatchHits('"r2d2xxxx", "c3piozzzz"', current)).toBe(false);
    expect(ifNoneMatchHits('xyzzy', current)).toBe(false);
    expect(ifNoneMatchHits(undefined, current)).toBe(false);
  });
});

describe('Accept-Encoding', () => {
  it('when gzip is acceptable (RFC 9110 §12.5.3 examples), prefers it', () => {
    expect(acceptsGzip('gzip')).toBe(true);
    expect(acceptsGzip('compress, gzip')).toBe(true);
    expect(acceptsGzip('*')).toBe(true);
    expect(acceptsGzip('gzip, deflate, br')).toBe(true);
  });

  it('when gzip is absent or refused, answers plain', () => {
    expect(acceptsGzip(undefined)).toBe(false);
    expect(acceptsGzip('')).toBe(false);
    expect(acceptsGzip('identity')).toBe(false);
    expect(acceptsGzip('gzip;q=0, identity; q=0.5')).toBe(false);
    expect(acceptsGzip('compress;q=0.5, deflate;q=1.0')).toBe(false);
  });
});
