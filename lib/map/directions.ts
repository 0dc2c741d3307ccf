// Links that open a drop point in the visitor's own map app. Pure.

/** Degrees rounded to 6 places (about 0.1 m), without trailing zeros. */
const deg = (n: number) => String(Number(n.toFixed(6)));

/**
 * A `geo:` URI (RFC 5870: "geo:" latitude "," longitude, WGS 84): phones hand it
 * to whatever map app the person uses.
 */
export function geoUri(lat: number, lng: number): string {
  return `geo:${deg(lat)},${deg(lng)}`;
}

/**
 * The point on openstreetmap.org: `mlat`/`mlon` place the marker, the
 * `#map=zoom/lat/lon` fragment centres the view. Nothing else: no tracking.
 */
export function osmUrl(lat: number, lng: number, zoom = 17): string {
  return `https://www.openstreetmap.org/?mlat=${deg(lat)}&mlon=${deg(lng)}#map=${zoom}/${deg(lat)}/${deg(lng)}`;
}
