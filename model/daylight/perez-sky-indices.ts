/**
 * Perez et al. (1990) sky condition indices (Solar Energy 44(5):271–289):
 *   clearness  ε = [(I_dh + I_bn)/I_dh + κZ³] / (1 + κZ³),  κ = 1.041, Z = solar zenith (rad)
 *   brightness Δ = I_dh · m / I0   (m relative air mass, I0 extraterrestrial normal irradiance)
 * and the eight clearness bins with lower bounds 1, 1.065, 1.23, 1.5, 1.95, 2.8, 4.5, 6.2.
 */
export const PEREZ_KAPPA = 1.041;
export const PEREZ_CLEARNESS_BIN_LOWER = [1, 1.065, 1.23, 1.5, 1.95, 2.8, 4.5, 6.2] as const;

export interface PerezSkyIndices {
  /** Sky clearness ε (1 = overcast, ≳ 6 = clear). */
  readonly clearness: number;
  /** Sky brightness Δ. */
  readonly brightness: number;
  /** Clearness bin index 0–7 (bin 1–8 of the paper). */
  readonly bin: number;
}

export function perezClearnessBin(clearness: number): number {
  let bin = 0;
  for (let k = 1; k < PEREZ_CLEARNESS_BIN_LOWER.length; k++) if (clearness >= (PEREZ_CLEARNESS_BIN_LOWER[k] as number)) bin = k;
  return bin;
}

/**
 * ε and Δ from diffuse horizontal and direct normal irradiance (W/m²). Returns ε = 1, Δ = 0
 * (overcast, dark) when there is no diffuse light.
 */
export function perezSkyIndices(zenith_deg: number, directNormal_W_m2: number, diffuseHorizontal_W_m2: number, airMass: number, extraterrestrial_W_m2: number): PerezSkyIndices {
  if (!(diffuseHorizontal_W_m2 > 0) || !Number.isFinite(airMass)) return { clearness: 1, brightness: 0, bin: 0 };
  const z = (Math.min(zenith_deg, 90) * Math.PI) / 180;
  const kz3 = PEREZ_KAPPA * z * z * z;
  const clearness = ((diffuseHorizontal_W_m2 + Math.max(0, directNormal_W_m2)) / diffuseHorizontal_W_m2 + kz3) / (1 + kz3);
  const brightness = (diffuseHorizontal_W_m2 * airMass) / extraterrestrial_W_m2;
  return { clearness, brightness, bin: perezClearnessBin(clearness) };
}
