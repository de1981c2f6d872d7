/**
 * Low-sun and twilight floor for diffuse horizontal illuminance. The clear-sky and weather-file
 * models give (nearly) no light once the sun touches the horizon, while real skies give about
 * 400 lx at sunrise/sunset and about 3.4 lx at the end of civil twilight (sun −6°) (typical
 * values of web lux tables derived from Wikipedia "Lux"). We interpolate log-linearly between them for −6° < e ≤ 0°, hold 400 lx as a floor for
 * 0° < e < 3°, and scale by the cloud factor of the hour. The shape is our own (common practice).
 */
export const TWILIGHT_HORIZON_LX = 400;
export const TWILIGHT_CIVIL_END_LX = 3.4;

export function twilightDiffuseFloor_lx(sunElevation_deg: number, cloudFactor = 1): number {
  if (sunElevation_deg <= -6) return 0;
  if (sunElevation_deg >= 3) return 0;
  const e = Math.min(0, sunElevation_deg);
  return cloudFactor * TWILIGHT_HORIZON_LX * (TWILIGHT_CIVIL_END_LX / TWILIGHT_HORIZON_LX) ** (-e / 6);
}
