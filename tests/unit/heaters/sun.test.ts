import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { getPosition, getTimes } from "suncalc";
import {
  clearDayEnergy,
  cosIncidence,
  cosIncidenceFromPosition,
  dayOfYear,
  declinationCooper,
  extraterrestrialNormalWm2,
  hottelBeamTransmittance,
  solarAltitude,
  sunPosition,
  surfaceAzimuthFromCompass,
} from "@/lib/heaters/sun";

const RAD = Math.PI / 180;
const noonOf = (iso: string, lat: number, lng: number) =>
  getTimes(new Date(`${iso}T12:00:00Z`), lat, lng).solarNoon;

describe("cosIncidence (Duffie & Beckman eq. 1.6.2)", () => {
  it("Example 1.6.1: φ = 43°, δ = −14°, ω = −22.5°, β = 45°, γ = 15° → cos θ = 0.817", () => {
    // Source: Duffie & Beckman, Solar Engineering of Thermal Processes, Example 1.6.1.
    expect(Math.abs(cosIncidence(43, -14, -22.5, 45, 15) - 0.817)).toBeLessThanOrEqual(0.001);
  });

  it("agrees with eq. 1.6.3 from an independently computed sun direction", () => {
    // Sun direction in east-north-up coordinates straight from the spherical
    // triangle, then cos θ = n·s; both routes must agree to rounding.
    fc.assert(
      fc.property(
        fc.double({ min: -65, max: 65, noNaN: true }),
        fc.double({ min: -23.45, max: 23.45, noNaN: true }),
        fc.double({ min: -150, max: 150, noNaN: true }),
        fc.double({ min: 0, max: 90, noNaN: true }),
        fc.double({ min: -180, max: 180, noNaN: true }),
        (lat, decl, omega, slope, gamma) => {
          const [p, d, w] = [lat * RAD, decl * RAD, omega * RAD];
          const east = -Math.cos(d) * Math.sin(w);
          const north = Math.sin(d) * Math.cos(p) - Math.cos(d) * Math.sin(p) * Math.cos(w);
          const up = Math.sin(p) * Math.sin(d) + Math.cos(p) * Math.cos(d) * Math.cos(w);
          const altitude = Math.asin(up) / RAD;
          const bearing = Math.atan2(east, north) / RAD;
          const surfaceBearing = gamma + 180; // south-based → compass
          // asin near the zenith loses about half the digits (~1e-8 rad), so
          // agreement is asked to 6 decimals, far finer than any use of cos θ.
          expect(cosIncidence(lat, decl, omega, slope, gamma)).toBeCloseTo(
            cosIncidenceFromPosition(altitude, bearing, slope, surfaceBearing),
            6,
          );
        },
      ),
    );
  });

  it("maps compass bearings to the south-based, west-positive surface azimuth", () => {
    expect([180, 270, 90, 195, 0, 360].map(surfaceAzimuthFromCompass)).toEqual([0, 90, -90, 15, 180, 180]);
  });
});

describe("declinationCooper", () => {
  // Days are the recommended average day of each month, Duffie & Beckman
  // Table 1.6.1; the declinations beside them are from memory, so ±0.1°.
  it.each([
    ["Jan 17", "2025-01-17", 17, -20.9],
    ["Feb 16", "2025-02-16", 47, -13.0],
    ["Mar 16", "2025-03-16", 75, -2.4],
    ["Apr 15", "2025-04-15", 105, 9.4],
    ["May 15", "2025-05-15", 135, 18.8],
    ["Jun 11", "2025-06-11", 162, 23.1],
    ["Jul 17", "2025-07-17", 198, 21.2],
    ["Aug 16", "2025-08-16", 228, 13.5],
    ["Sep 15", "2025-09-15", 258, 2.2],
    ["Oct 15", "2025-10-15", 288, -9.6],
    ["Nov 14", "2025-11-14", 318, -18.9],
    ["Dec 10", "2025-12-10", 344, -23.0],
  ])("%s (n = %i) → δ ≈ %f° (from memory)", (_label, iso, n, delta) => {
    expect(dayOfYear(new Date(iso))).toBe(n);
    expect(Math.abs(declinationCooper(n) - delta)).toBeLessThanOrEqual(0.1);
  });

  it("counts 29 February in a leap year", () => {
    expect(dayOfYear(new Date("2024-12-10"))).toBe(345);
  });
});

describe("our use of suncalc (v2: degrees, bearing clockwise from north)", () => {
  it("solar noon on the March 2025 equinox at 45° N: altitude ≈ 45°, due south", () => {
    // Geometry: at an equinox the noon altitude is 90° − latitude.
    const pos = sunPosition(noonOf("2025-03-20", 45, 0), 45, 0);
    expect(pos.altitudeDeg).toBeCloseTo(45, 0);
    expect(Math.abs(pos.altitudeDeg - 45)).toBeLessThan(0.3);
    expect(pos.bearingDeg).toBeCloseTo(180, 2);
  });

  it("June solstice noon at 45° N is 90° − 45° + 23.44° (obliquity of the ecliptic)", () => {
    expect(sunPosition(noonOf("2025-06-21", 45, 0), 45, 0).altitudeDeg).toBeCloseTo(68.44, 1);
  });

  it("the southern hemisphere sees the noon sun due north", () => {
    const pos = getPosition(noonOf("2025-06-21", -35, 150), -35, 150);
    expect(Math.min(pos.azimuth, 360 - pos.azimuth)).toBeLessThan(0.1);
  });

  it("Cooper + hour angle tracks suncalc's altitude within about a degree all year", () => {
    // Cooper's one-term fit strays from the ephemeris by up to ~1° of
    // declination (measured here ≈ 0.9° of altitude at worst).
    for (let day = 0; day < 365; day += 5) {
      const date = new Date(Date.UTC(2025, 0, 1 + day, 12));
      const noon = getTimes(date, 40, 10).solarNoon.getTime();
      for (const omega of [-60, -30, 0, 30, 60]) {
        const t = new Date(noon + (omega / 15) * 3_600_000);
        const ours = solarAltitude(40, declinationCooper(dayOfYear(t)), omega);
        expect(Math.abs(ours - getPosition(t, 40, 10).altitude)).toBeLessThan(1.2);
      }
    }
  });
});

