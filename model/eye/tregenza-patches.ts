/**
 * Tregenza subdivision of the sky hemisphere into 145 patches (Tregenza 1987, "Subdivision of
 * the sky hemisphere for luminance measurements", Lighting Res. Technol. 19(1) — band layout
 * from memory, a fact of the trade): seven 12° altitude bands with 30, 30, 24, 24, 18, 12, 6
 * patches, plus a polar cap from 84° to 90°. Patch j of a band spans azimuth [j, j+1)·360°/n
 * clockwise from north.
 *
 * For each patch we keep its centre direction and the exact projected solid angle
 * ∫ cos Z dω = (Δφ/2)(sin²α_top − sin²α_bottom), which makes the normalisation of a uniform
 * sky exactly π (horizontal illuminance of unit luminance).
 */
import { directionFromAltAz_deg, type Vec3 } from './vector3.js';

export const TREGENZA_BAND_COUNTS: readonly number[] = [30, 30, 24, 24, 18, 12, 6, 1];
const BAND_DEG = 12;
export const TREGENZA_PATCH_COUNT = 145;

export interface SkyPatches {
  readonly count: number;
  /** Centre directions (unit vectors, site frame) as flat xyz. */
  readonly dirX: Float64Array;
  readonly dirY: Float64Array;
  readonly dirZ: Float64Array;
  /** Projected solid angle ∫ cos Z dω of each patch (sr). */
  readonly projectedSolidAngle_sr: Float64Array;
}

let cached: SkyPatches | undefined;

export function tregenzaPatches(): SkyPatches {
  if (cached !== undefined) return cached;
  const n = TREGENZA_PATCH_COUNT;
  const dirX = new Float64Array(n);
  const dirY = new Float64Array(n);
  const dirZ = new Float64Array(n);
  const proj = new Float64Array(n);
  let k = 0;
  TREGENZA_BAND_COUNTS.forEach((count, band) => {
    const lo = band * BAND_DEG;
    const hi = Math.min(90, lo + BAND_DEG);
    const isCap = count === 1;
    const centreAlt = isCap ? 90 : (lo + hi) / 2;
    const sLo = Math.sin((lo * Math.PI) / 180);
    const sHi = Math.sin((hi * Math.PI) / 180);
    const dPhi = (2 * Math.PI) / count;
    for (let j = 0; j < count; j++) {
      const d: Vec3 = directionFromAltAz_deg(centreAlt, (j + 0.5) * (360 / count));
      dirX[k] = d.x;
      dirY[k] = d.y;
      dirZ[k] = d.z;
      proj[k] = (dPhi / 2) * (sHi * sHi - sLo * sLo);
      k++;
    }
  });
  cached = { count: n, dirX, dirY, dirZ, projectedSolidAngle_sr: proj };
  return cached;
}

/** Index of the Tregenza patch that contains the (upward) direction d (d.z ≥ 0). */
export function tregenzaPatchIndex(d: Vec3): number {
  const alt_deg = (Math.asin(Math.max(0, Math.min(1, d.z))) * 180) / Math.PI;
  const band = Math.min(TREGENZA_BAND_COUNTS.length - 1, Math.floor(alt_deg / BAND_DEG));
  let start = 0;
  for (let b = 0; b < band; b++) start += TREGENZA_BAND_COUNTS[b] as number;
  const count = TREGENZA_BAND_COUNTS[band] as number;
  if (count === 1) return start;
  let az = (Math.atan2(d.x, d.y) * 180) / Math.PI;
  if (az < 0) az += 360;
  return start + Math.min(count - 1, Math.floor(az / (360 / count)));
}
