/**
 * The world map's geometry: Natural Earth land outlines (world-atlas, 1:110 million) through an Equal
 * Earth projection turned so the station sits on the centre meridian. Shipped with the app: no tiles,
 * works offline.
 */
import { geoEqualEarth, geoGraticule10, geoPath, type GeoProjection } from 'd3-geo';
import type { Feature, FeatureCollection, Geometry, MultiPolygon } from 'geojson';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import land110 from 'world-atlas/land-110m.json';

const topology = land110 as unknown as Topology<{ land: GeometryCollection }>;
let landCache: FeatureCollection<MultiPolygon> | Feature<MultiPolygon> | null = null;

function land() {
  landCache ??= feature(topology, topology.objects.land) as unknown as FeatureCollection<MultiPolygon>;
  return landCache;
}

export type MapPoint = { lat: number; lon: number };
export type MapFrame = {
  width: number;
  height: number;
  projection: GeoProjection;
  sphere: string;
  graticule: string;
  land: string;
};

const SPHERE = { type: 'Sphere' } as const;

/** Projects the world to `width`, centred on the station's longitude. */
export function mapFrame(width: number, centre: MapPoint): MapFrame {
  const projection = geoEqualEarth()
    .rotate([-centre.lon, 0])
    .fitWidth(width - 2, SPHERE as never);
  const path = geoPath(projection);
  const [[, top], [, bottom]] = path.bounds(SPHERE as never);
  projection.translate([projection.translate()[0] + 1, projection.translate()[1] - top + 1]);
  return {
    width,
    height: Math.ceil(bottom - top + 2),
    projection,
    sphere: path(SPHERE as never) ?? '',
    graticule: path(geoGraticule10()) ?? '',
    land: path(land() as never) ?? '',
  };
}

/** The great circle from the station to a receiver as an SVG path (geoPath resamples and clips it). */
export function greatCirclePath(frame: MapFrame, from: MapPoint, to: MapPoint): string {
  const line: Geometry = {
    type: 'LineString',
    coordinates: [
      [from.lon, from.lat],
      [to.lon, to.lat],
    ],
  };
  return geoPath(frame.projection)(line as never) ?? '';
}

export function projectPoint(frame: MapFrame, point: MapPoint): [number, number] | null {
  return frame.projection([point.lon, point.lat]);
}
