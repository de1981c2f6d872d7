/**
 * Ground reflectance (albedo) for the ground-reflected part of eye illuminance. Surface values
 * from pvlib-python `albedo.SURFACE_ALBEDOS` (citing the PVsyst help, Wikipedia "Albedo" and
 * Payne 1972). Snow on the ground (EPW snow depth
 * > 0) switches to snow: 0.75 (fresh, ≤ 3 days since snowfall) or 0.65 (older) — the split by
 * days since snowfall is a heuristic from memory.
 */
export const SURFACE_REFLECTANCE = {
  urban: 0.18,
  grass: 0.2,
  freshGrass: 0.26,
  soil: 0.17,
  sand: 0.4,
  snow: 0.65,
  freshSnow: 0.75,
  asphalt: 0.12,
  concrete: 0.3,
  sea: 0.06,
} as const;

export const DEFAULT_GROUND_REFLECTANCE = SURFACE_REFLECTANCE.grass;

/** Reflectance to use given the snow state (NaN snow depth = unknown = no snow). */
export function groundReflectanceWithSnow(base: number, snowDepth_cm: number, daysSinceSnowfall: number): number {
  if (!(snowDepth_cm > 0)) return base;
  return daysSinceSnowfall <= 3 ? SURFACE_REFLECTANCE.freshSnow : SURFACE_REFLECTANCE.snow;
}
