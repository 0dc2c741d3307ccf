/**
 * Clear-day solar energy on a heater's wall (part of PRODUCT.md computation 5).
 * Two conventions meet here, so every function says which it uses:
 * - suncalc 2.x: degrees; azimuth a compass bearing clockwise from north
 *   (0 = N, 90 = E, 180 = S); apparent (refracted) altitude; UTC instants.
 *   suncalc 1.x used radians from south, hence the pinned major version.
 * - Duffie & Beckman (Solar Engineering of Thermal Processes, ch. 1):
 *   surface azimuth γ = 0 facing due south, west positive; hour angle ω
 *   negative before solar noon. With a signed latitude their equations hold
 *   in both hemispheres, where an equator-facing (north) wall has γ = 180°.
 * Model (an estimate; see CLEAR_DAY_ASSUMPTIONS): beam light through Hottel's
 * (1976) standard clear atmosphere, Liu & Jordan's clear-day diffuse light
 * spread isotropically, and ground-reflected light (Duffie & Beckman §2.8, §2.15).
 */
import { getPosition, getTimes } from "suncalc";

const RAD = Math.PI / 180;
const sinD = (deg: number) => Math.sin(deg * RAD);
const cosD = (deg: number) => Math.cos(deg * RAD);

/** Solar constant as used with Hottel's model in Duffie & Beckman. */
export const SOLAR_CONSTANT_WM2 = 1367;

export const CLEAR_DAY_ASSUMPTIONS: readonly string[] = [
  "A cloudless sky all day; real days, with cloud and haze, average less.",
  "Direct sunlight through a standard clear atmosphere (Hottel's model, about 23 km visibility), corrected for climate and season.",
  "Sky light from a clear-day relation, spread evenly over the sky; the ground reflects 20 % unless stated.",
  "Light reaching the outside of the glazing; no shade from trees, buildings or eaves, no glazing losses.",
  "The sun's place in the sky worked out every 5 minutes from sunrise to sunset, for the latitude and date given.",
];

/** Day of the year, 1 on 1 January, of the date's UTC calendar day. */
export function dayOfYear(date: Date): number {
  const start = Date.UTC(date.getUTCFullYear(), 0, 1);
  const day = Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate());
  return Math.round((day - start) / 86_400_000) + 1;
}

/** Cooper's (1969) declination in degrees: δ = 23.45·sin(360·(284 + n)/365). */
export function declinationCooper(dayOfYearN: number): number {
  return 23.45 * sinD((360 * (284 + dayOfYearN)) / 365);
}

/**
 * Cosine of the angle of incidence of beam light on a surface (Duffie &
 * Beckman eq. 1.6.2). Degrees; slope from horizontal (90 = a wall); surface
 * azimuth 0 = due south, west positive; hour angle negative in the morning.
 * May be negative: the sun is then behind the surface.
 */
export function cosIncidence(
  latitude: number,
  declination: number,
  hourAngle: number,
  slope: number,
  surfaceAzimuth: number,
): number {
  const [sp, cp, sd, cd] = [sinD(latitude), cosD(latitude), sinD(declination), cosD(declination)];
  const [sb, cb, sg, cg, sw, cw] = [sinD(slope), cosD(slope), sinD(surfaceAzimuth), cosD(surfaceAzimuth), sinD(hourAngle), cosD(hourAngle)];
  return sd * sp * cb - sd * cp * sb * cg + cd * cp * cb * cw + cd * sp * sb * cg * cw + cd * sb * sg * sw;
}

/** Duffie & Beckman surface azimuth (0 = south, west +) from a compass bearing. */
export function surfaceAzimuthFromCompass(bearing: number): number {
  const g = (((bearing - 180) % 360) + 360) % 360;
  return g > 180 ? g - 360 : g;
}

/**
 * Same cosine from a sun position (Duffie & Beckman eq. 1.6.3):
 * cos θ = cos θz·cos β + sin θz·sin β·cos(γs − γ). Both azimuths are compass
 * bearings, so their difference equals γs − γ.
 */
export function cosIncidenceFromPosition(
  sunAltitude: number,
  sunBearing: number,
  slope: number,
  surfaceBearing: number,
): number {
  const zenith = 90 - sunAltitude;
  return cosD(zenith) * cosD(slope) + sinD(zenith) * sinD(slope) * cosD(sunBearing - surfaceBearing);
}

/** Solar altitude (degrees) from latitude, declination and hour angle. */
export function solarAltitude(latitude: number, declination: number, hourAngle: number): number {
  const s = sinD(latitude) * sinD(declination) + cosD(latitude) * cosD(declination) * cosD(hourAngle);
  return Math.asin(Math.max(-1, Math.min(1, s))) / RAD;
}

/** suncalc's position, renamed so the units are visible at the call site. */
export function sunPosition(date: Date, latitude: number, longitude: number): { altitudeDeg: number; bearingDeg: number } {
  const p = getPosition(date, latitude, longitude);
  return { altitudeDeg: p.altitude, bearingDeg: p.azimuth };
}

/** Extraterrestrial normal irradiance, W/m² (Duffie & Beckman eq. 1.4.1a). */
export function extraterrestrialNormalWm2(dayOfYearN: number): number {
  return SOLAR_CONSTANT_WM2 * (1 + 0.033 * cosD((360 * dayOfYearN) / 365));
}

export type ClearSkyClimate = "tropical" | "midlatitudeSummer" | "subarcticSummer" | "midlatitudeWinter";

/** Hottel's climate corrections r0, r1, rk (Duffie & Beckman Table 2.8.1). */
const HOTTEL_CORRECTIONS: Record<ClearSkyClimate, readonly [number, number, number]> = {
  tropical: [0.95, 0.98, 1.02],
  midlatitudeSummer: [0.97, 0.99, 1.02],
  subarcticSummer: [0.99, 0.99, 1.01],
  midlatitudeWinter: [1.03, 1.01, 1.0],
};

