/**
 * Reads a glacier centreline drawn in a GIS from GeoJSON text (RFC 7946): one LineString, given
 * bare, as a Feature, or as the only LineString of a FeatureCollection, whose positions are
 * [longitude, latitude, elevation] in WGS 84 degrees and metres. Pure (no DOM): the import dialog
 * shows what this returns and imports nothing until it is clean.
 *
 * Distance along the line is the sum of the geodesic distances between successive positions on
 * the WGS 84 ellipsoid (geodesic.ts, Vincenty 1975): horizontal distance, as the flowline's x is,
 * not the slope distance. The first position is the head of the flowline (x = 0); `reverse` reads
 * the line from its last position instead, for lines drawn up-valley.
 *
 * Refused as a whole: text that is not JSON, JSON that is not GeoJSON, no LineString or more than
 * one, fewer than two positions, more positions than a scenario's point list holds, a file larger
 * than the CSV import accepts, a `crs` member naming anything but WGS 84 longitude/latitude.
 * Refused position by position (each listed with its index): a position that is not an array of
 * numbers, without an elevation, non-finite numbers, longitude outside -180..180, latitude outside
 * -90..90, elevation outside the scenario's limits, and a segment whose geodesic does not converge.
 */
import { SCENARIO_LIMITS } from '../scenario/scenarioLimits';
import { MAX_CSV_BYTES } from './csvProfileImport';
import { geodesicDistance } from './geodesic';

export interface CentrelinePoint {
  /** Index of the position in the file's coordinates array, from 0. */
  index: number;
  longitude: number;
  latitude: number;
  /** Elevation as written [m]. */
  elevation: number;
  /** Horizontal distance along the line from its head [m]. */
  distanceM: number;
}

export interface PositionProblem {
  /** Index of the position in the coordinates array, from 0. */
  index: number;
  message: string;
}

export interface Centreline {
  ok: true;
  /** Where the LineString is in the file, e.g. "features[2].geometry" or "the top-level object". */
  where: string;
  /** The feature's "name" property, when it has one. */
  name: string | null;
  /** Positions read, head first, repeated positions left out. */
  points: CentrelinePoint[];
  /** Length along the line [m]. */
  lengthM: number;
  /** Positions that could not be read. The import waits until there are none. */
  problems: PositionProblem[];
  notes: string[];
}

export type CentrelineResult = Centreline | { ok: false; error: string };

export interface CentrelineOptions {
  /** Read the line from its last position (for lines drawn up-valley). */
  reverse?: boolean;
}

type JsonObject = Record<string, unknown>;

const isObject = (v: unknown): v is JsonObject => typeof v === 'object' && v !== null && !Array.isArray(v);

const GEOMETRY_TYPES = ['Point', 'MultiPoint', 'LineString', 'MultiLineString', 'Polygon', 'MultiPolygon', 'GeometryCollection'];
const GEOJSON_TYPES = [...GEOMETRY_TYPES, 'Feature', 'FeatureCollection'];
/** The names old GeoJSON (2008) used for WGS 84 longitude/latitude in its `crs` member. */
const WGS84_CRS = /^(urn:ogc:def:crs:OGC:1\.3:CRS84|urn:ogc:def:crs:OGC::CRS84|EPSG:4326|urn:ogc:def:crs:EPSG::4326|urn:ogc:def:crs:EPSG:[\d.]*:4326)$/i;

interface Found {
  where: string;
  coordinates: unknown;
  name: string | null;
}

function fail(error: string): CentrelineResult {
  return { ok: false, error };
}

function plural(n: number, word: string): string {
  return `${n.toLocaleString('en')} ${word}${n === 1 ? '' : 's'}`;
}

