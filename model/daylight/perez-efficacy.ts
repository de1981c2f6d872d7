/**
 * Luminous efficacy of daylight, Perez, Ineichen, Seals, Michalsky & Stewart (1990), "Modeling
 * daylight availability and irradiance components from direct and global irradiance", Solar
 * Energy 44(5):271–289, Table 4 coefficients:
 *   diffuse  K_d = a + b·W + c·cos Z + d·ln Δ
 *   direct   K_b = max(0, a + b·W + c·exp(5.73 Z − 5) + d·Δ)
 *   global   K_g = a + b·W + c·cos Z + d·ln Δ
 * W = precipitable water (cm) = exp(0.07·T_d − 0.075) from dew point T_d (°C) (Perez 1990 form).
 * Guards (same sky generator): ε ≤ 12, Δ ≥ 0.01 before the logarithm.
 */
import { airMassKasten1966 } from './extraterrestrial.js';
import { perezSkyIndices, type PerezSkyIndices } from './perez-sky-indices.js';

type Row = readonly [number, number, number, number];
/** [a, b, c, d] per clearness bin 1–8. */
const GLOBAL: readonly Row[] = [
  [96.63, -0.47, 11.5, -9.16], [107.54, 0.79, 1.79, -1.19], [98.73, 0.7, 4.4, -6.95], [92.72, 0.56, 8.36, -8.31],
  [86.73, 0.98, 7.1, -10.94], [88.34, 1.39, 6.06, -7.6], [78.63, 1.47, 4.93, -11.37], [99.65, 1.86, -4.46, -3.15],
];
const DIFFUSE: readonly Row[] = [
  [97.24, -0.46, 12.0, -8.91], [107.22, 1.15, 0.59, -3.95], [104.97, 2.96, -5.53, -8.77], [102.39, 5.59, -13.95, -13.9],
  [100.71, 5.94, -22.75, -23.74], [106.42, 3.83, -36.15, -28.83], [141.88, 1.9, -53.24, -14.03], [152.23, 0.35, -45.27, -7.98],
];
const DIRECT: readonly Row[] = [
  [57.2, -4.55, -2.98, 117.12], [98.99, -3.46, -1.21, 12.38], [109.83, -4.9, -1.71, -8.81], [110.34, -5.84, -1.99, -4.56],
  [106.36, -3.97, -1.75, -6.16], [107.19, -1.25, -1.51, -26.73], [105.75, 0.77, -1.26, -34.44], [101.18, 1.58, -1.1, -8.29],
];

/** Precipitable water (cm) from dew point (°C), Perez et al. 1990. */
export function precipitableWater_cm(dewPoint_C: number): number {
  return Math.exp(0.07 * dewPoint_C - 0.075);
}

export interface DaylightIlluminance {
  readonly directNormal_lx: number;
  readonly diffuseHorizontal_lx: number;
  readonly globalHorizontal_lx: number;
  /** Efficacies used (lm/W). */
  readonly directEfficacy_lm_W: number;
  readonly diffuseEfficacy_lm_W: number;
  readonly indices: PerezSkyIndices;
}

export interface EfficacyInput {
  /** Solar zenith (deg), refraction-corrected. */
  readonly zenith_deg: number;
  readonly directNormal_W_m2: number;
  readonly diffuseHorizontal_W_m2: number;
  /** Dew point (°C); default 10 °C when unknown (our choice, W ≈ 1.9 cm). */
  readonly dewPoint_C?: number;
  /** Extraterrestrial normal irradiance (W/m²). */
  readonly extraterrestrial_W_m2: number;
}

/** Highest zenith used for the efficacy and index formulas (low sun is unstable). */
export const PEREZ_MAX_ZENITH_DEG = 87;

/** Direct normal, diffuse and global horizontal illuminance from irradiance (Perez 1990). */
export function perezIlluminance(input: EfficacyInput): DaylightIlluminance {
  const dhi = Math.max(0, input.diffuseHorizontal_W_m2);
  const dni = Math.max(0, input.directNormal_W_m2);
  const zDeg = Math.min(input.zenith_deg, PEREZ_MAX_ZENITH_DEG);
  if (!(dhi > 0)) {
    return { directNormal_lx: 0, diffuseHorizontal_lx: 0, globalHorizontal_lx: 0, directEfficacy_lm_W: 0, diffuseEfficacy_lm_W: 0, indices: { clearness: 1, brightness: 0, bin: 0 } };
  }
  const idx = perezSkyIndices(zDeg, dni, dhi, airMassKasten1966(zDeg), input.extraterrestrial_W_m2);
  const bin = idx.bin;
  const delta = Math.max(idx.brightness, 0.01);
  const z = (zDeg * Math.PI) / 180;
  const w = precipitableWater_cm(input.dewPoint_C ?? 10);
  const [da, db, dc, dd] = DIFFUSE[bin] as Row;
  const [ba, bb, bc, bd] = DIRECT[bin] as Row;
  const kd = Math.max(0, da + db * w + dc * Math.cos(z) + dd * Math.log(delta));
  const kb = Math.max(0, ba + bb * w + bc * Math.exp(5.73 * z - 5) + bd * delta);
  const directNormal_lx = kb * dni;
  const diffuseHorizontal_lx = kd * dhi;
  const cosZ = Math.max(0, Math.cos((input.zenith_deg * Math.PI) / 180));
  return {
    directNormal_lx,
    diffuseHorizontal_lx,
    globalHorizontal_lx: directNormal_lx * cosZ + diffuseHorizontal_lx,
    directEfficacy_lm_W: kb,
    diffuseEfficacy_lm_W: kd,
    indices: idx,
  };
}

/** Global efficacy K_g (lm/W) of Perez 1990, for files that give only global irradiance. */
export function perezGlobalEfficacy_lm_W(bin: number, dewPoint_C: number, zenith_deg: number, brightness: number): number {
  const [a, b, c, d] = GLOBAL[Math.max(0, Math.min(7, bin))] as Row;
  return a + b * precipitableWater_cm(dewPoint_C) + c * Math.cos((Math.min(zenith_deg, PEREZ_MAX_ZENITH_DEG) * Math.PI) / 180) + d * Math.log(Math.max(brightness, 0.01));
}
