import { pathBetween, pathBetweenLocators } from '@/shared/domain/path';
import { locatorToLatLon } from '@/shared/domain/locator';

describe('pathBetween', () => {
  it.each([
    // geographiclib-geodesic README: Wellington (41.32S, 174.81E) to Salamanca (40.96N, 5.50W) is 19959679.267 m
    ['Wellington to Salamanca', { lat: -41.32, lon: 174.81 }, { lat: 40.96, lon: -5.5 }, 19959.679267, null],
    // geographiclib's test suite (GeodSolve0): JFK to CDG, azi1 53.47022°, s12 5853226 m
    ['JFK to CDG', { lat: 40.6, lon: -73.8 }, { lat: 49.01666667, lon: 2.55 }, 5853.226, 53.47022],
    // GeodTest.dat sample in geographiclib's test suite: azi1 22.020059880982801°, s12 4105086.1713924406 m
    ['GeodTest sample', { lat: 55.52454, lon: 106.05087 }, { lat: 77.03196, lon: 197.18234 }, 4105.0861713924406, 22.020059880982801],
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
  it('when given two locators, measures between the centres of their squares', () => {
    const a = locatorToLatLon('FN31pr');
    const b = locatorToLatLon('JN58td');
    const r = pathBetweenLocators('FN31pr', 'JN58td');
    expect(r.ok && a.ok && b.ok && r.distanceKm).toBeCloseTo(pathBetween(a as never, b as never).distanceKm, 9);
  });

  it('when a locator is invalid, refuses with its reason', () => {
    expect(pathBetweenLocators('ZZ99', 'JN58')).toMatchObject({ ok: false, reason: expect.stringMatching(/A–R/) });
  });
});
