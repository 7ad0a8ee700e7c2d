import { pathBetween, pathBetweenLocators } from '@/shared/domain/path';
import { vincentyInverse } from './fixtures/vincenty';

describe('pathBetween', () => {
  it.each([
    // geographiclib-geodesic README: Wellington (41.32S, 174.81E) to Salamanca (40.96N, 5.50W) is 19959679.267 m
    ['Wellington to Salamanca', { lat: -41.32, lon: 174.81 }, { lat: 40.96, lon: -5.5 }, 19959.679267, null],
    // geographiclib's test suite (GeodSolve0): JFK to CDG, azi1 53.47022°, s12 5853226 m
    ['JFK to CDG', { lat: 40.6, lon: -73.8 }, { lat: 49.01666667, lon: 2.55 }, 5853.226, 53.47022],
    // GeodTest.dat sample in geographiclib's test suite: azi1 22.020059880982801°, s12 4105086.1713924406 m
    // (values to 15 significant digits, as many as a double holds)
    ['GeodTest sample', { lat: 55.52454, lon: 106.05087 }, { lat: 77.03196, lon: 197.18234 }, 4105.08617139244, 22.0200598809828],
  ])('when the path is %s, gives the published distance and bearing', (_name, from, to, distanceKm, bearingDeg) => {
    const r = pathBetween(from, to);
    expect(r.distanceKm).toBeCloseTo(distanceKm, 3);
    if (bearingDeg !== null) expect(r.bearingDeg).toBeCloseTo(bearingDeg, 4);
  });

  it('when the bearing is westward, gives it in 0–360°', () => {
    const r = pathBetween({ lat: 0, lon: 10 }, { lat: 0, lon: 0 });
    expect(r.bearingDeg).toBeCloseTo(270, 6);
  });
});

describe('pathBetweenLocators', () => {
  // Centres from the Maidenhead definition (FN31pr: 72°42.5′W 41°43.75′N; JN58td: 11°37.5′E 48°8.75′N),
  // distance and bearing from an independent Vincenty (1975) inverse on WGS84 (tests/shared/fixtures/vincenty.ts).
  it('when given two locators, measures between the centres of their squares', () => {
    const r = pathBetweenLocators('FN31pr', 'JN58td');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.from).toEqual({ lat: expect.closeTo(41 + 43.75 / 60, 9), lon: expect.closeTo(-(72 + 42.5 / 60), 9) });
    expect(r.to).toEqual({ lat: expect.closeTo(48 + 8.75 / 60, 9), lon: expect.closeTo(11 + 37.5 / 60, 9) });
    const check = vincentyInverse(r.from.lat, r.from.lon, r.to.lat, r.to.lon);
    expect(r.distanceKm).toBeCloseTo(check.distanceKm, 5);
    expect(r.bearingDeg).toBeCloseTo(check.bearingDeg, 6);
    // and the Vincenty check itself reproduces geographiclib's published JFK → CDG figure (GeodSolve0)
    expect(vincentyInverse(40.6, -73.8, 49.01666667, 2.55).distanceKm).toBeCloseTo(5853.226, 3);
  });

  it('when a locator is invalid, refuses with its reason', () => {
    expect(pathBetweenLocators('ZZ99', 'JN58')).toMatchObject({ ok: false, reason: expect.stringMatching(/A–R/) });
  });
});
