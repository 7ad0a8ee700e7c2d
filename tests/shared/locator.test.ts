import { latLonToLocator, locatorToLatLon, validateLocator } from '@/shared/domain/locator';

// Positions and locators: the first four from E. T. Tyson, "Conversion Between Geodetic and
// Grid Locator Systems", QST January 1989; Newington and Palo Alto from W. Underwood's published
// converter self-test (ham.stackexchange answer "How can one convert from lat/long to grid square").
describe('latLonToLocator', () => {
  it.each([
    ['Munich', 48.14666, 11.60833, 'JN58td'],
    ['Montevideo', -34.91, -56.21166, 'GF15vc'],
    ['Washington, DC', 38.92, -77.065, 'FM18lw'],
    ['Wellington', -41.28333, 174.745, 'RE78ir'],
    ['Newington, CT', 41.714775, -72.72726, 'FN31pr'],
    ['Palo Alto', 37.413708, -122.1073236, 'CM87wj'],
  ])('when the position is %s, gives %s', (_place, lat, lon, locator) => {
    expect(latLonToLocator({ lat, lon }, 6)).toEqual({ ok: true, locator });
  });

  it.each([
    [2, 'JN'],
    [4, 'JN58'],
    [8, 'JN58td'],
  ])('when the precision is %i, gives that many characters', (precision, prefix) => {
    const r = latLonToLocator({ lat: 48.14666, lon: 11.60833 }, precision);
    expect(r.ok && r.locator.length === precision && r.locator.startsWith(prefix)).toBe(true);
  });

  it.each([
    [{ lat: 90, lon: 180 }, 'RR99xx'],
    [{ lat: -90, lon: -180 }, 'AA00aa'],
  ])('when the position is a corner of the world %j, stays inside the grid', (position, locator) => {
    expect(latLonToLocator(position, 6)).toEqual({ ok: true, locator });
  });

  // Positions a hair west of the prime meridian (or south of the equator) lie in field I (20°W…0°; 10°S…0°),
  // square 9, by the Maidenhead definition (Tyson, QST January 1989); each character must stay in its range.
  it.each([
    [{ lat: 10, lon: -1e-8 }, 4, 'IK90'],
    [{ lat: 0, lon: -1e-10 }, 4, 'IJ90'],
    [{ lat: 0, lon: -1e-10 }, 8, 'IJ90xa90'],
    [{ lat: -1e-9, lon: 0 }, 6, 'JI09ax'],
  ])('when the position %j sits just below a boundary, gives the cell it is in (%i characters: %s)', (position, precision, locator) => {
    const r = latLonToLocator(position, precision);
    expect(r).toEqual({ ok: true, locator });
    if (r.ok) expect(r.locator).toMatch(/^[A-R]{2}(\d{2}([a-x]{2}(\d{2})?)?)?$/);
  });

  it.each([
    [{ lat: 91, lon: 0 }, 6, /Latitude/],
    [{ lat: 0, lon: 181 }, 6, /Longitude/],
    [{ lat: 0, lon: 0 }, 5, /Precision/],
  ])('when given %j at precision %i, refuses', (position, precision, reason) => {
    const r = latLonToLocator(position, precision);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});

describe('locatorToLatLon', () => {
  // centres follow from the cell sizes of the Maidenhead system (20°×10°, 2°×1°, 5′×2.5′, 0.5′×0.25′)
  it.each([
    ['JN', 45, 10],
    ['JN58', 48.5, 11],
    ['JN58td', 48.1458333, 11.625],
    ['jn58TD', 48.1458333, 11.625],
    ['FN31pr', 41.7291667, -72.7083333],
    ['JN58td25', 48.1479167, 11.6041667],
  ])('when the locator is %s, gives the centre %p, %p', (locator, lat, lon) => {
    const r = locatorToLatLon(locator);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.lat).toBeCloseTo(lat, 6);
    expect(r.lon).toBeCloseTo(lon, 6);
  });

  it('when the centre is converted back, gives the same locator', () => {
    for (const locator of ['JN58td', 'GF15vc', 'FM18lw', 'RE78ir', 'FN31pr45', 'AA00aa', 'RR99xx']) {
      const c = locatorToLatLon(locator);
      expect(c.ok && latLonToLocator(c, locator.length)).toEqual({ ok: true, locator });
    }
  });
});

describe('validateLocator', () => {
  it.each([
    ['ZZ99', /1st character.*A–R/],
    ['FN3', /2, 4, 6 or 8/],
    ['FNA1', /3rd character.*digit/],
    ['FN31zz', /5th character.*A–X/],
  ])('when given %s, refuses and says which character to fix', (text, reason) => {
    const r = validateLocator(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});
