/**
 * Topocentric sun of the NREL SPA (Reda & Andreas 2004 §3.9–3.15, Eqs. 32–46): hour angle,
 * parallax, elevation with refraction, zenith and azimuth (from north, clockwise).
 */
import { asinD, atan2D, cosD, DEG, sinD, tanD, wrap360_deg } from './angles.js';
import { REFRACTION_AT_HORIZON_DEG, SUN_RADIUS_DEG, type ResolvedObserver } from './observer.js';

export interface TopocentricSun {
  /** Observer local hour angle H (deg), Eq. 32. */
  readonly H_deg: number;
  /** Equatorial horizontal parallax ξ (deg), Eq. 33. */
  readonly xi_deg: number;
  /** Parallax in right ascension Δα, topocentric α′, δ′ and H′ (deg), Eqs. 38–41. */
  readonly dAlpha_deg: number;
  readonly alphaPrime_deg: number;
  readonly deltaPrime_deg: number;
  readonly HPrime_deg: number;
  /** Elevation without refraction e0, refraction Δe, apparent elevation e (deg), Eqs. 41–43. */
  readonly e0_deg: number;
  readonly dE_deg: number;
  readonly elevation_deg: number;
  /** Topocentric zenith θ (deg), Eq. 44. */
  readonly zenith_deg: number;
  /** Astronomers' azimuth Γ (from south, westward) and azimuth Φ (from north, eastward), Eqs. 45–46. */
  readonly azimuthAstro_deg: number;
  readonly azimuth_deg: number;
}

/** Geocentric inputs the topocentric step needs. */
export interface ApparentSun {
  readonly nu_deg: number;
  readonly alpha_deg: number;
  readonly delta_deg: number;
  readonly R_au: number;
}

/** Observer-only terms of Eqs. 34–37 (u, x, y), computed once per site. */
export interface ObserverTerms {
  readonly sinLat: number;
  readonly cosLat: number;
  readonly tanLat: number;
  readonly x: number;
  readonly y: number;
  /** Refraction factor (P/1010)(283/(273+T)) of Eq. 42. */
  readonly refractionScale: number;
}

export function observerTerms(o: ResolvedObserver): ObserverTerms {
  const u = Math.atan(0.99664719 * tanD(o.latitude_deg)); // Eq. 35 (rad)
  const hRatio = o.elevation_m / 6378140; // Earth equatorial radius (m)
  return {
    sinLat: sinD(o.latitude_deg),
    cosLat: cosD(o.latitude_deg),
    tanLat: tanD(o.latitude_deg),
    x: Math.cos(u) + hRatio * cosD(o.latitude_deg), // Eq. 36
    y: 0.99664719 * Math.sin(u) + hRatio * sinD(o.latitude_deg), // Eq. 37
    refractionScale: (o.pressure_hPa / 1010) * (283 / (273 + o.temperature_C)),
  };
}

/** Atmospheric refraction Δe (deg) for the true elevation e0 (deg), SPA Eq. 42 (Sæmundsson form). */
export function refraction_deg(e0_deg: number, refractionScale: number): number {
  if (e0_deg < -(SUN_RADIUS_DEG + REFRACTION_AT_HORIZON_DEG)) return 0;
  return (refractionScale * 1.02) / (60 * tanD(e0_deg + 10.3 / (e0_deg + 5.11)));
}

export function topocentricSun(sun: ApparentSun, o: ResolvedObserver, t: ObserverTerms = observerTerms(o)): TopocentricSun {
  const H_deg = wrap360_deg(sun.nu_deg + o.longitude_deg - sun.alpha_deg); // Eq. 32
  const xi_deg = 8.794 / (3600 * sun.R_au); // Eq. 33
  const sinXi = sinD(xi_deg);
  const cosH = cosD(H_deg);
  const sinH = sinD(H_deg);
  const cosDelta = cosD(sun.delta_deg);
  const denom = cosDelta - t.x * sinXi * cosH;
  const dAlphaRad = Math.atan2(-t.x * sinXi * sinH, denom); // Eq. 38
  const dAlpha_deg = dAlphaRad / DEG;
  const deltaPrime_deg = atan2D((sinD(sun.delta_deg) - t.y * sinXi) * Math.cos(dAlphaRad), denom); // Eq. 39
  const HPrime_deg = H_deg - dAlpha_deg; // Eq. 40
  const sinDp = sinD(deltaPrime_deg);
  const cosDp = cosD(deltaPrime_deg);
  const cosHp = cosD(HPrime_deg);
  const e0_deg = asinD(t.sinLat * sinDp + t.cosLat * cosDp * cosHp); // Eq. 41
  const dE_deg = refraction_deg(e0_deg, t.refractionScale); // Eq. 42
  const elevation_deg = e0_deg + dE_deg; // Eq. 43
  const azimuthAstro_deg = wrap360_deg(atan2D(sinD(HPrime_deg), cosHp * t.sinLat - (sinDp / cosDp) * t.cosLat)); // Eq. 45
  return {
    H_deg, xi_deg, dAlpha_deg, alphaPrime_deg: sun.alpha_deg + dAlpha_deg, deltaPrime_deg, HPrime_deg, e0_deg, dE_deg, elevation_deg,
    zenith_deg: 90 - elevation_deg, // Eq. 44
    azimuthAstro_deg,
    azimuth_deg: wrap360_deg(azimuthAstro_deg + 180), // Eq. 46
  };
}

/**
 * Incidence angle (deg) on a surface of slope ω (deg from horizontal) and azimuth rotation γ
 * (deg, measured from south, positive toward west, as in the SPA paper), Eq. 47.
 */
export function spaIncidence_deg(zenith_deg: number, azimuthAstro_deg: number, slope_deg: number, rotationFromSouth_deg: number): number {
  const c = cosD(zenith_deg) * cosD(slope_deg) + sinD(slope_deg) * sinD(zenith_deg) * cosD(azimuthAstro_deg - rotationFromSouth_deg);
  return Math.acos(Math.max(-1, Math.min(1, c))) / DEG;
}
