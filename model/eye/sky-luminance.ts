/**
 * Absolute sky luminance per Tregenza patch for one instant: the CIE general sky shape
 * (cie-general-sky.ts) scaled so that the sky integrates to the diffuse horizontal illuminance
 * (absolute calibration):
 *   L_z = E_dh / Σ_p (L_p/L_z) · ∫_p cos Z dω
 * The result is luminance per lux of E_dh (cd·m⁻²·lx⁻¹), so one vector serves every window
 * and every E_dh. The gradation term of each patch depends only on the sky type and is cached.
 */
import { cieSkyParameters } from './cie-general-sky.js';
import { tregenzaPatches } from './tregenza-patches.js';
import type { Vec3 } from './vector3.js';

const gradationCache = new Map<number, Float64Array>();

function patchGradation(skyType: number): Float64Array {
  let g = gradationCache.get(skyType);
  if (g === undefined) {
    const p = cieSkyParameters(skyType);
    const patches = tregenzaPatches();
    const zenith = 1 + p.a * Math.exp(p.b);
    g = new Float64Array(patches.count);
    for (let k = 0; k < patches.count; k++) {
      const cz = patches.dirZ[k] as number;
      g[k] = (cz <= 1e-9 ? 1 : 1 + p.a * Math.exp(p.b / cz)) / zenith;
    }
    gradationCache.set(skyType, g);
  }
  return g;
}

/** Fill `out` (length 145) with patch luminance per unit diffuse horizontal illuminance; `sun` is the unit vector toward the sun. */
export function skyLuminancePerDiffuseLux(skyType: number, sun: Vec3, out: Float64Array): Float64Array {
  const p = cieSkyParameters(skyType);
  const grad = patchGradation(skyType);
  const patches = tregenzaPatches();
  const edge = Math.exp((p.d * Math.PI) / 2);
  let horizontal = 0;
  for (let k = 0; k < patches.count; k++) {
    const cosChi = (patches.dirX[k] as number) * sun.x + (patches.dirY[k] as number) * sun.y + (patches.dirZ[k] as number) * sun.z;
    const c = cosChi > 1 ? 1 : cosChi < -1 ? -1 : cosChi;
    const chi = Math.acos(c);
    const l = (1 + p.c * (Math.exp(p.d * chi) - edge) + p.e * c * c) * (grad[k] as number);
    out[k] = l;
    horizontal += l * (patches.projectedSolidAngle_sr[k] as number);
  }
  // The common factor 1/f(Z_s) of L/L_z cancels in the normalisation.
  const inv = horizontal > 0 ? 1 / horizontal : 0;
  for (let k = 0; k < patches.count; k++) out[k] = (out[k] as number) * inv;
  return out;
}
