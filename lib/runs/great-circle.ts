/**
 * Great-circle distance on a spherical Earth.
 *
 * A sphere is accurate to about 0.5 % against the ellipsoid, which is far
 * below the difference between a straight line and the roads a volunteer
 * actually drives; what matters for ordering stops is that the metric is
 * consistent, cheap and symmetric.
 */

/** IUGG mean Earth radius R1 = (2a + b) / 3, in kilometres. */
export const EARTH_RADIUS_KM = 6371.0088;

export interface LatLng {
  /** Degrees north, −90..90. */
  lat: number;
  /** Degrees east, −180..180. */
  lng: number;
}

const DEG = Math.PI / 180;

/**
 * Haversine distance in kilometres between two points given in degrees.
 *
 * The atan2 form is used instead of asin(√a) because it stays well
 * conditioned near antipodal points, and `a` is clamped because rounding can
 * push it a hair above 1 there, which would make √(1 − a) NaN.
 */
export function haversineKm(a: LatLng, b: LatLng, radiusKm: number = EARTH_RADIUS_KM): number {
  const dLat = (b.lat - a.lat) * DEG;
  const dLng = (b.lng - a.lng) * DEG;
  const s =
    Math.sin(dLat / 2) ** 2 + Math.sin(dLng / 2) ** 2 * Math.cos(a.lat * DEG) * Math.cos(b.lat * DEG);
  const h = Math.min(1, Math.max(0, s));
  return radiusKm * 2 * Math.atan2(Math.sqrt(h), Math.sqrt(1 - h));
}

/**
 * Symmetric matrix of distances between all points, row-major in a flat
 * Float64Array (entry i·n + j). Route search reads each pair many times, so
 * paying the trigonometry once keeps 2-opt over hundreds of stops fast.
 */
export function distanceMatrix(points: readonly LatLng[]): Float64Array {
  const n = points.length;
  const m = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const d = haversineKm(points[i]!, points[j]!);
      m[i * n + j] = d;
      m[j * n + i] = d;
    }
  }
  return m;
}