describe("clear-sky model", () => {
  it("Hottel's beam transmittance and Gon match Duffie & Beckman Example 2.8.1", () => {
    // Madison, 270 m, 22 August (n = 234), cos θz = 0.846, mid-latitude summer:
    // τb ≈ 0.62 and Gon ≈ 1339 W/m² (figures from memory, hence the tolerances).
    const zenith = Math.acos(0.846) / RAD;
    expect(Math.abs(hottelBeamTransmittance(zenith, 0.27, "midlatitudeSummer") - 0.62)).toBeLessThan(0.005);
    expect(Math.abs(extraterrestrialNormalWm2(234) - 1339)).toBeLessThan(1);
  });

  it("gives no beam below the horizon", () => {
    expect(hottelBeamTransmittance(95, 0, "tropical")).toBe(0);
  });
});

describe("clearDayEnergy", () => {
  const at45 = (iso: string, facingBearing: number, extra: object = {}) =>
    clearDayEnergy({ latitude: 45, longitude: 0, date: new Date(iso), facingBearing, ...extra });

  it("a south wall at 45° N on 21 December gets a plausible few kWh/m²", () => {
    // Plausibility only (no published check value): between 2 and 6 kWh/m².
    const r = at45("2025-12-21", 180);
    expect(r.kWhPerM2).toBeGreaterThan(2);
    expect(r.kWhPerM2).toBeLessThan(6);
    expect(r.kWhPerM2).toBeCloseTo(r.beamKWhPerM2 + r.diffuseKWhPerM2 + r.reflectedKWhPerM2, 12);
    expect(r.climate).toBe("midlatitudeWinter");
  });

  it("east and west walls mirror each other", () => {
    const east = at45("2025-12-21", 90).kWhPerM2;
    expect(Math.abs(east - at45("2025-12-21", 270).kWhPerM2) / east).toBeLessThan(0.01);
  });

  it("a north wall in a northern winter gets no direct sun, only sky and ground light", () => {
    const r = at45("2025-12-21", 0);
    expect(r.beamKWhPerM2).toBe(0);
    expect(r.sunlitHours).toBe(0);
    expect(r.kWhPerM2).toBeGreaterThan(0);
  });

  it("a south wall gets more on a winter day than on a summer day (the low sun meets it squarely)", () => {
    expect(at45("2025-12-21", 180).beamKWhPerM2).toBeGreaterThan(at45("2025-06-21", 180).beamKWhPerM2);
  });

  it("an east wall at the equinox is sunlit for about the morning's 6 hours", () => {
    expect(Math.abs(at45("2025-03-20", 90).sunlitHours - 6)).toBeLessThanOrEqual(0.25);
  });

  it("in the southern hemisphere the equator-facing wall faces north", () => {
    const north = clearDayEnergy({ latitude: -45, longitude: 170, date: new Date("2025-06-21"), facingBearing: 0 });
    const south = clearDayEnergy({ latitude: -45, longitude: 170, date: new Date("2025-06-21"), facingBearing: 180 });
    expect(north.beamKWhPerM2).toBeGreaterThan(2);
    expect(south.beamKWhPerM2).toBe(0);
    expect(Math.abs(north.kWhPerM2 - at45("2025-12-21", 180).kWhPerM2) / north.kWhPerM2).toBeLessThan(0.1);
  });

  it("a horizontal surface sees no ground; no reflectance means no reflected light", () => {
    expect(at45("2025-12-21", 180, { slope: 0 }).reflectedKWhPerM2).toBe(0);
    expect(at45("2025-12-21", 180, { groundReflectance: 0 }).reflectedKWhPerM2).toBe(0);
  });

  it("polar night gives nothing; polar day stays within 24 sunlit hours", () => {
    const night = clearDayEnergy({ latitude: 80, date: new Date("2025-12-21"), facingBearing: 180 });
    expect(night.kWhPerM2).toBe(0);
    const day = clearDayEnergy({ latitude: 80, date: new Date("2025-06-21"), facingBearing: 180 });
    expect(day.kWhPerM2).toBeGreaterThan(0);
    expect(day.sunlitHours).toBeLessThanOrEqual(24);
    expect(day.climate).toBe("subarcticSummer");
  });

  it("does not depend on the time of day passed in", () => {
    const a = clearDayEnergy({ latitude: 45, longitude: -120, date: new Date("2025-12-21T00:00:00Z"), facingBearing: 180 });
    const b = clearDayEnergy({ latitude: 45, longitude: -120, date: new Date("2025-12-21T23:00:00Z"), facingBearing: 180 });
    expect(a.kWhPerM2).toBe(b.kWhPerM2);
  });
});