/**
 * Hottel's clear-sky beam transmittance τb = a0 + a1·exp(−k / cos θz), with
 * A the site altitude in km (the fit holds below 2.5 km, so A is clamped).
 */
export function hottelBeamTransmittance(zenithDeg: number, siteAltitudeKm: number, climate: ClearSkyClimate): number {
  const cosZ = cosD(zenithDeg);
  if (cosZ <= 0) return 0;
  const a = Math.min(2.5, Math.max(0, siteAltitudeKm));
  const [r0, r1, rk] = HOTTEL_CORRECTIONS[climate];
  const a0 = r0 * (0.4237 - 0.00821 * (6 - a) ** 2);
  const a1 = r1 * (0.5055 + 0.00595 * (6.5 - a) ** 2);
  const k = rk * (0.2711 + 0.01858 * (2.5 - a) ** 2);
  return a0 + a1 * Math.exp(-k / cosZ);
}

/** Tropics all year; elsewhere summer for the local warm half (Apr–Sep north, Oct–Mar south). */
export function defaultClimate(latitude: number, date: Date): ClearSkyClimate {
  if (Math.abs(latitude) < 23.45) return "tropical";
  const month = date.getUTCMonth();
  const northWarm = month >= 3 && month <= 8;
  const summer = latitude >= 0 ? northWarm : !northWarm;
  if (!summer) return "midlatitudeWinter";
  return Math.abs(latitude) >= 60 ? "subarcticSummer" : "midlatitudeSummer";
}

export interface ClearDayInput {
  latitude: number;
  /** Only shifts the solar day a little; 0 is fine when unknown. */
  longitude?: number;
  /** The calendar day, read as its UTC date (so "2025-12-21" means 21 December anywhere). */
  date: Date;
  /** Compass bearing the surface faces (suncalc convention): 180 = south. */
  facingBearing: number;
  /** Degrees from horizontal; 90 (default) is a wall. */
  slope?: number;
  siteAltitudeKm?: number;
  climate?: ClearSkyClimate;
  groundReflectance?: number;
  stepMinutes?: number;
}

export interface ClearDayEnergy {
  kWhPerM2: number;
  beamKWhPerM2: number;
  diffuseKWhPerM2: number;
  reflectedKWhPerM2: number;
  /** Highest total irradiance on the surface during the day, W/m². */
  peakWm2: number;
  /** Hours the sun shines on the surface's face. */
  sunlitHours: number;
  climate: ClearSkyClimate;
}

/** Clear-day energy on a surface, kWh/m² per day, by midpoint steps over the solar day. */
export function clearDayEnergy(input: ClearDayInput): ClearDayEnergy {
  const { latitude, date, facingBearing } = input;
  const longitude = input.longitude ?? 0;
  const slope = input.slope ?? 90;
  const climate = input.climate ?? defaultClimate(latitude, date);
  const rho = input.groundReflectance ?? 0.2;
  const stepMin = input.stepMinutes ?? 5;
  const stepH = stepMin / 60;

  // suncalc picks the solar day containing the instant it is given; UTC
  // midnight of a date can still belong to the day before at the site, so
  // ask from the site's mean noon of that calendar date.
  const meanNoon = Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate(), 12) - (longitude / 15) * 3_600_000;
  const noon = getTimes(new Date(meanNoon), latitude, longitude).solarNoon.getTime();
  const gon = extraterrestrialNormalWm2(dayOfYear(new Date(noon)));
  const skyView = (1 + cosD(slope)) / 2;
  const groundView = (1 - cosD(slope)) / 2;
  const totals = { beam: 0, diffuse: 0, reflected: 0, peak: 0, sunlit: 0 };

  for (let t = noon - 12 * 3_600_000 + (stepMin / 2) * 60_000; t < noon + 12 * 3_600_000; t += stepMin * 60_000) {
    const sun = sunPosition(new Date(t), latitude, longitude);
    if (sun.altitudeDeg <= 0) continue;
    const zenith = 90 - sun.altitudeDeg;
    const tauB = hottelBeamTransmittance(zenith, input.siteAltitudeKm ?? 0, climate);
    const beamNormal = gon * tauB;
    const beamHorizontal = beamNormal * cosD(zenith);
    // Liu & Jordan: clear-day diffuse transmittance τd = 0.271 − 0.294·τb.
    const diffuseHorizontal = gon * cosD(zenith) * Math.max(0, 0.271 - 0.294 * tauB);
    const cosTheta = Math.max(0, cosIncidenceFromPosition(sun.altitudeDeg, sun.bearingDeg, slope, facingBearing));
    const beam = beamNormal * cosTheta;
    const diffuse = diffuseHorizontal * skyView;
    const reflected = (beamHorizontal + diffuseHorizontal) * rho * groundView;
    totals.beam += beam * stepH;
    totals.diffuse += diffuse * stepH;
    totals.reflected += reflected * stepH;
    totals.peak = Math.max(totals.peak, beam + diffuse + reflected);
    if (cosTheta > 0) totals.sunlit += stepH;
  }

  const kWh = (wh: number) => wh / 1000;
  return {
    kWhPerM2: kWh(totals.beam + totals.diffuse + totals.reflected),
    beamKWhPerM2: kWh(totals.beam),
    diffuseKWhPerM2: kWh(totals.diffuse),
    reflectedKWhPerM2: kWh(totals.reflected),
    peakWm2: totals.peak,
    sunlitHours: totals.sunlit,
    climate,
  };
}
