/**
 * Splitting global horizontal irradiance into direct and diffuse, and dimming it by cloud.
 * - Erbs, Klein & Duffie (1982), Solar Energy 28(4):293–302, diffuse fraction from the clearness
 *   index k_t = GHI/(I0 cos θz) (coefficients from memory, checked in tests against pvlib-python's
 *   `irradiance.erbs` test values):
 *     k_d = 1 − 0.09 k_t (k_t ≤ 0.22); 0.9511 − 0.1604k_t + 4.388k_t² − 16.638k_t³ + 12.336k_t⁴
 *     (0.22 < k_t ≤ 0.8); 0.165 (k_t > 0.8). Direct normal is zeroed above 87° zenith (pvlib default).
 * - Kasten & Czeplak (1980), Solar Energy 24:177–189: GHI = GHI_clear·(1 − 0.75 (N/8)^3.4) for N
 *   oktas of cloud (from memory).
 */
import type { IrradianceComponents } from './clear-sky.js';

export function erbsDiffuseFraction(kt: number): number {
  if (kt <= 0.22) return 1 - 0.09 * kt;
  if (kt <= 0.8) return 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4;
  return 0.165;
}

/** Erbs split of GHI (W/m²) at zenith θz (deg) with extraterrestrial normal I0 (W/m²). */
export function erbsSplit(globalHorizontal_W_m2: number, zenith_deg: number, extraterrestrial_W_m2: number): IrradianceComponents & { readonly clearnessIndex: number } {
  const cosZ = Math.cos((zenith_deg * Math.PI) / 180);
  const ghi = Math.max(0, globalHorizontal_W_m2);
  // pvlib's clearness-index guards: cos θz ≥ 0.065, k_t ≤ 2.
  const kt = Math.min(2, ghi / (extraterrestrial_W_m2 * Math.max(cosZ, 0.065)));
  const dhi = erbsDiffuseFraction(kt) * ghi;
  const dni = zenith_deg > 87 || cosZ <= 0 ? 0 : (ghi - dhi) / cosZ;
  return { globalHorizontal_W_m2: ghi, directNormal_W_m2: Math.max(0, dni), diffuseHorizontal_W_m2: dhi, clearnessIndex: kt };
}

/** Fraction of clear-sky GHI left under N oktas of cloud (Kasten & Czeplak 1980). */
export function cloudGlobalFactor(cloud_oktas: number): number {
  const n = Math.max(0, Math.min(8, cloud_oktas));
  return 1 - 0.75 * (n / 8) ** 3.4;
}
