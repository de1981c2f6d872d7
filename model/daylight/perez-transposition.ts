/**
 * Perez et al. (1990) anisotropic sky on a tilted plane, coefficient set "allsitescomposite1990"
 * (as in pvlib-python's `irradiance.perez`). Applied to illuminance with the irradiance
 * coefficients (the sky's efficacy is assumed equal on every plane).
 *   F1 = max(0, f11 + f12·Δ + f13·Z),  F2 = f21 + f22·Δ + f23·Z   (Z = solar zenith, rad)
 *   E_s = E_dh·[(1 − F1)(1 + cos β)/2 + F1·a/b + F2·sin β],  a = max(0, cos θi), b = max(cos 85°, cos θz)
 */
import { perezClearnessBin } from './perez-sky-indices.js';

type F = readonly [number, number, number, number, number, number];
const COEFFICIENTS: readonly F[] = [
  [-0.008, 0.588, -0.062, -0.06, 0.072, -0.022],
  [0.13, 0.683, -0.151, -0.019, 0.066, -0.029],
  [0.33, 0.487, -0.221, 0.055, -0.064, -0.026],
  [0.568, 0.187, -0.295, 0.109, -0.152, -0.014],
  [0.873, -0.392, -0.362, 0.226, -0.462, 0.001],
  [1.132, -1.237, -0.412, 0.288, -0.823, 0.056],
  [1.06, -1.6, -0.359, 0.264, -1.127, 0.131],
  [0.678, -0.327, -0.25, 0.156, -1.377, 0.251],
];

export interface PerezBrightening {
  /** Circumsolar brightening F1 (≥ 0). */
  readonly f1: number;
  /** Horizon brightening F2. */
  readonly f2: number;
}

export function perezBrightening(clearness: number, brightness: number, zenith_deg: number): PerezBrightening {
  const [f11, f12, f13, f21, f22, f23] = COEFFICIENTS[perezClearnessBin(clearness)] as F;
  const z = (zenith_deg * Math.PI) / 180;
  return { f1: Math.max(0, f11 + f12 * brightness + f13 * z), f2: f21 + f22 * brightness + f23 * z };
}

/** cos 85°, the lower limit of the circumsolar denominator b. */
export const COS_85 = Math.cos((85 * Math.PI) / 180);