/** Every LineString in the object, with where it is; other geometries counted by type. */
function collect(root: JsonObject, found: Found[], others: Map<string, number>): void {
  const visitGeometry = (g: unknown, where: string, name: string | null) => {
    if (g === null) return; // a Feature without geometry
    if (!isObject(g) || typeof g.type !== 'string') {
      others.set('unreadable geometry', (others.get('unreadable geometry') ?? 0) + 1);
      return;
    }
    if (g.type === 'LineString') found.push({ where, coordinates: g.coordinates, name });
    else if (g.type === 'GeometryCollection' && Array.isArray(g.geometries)) {
      g.geometries.forEach((inner, i) => visitGeometry(inner, `${where}.geometries[${i}]`, name));
    } else others.set(g.type, (others.get(g.type) ?? 0) + 1);
  };
  const featureName = (f: JsonObject): string | null => {
    const p = f.properties;
    return isObject(p) && typeof p.name === 'string' ? p.name : null;
  };
  if (root.type === 'FeatureCollection') {
    (root.features as unknown[]).forEach((f, i) => {
      if (isObject(f)) visitGeometry(f.geometry, `features[${i}].geometry`, featureName(f));
    });
  } else if (root.type === 'Feature') {
    visitGeometry(root.geometry, 'the feature\'s geometry', featureName(root));
  } else {
    visitGeometry(root, 'the top-level object', null);
  }
}

function describeNumber(v: unknown): string {
  if (typeof v === 'string') return `the text "${v.length > 20 ? `${v.slice(0, 20)}…` : v}"`;
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'an array';
  if (typeof v === 'object') return 'an object';
  return String(v);
}

