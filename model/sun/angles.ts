/** Degree helpers for the solar-position code (pure). */
export const DEG = Math.PI / 180;

/** Angle reduced to [0, 360) degrees. */
export function wrap360_deg(a_deg: number): number {
  const r = a_deg % 360;
  return r < 0 ? r + 360 : r;
}

/** Angle reduced to (−180, 180] degrees. */
export function wrap180_deg(a_deg: number): number {
  const r = wrap360_deg(a_deg);
  return r > 180 ? r - 360 : r;
}

export const sinD = (a_deg: number): number => Math.sin(a_deg * DEG);
export const cosD = (a_deg: number): number => Math.cos(a_deg * DEG);
export const tanD = (a_deg: number): number => Math.tan(a_deg * DEG);
export const asinD = (x: number): number => Math.asin(Math.max(-1, Math.min(1, x))) / DEG;
export const acosD = (x: number): number => Math.acos(Math.max(-1, Math.min(1, x))) / DEG;
export const atan2D = (y: number, x: number): number => Math.atan2(y, x) / DEG;
