/** Where and under what air the sun is seen (SPA inputs, Reda & Andreas 2004 §2). */
export interface Observer {
  /** Geodetic latitude, north positive (deg). */
  readonly latitude_deg: number;
  /** Longitude, east positive (deg). */
  readonly longitude_deg: number;
  /** Height above sea level (m); default 0. */
  readonly elevation_m?: number;
  /** Annual mean local air pressure (hPa = mbar); default 1013.25. */
  readonly pressure_hPa?: number;
  /** Annual mean local air temperature (°C); default 10. */
  readonly temperature_C?: number;
}

/** Atmospheric refraction at sunrise/sunset (deg), SPA default (Reda & Andreas 2004, Table A5.1). */
export const REFRACTION_AT_HORIZON_DEG = 0.5667;
/** Apparent radius of the sun (deg), SPA constant. */
export const SUN_RADIUS_DEG = 0.26667;

export interface ResolvedObserver {
  readonly latitude_deg: number;
  readonly longitude_deg: number;
  readonly elevation_m: number;
  readonly pressure_hPa: number;
  readonly temperature_C: number;
}

/** Fills defaults and refuses impossible values, naming the field. */
export function resolveObserver(o: Observer): ResolvedObserver {
  const r: ResolvedObserver = {
    latitude_deg: o.latitude_deg,
    longitude_deg: o.longitude_deg,
    elevation_m: o.elevation_m ?? 0,
    pressure_hPa: o.pressure_hPa ?? 1013.25,
    temperature_C: o.temperature_C ?? 10,
  };
  const bad = (field: string, why: string) => new RangeError(`${field}: ${why}`);
  if (!Number.isFinite(r.latitude_deg) || Math.abs(r.latitude_deg) > 90) throw bad('latitude_deg', `must be within −90…90, got ${r.latitude_deg}`);
  if (!Number.isFinite(r.longitude_deg) || Math.abs(r.longitude_deg) > 180) throw bad('longitude_deg', `must be within −180…180, got ${r.longitude_deg}`);
  if (!Number.isFinite(r.elevation_m) || r.elevation_m < -6_500_000 || r.elevation_m > 100_000) throw bad('elevation_m', `out of range, got ${r.elevation_m}`);
  if (!Number.isFinite(r.pressure_hPa) || r.pressure_hPa <= 0 || r.pressure_hPa > 5000) throw bad('pressure_hPa', `must be within 0…5000, got ${r.pressure_hPa}`);
  if (!Number.isFinite(r.temperature_C) || r.temperature_C <= -273 || r.temperature_C > 6000) throw bad('temperature_C', `must be above −273, got ${r.temperature_C}`);
  return r;
}