/** Reads GeoJSON text; never throws. */
export function parseCentrelineGeojson(text: string, options: CentrelineOptions = {}): CentrelineResult {
  if (text.length > MAX_CSV_BYTES) {
    return fail(`the file is larger than 20 MB (${MAX_CSV_BYTES.toLocaleString('en')} bytes), the largest profile accepted`);
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return fail('the file is empty; it needs a GeoJSON LineString');
  let root: unknown;
  try {
    root = JSON.parse(body);
  } catch (error) {
    return fail(`the file is not JSON (${error instanceof Error ? error.message : String(error)}); a centreline must be GeoJSON text`);
  }
  if (!isObject(root)) {
    return fail(`the file holds JSON ${Array.isArray(root) ? 'array' : typeof root === 'string' ? 'text' : String(root)}, not a GeoJSON object; a centreline must be an object with "type": "LineString", "Feature" or "FeatureCollection"`);
  }
  if (typeof root.type !== 'string' || !GEOJSON_TYPES.includes(root.type)) {
    return fail(
      `the file is JSON but not GeoJSON: its "type" is ${root.type === undefined ? 'missing' : JSON.stringify(root.type)}; GeoJSON (RFC 7946) has "type": "LineString", "Feature" or "FeatureCollection"`,
    );
  }
  if (root.type === 'FeatureCollection' && !Array.isArray(root.features)) {
    return fail('the FeatureCollection has no "features" array');
  }
  if (root.type === 'Feature' && !('geometry' in root)) {
    return fail('the Feature has no "geometry" member');
  }
  // RFC 7946 removed `crs`: positions are WGS 84 longitude/latitude. Older files may name another
  // system (projected coordinates in metres would otherwise be read as degrees).
  if (isObject(root.crs)) {
    const props = root.crs.properties;
    const crsName = isObject(props) && typeof props.name === 'string' ? props.name : JSON.stringify(root.crs);
    if (!WGS84_CRS.test(crsName)) {
      return fail(
        `the file names the coordinate reference system ${crsName}; positions must be WGS 84 longitude and latitude in degrees (RFC 7946; EPSG:4326) — export the line again in that system`,
      );
    }
  }

  const found: Found[] = [];
  const others = new Map<string, number>();
  collect(root, found, others);
  const otherText = [...others].map(([type, n]) => `${n} ${type}`).join(', ');
  if (found.length === 0) {
    const multi = others.get('MultiLineString');
    return fail(
      multi
        ? `the file holds a MultiLineString but no LineString; the centreline must be one unbroken LineString — merge its parts in the GIS`
        : `the file holds no LineString${otherText ? ` (found: ${otherText})` : ''}; the centreline must be one LineString with [longitude, latitude, elevation] positions`,
    );
  }
  if (found.length > 1) {
    return fail(
      `the file holds ${found.length} LineStrings (${found.map((f) => f.where).join(', ')}); exactly one is accepted — keep only the centreline, or merge the parts in the GIS`,
    );
  }
  const { where, coordinates, name } = found[0];
  if (!Array.isArray(coordinates)) return fail(`the LineString at ${where} has no "coordinates" array`);
  if (coordinates.length < 2) {
    return fail(`the LineString at ${where} has ${plural(coordinates.length, 'position')}; a line needs at least 2`);
  }
  if (coordinates.length > SCENARIO_LIMITS.pointsMax) {
    return fail(
      `the LineString has ${plural(coordinates.length, 'position')}; a profile holds at most ${SCENARIO_LIMITS.pointsMax.toLocaleString('en')} — simplify the line in the GIS (a vertex every 10-50 m is ample)`,
    );
  }

  const L = SCENARIO_LIMITS;
  const problems: PositionProblem[] = [];
  const read: Omit<CentrelinePoint, 'distanceM'>[] = [];
  let extraValues = false;
  coordinates.forEach((position: unknown, index) => {
    if (!Array.isArray(position)) {
      problems.push({ index, message: `is ${describeNumber(position)}, not a position [longitude, latitude, elevation]` });
      return;
    }
    if (position.length < 2) {
      problems.push({ index, message: `has ${plural(position.length, 'value')}; a position is [longitude, latitude, elevation]` });
      return;
    }
    const reasons: string[] = [];
    const names = ['longitude', 'latitude', 'elevation'];
    const values: number[] = [];
    for (let k = 0; k < Math.min(3, position.length); k++) {
      const v: unknown = position[k];
      if (typeof v !== 'number') reasons.push(`${names[k]} is ${describeNumber(v)}, not a number`);
      else if (!Number.isFinite(v)) reasons.push(`${names[k]} is not a finite number`);
      else values.push(v);
    }
    if (position.length > 3) extraValues = true;
    if (position.length === 2) {
      reasons.push('has no elevation; each position must be [longitude, latitude, elevation in m] — export the line with its Z values (e.g. draped on a DEM)');
    }
    if (reasons.length === 0) {
      const [lon, lat, z] = values;
      if (lon < -180 || lon > 180) reasons.push(`longitude ${lon} is outside -180 to 180 degrees`);
      if (lat < -90 || lat > 90) reasons.push(`latitude ${lat} is outside -90 to 90 degrees`);
      if (z < L.elevationMin || z > L.elevationMax) reasons.push(`elevation ${z} m is outside ${L.elevationMin} to ${L.elevationMax.toLocaleString('en')} m`);
      if (reasons.length === 0) read.push({ index, longitude: lon, latitude: lat, elevation: z });
    }
    if (reasons.length) problems.push({ index, message: reasons.join('; ') });
  });

  const notes: string[] = [];
  if (extraValues) notes.push('Values after the elevation in a position (a fourth coordinate) are ignored.');
  const ordered = options.reverse ? [...read].reverse() : read;
  const points: CentrelinePoint[] = [];
  let repeated = 0;
  for (const p of ordered) {
    const previous = points[points.length - 1];
    if (!previous) {
      points.push({ ...p, distanceM: 0 });
      continue;
    }
    const step = geodesicDistance(previous.latitude, previous.longitude, p.latitude, p.longitude);
    if (Number.isNaN(step)) {
      problems.push({ index: p.index, message: `the distance from position ${previous.index} could not be computed (the two are nearly antipodal); successive positions of a centreline are close together` });
      continue;
    }
    if (step === 0) {
      repeated++;
      continue;
    }
    points.push({ ...p, distanceM: previous.distanceM + step });
  }
  problems.sort((a, b) => a.index - b.index);
  if (repeated) notes.push(`${plural(repeated, 'position')} repeating the one before ${repeated === 1 ? 'was' : 'were'} left out.`);
  if (problems.length === 0 && points.length < 2) {
    return fail(`the LineString at ${where} has fewer than 2 distinct positions; a line needs at least 2`);
  }
  const lengthM = points.length ? points[points.length - 1].distanceM : 0;
  if (points.length >= 2 && points[0].elevation < points[points.length - 1].elevation) {
    notes.push(
      `The line climbs from ${points[0].elevation} m to ${points[points.length - 1].elevation} m: it was probably drawn up-valley. The flowline starts at the head; read the line reversed.`,
    );
  }
  notes.push(
    'Elevations are used as written, as metres above sea level. RFC 7946 defines them as heights above the WGS 84 ellipsoid, which differ from sea-level heights by the geoid (tens of metres in places); check how the GIS wrote them.',
  );
  return { ok: true, where, name, points, lengthM, problems, notes };
}
