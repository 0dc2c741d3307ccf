import { describe, expect, it } from "vitest";
import { geoUri, osmUrl } from "@/lib/map/directions";

describe("geoUri", () => {
  it("writes the RFC 5870 form geo:lat,lon", () => {
    // RFC 5870 §1 gives "geo:13.4125,103.8667" as its first example.
    expect(geoUri(13.4125, 103.8667)).toBe("geo:13.4125,103.8667");
    // Southern and western coordinates keep their sign (RFC 5870 §3.4.2, WGS 84 degrees).
    expect(geoUri(-33.8568, -70.6483)).toBe("geo:-33.8568,-70.6483");
  });

  it("rounds to 6 decimal places (about 0.1 m, from memory) so float noise never reaches the link", () => {
    expect(geoUri(47.123456789, 8.1 + 0.2)).toBe("geo:47.123457,8.3");
  });
});

describe("osmUrl", () => {
  it("puts a marker with mlat/mlon and centres with #map=zoom/lat/lon, and carries nothing else", () => {
    // openstreetmap.org's marker parameters and map fragment, as on the OSM wiki's "Browsing" page (from memory).
    const href = osmUrl(51.5007, -0.1246);
    expect(href).toBe("https://www.openstreetmap.org/?mlat=51.5007&mlon=-0.1246#map=17/51.5007/-0.1246");
    const url = new URL(href);
    expect(url.origin).toBe("https://www.openstreetmap.org");
    expect([...url.searchParams.keys()]).toEqual(["mlat", "mlon"]);
  });
});
