/**
 * Daylight coefficients of one window, computed once from geometry (the
 * window-element method of the EnergyPlus Engineering Reference "Daylight Factor Calculation",
 * with the Tregenza-patch daylight-coefficient form; Tregenza 1983, from memory).
 *
 * For a receiver (the eye facing the gaze, or the work area facing up) the aperture is divided
 * into elements (rectangle-view.ts). An element seen in direction r̂ with solid angle ω contributes
 *   w = ∫_element max(0, r̂·n̂_receiver) dω · τ(θ_B)/τ(0)       θ_B: incidence on the glass, cos θ_B = r̂·n̂_window
 * to the patch its ray reaches outside: a Tregenza sky patch (open sky), the same patch behind the
 * exterior obstruction (0 ≤ altitude < horizon angle), or the ground (altitude < 0). The eye
 * illuminance at any instant is then a dot product with the patch luminances.
 *
 * The window plane itself gets the same treatment over its whole outward hemisphere (1° grid in
 * altitude and azimuth relative to the façade normal): transmitted illuminance on the inner glass
 * plane per unit luminance of each patch, for the split-flux internally reflected component and
 * for a lowered (diffusing) shade. Light from the sky and the obstruction travels downward into
 * the room (floor and lower walls, Φ_FW); light from the ground travels upward (Φ_CW).
 */
import { relativeAngularTransmittance } from './glazing.js';
import { elementCosineWeight, rectangleElements, type PlaneRectangle } from './rectangle-view.js';
import { TREGENZA_PATCH_COUNT, tregenzaPatchIndex } from './tregenza-patches.js';
import { vec3, type Vec3 } from './vector3.js';
import type { PlacedWindow } from './window-geometry.js';

export interface ReceiverCoefficients {
  /** Receiver point (site frame, m) and unit normal. */
  readonly point: Vec3;
  readonly normal: Vec3;
  readonly aperture: PlaneRectangle;
  /** Illuminance at the receiver per cd/m² of each open sky patch (lx per cd·m⁻²). */
  readonly skyOpen: Float64Array;
  /** The same for sky patches behind the exterior obstruction. */
  readonly skyObstructed: Float64Array;
  /** Illuminance per cd/m² of ground luminance seen through the window. */
  readonly ground: number;
  /** Σ ω·max(0, r̂·n̂) over the aperture without glass losses: illuminance per cd/m² of a uniformly luminous (shaded) window. */
  readonly windowView: number;
}

export interface WindowCoefficients {
  readonly window: PlacedWindow;
  readonly eye: ReceiverCoefficients;
  readonly desk: ReceiverCoefficients;
  /** Transmitted illuminance on the inner window plane per cd/m² of each open / obstructed sky patch, and of the ground. */
  readonly planeSkyOpen: Float64Array;
  readonly planeSkyObstructed: Float64Array;
  readonly planeGround: number;
}

/** Indices of the non-zero entries of a patch coefficient vector (sparse dot products at run time). */
export function nonZeroPatches(v: Float64Array): Int32Array {
  const idx: number[] = [];
  v.forEach((x, k) => {
    if (x !== 0) idx.push(k);
  });
  return Int32Array.from(idx);
}

/** Elements per side of the aperture: 24 keeps the form-factor error below 0.1 % (validated in tests). */
export const APERTURE_ELEMENTS_PER_SIDE = 24;
const DEG = Math.PI / 180;

function receiverCoefficients(win: PlacedWindow, point: Vec3, normal: Vec3, aperture: PlaneRectangle, perSide: number): ReceiverCoefficients {
  const el = rectangleElements(point, aperture, perSide);
  const skyOpen = new Float64Array(TREGENZA_PATCH_COUNT);
  const skyObstructed = new Float64Array(TREGENZA_PATCH_COUNT);
  const sinObstruction = Math.sin(win.obstructionAngle_deg * DEG);
  const nw = win.outwardNormal;
  let ground = 0;
  let view = 0;
  for (let k = 0; k < el.count; k++) {
    const dx = el.dirX[k] as number;
    const dy = el.dirY[k] as number;
    const dz = el.dirZ[k] as number;
    const projected = elementCosineWeight(el, k, normal);
    if (projected <= 0) continue;
    view += projected;
    const w = projected * relativeAngularTransmittance(dx * nw.x + dy * nw.y + dz * nw.z, win.panes);
    if (dz < 0) ground += w;
    else {
      const p = tregenzaPatchIndex(vec3(dx, dy, dz));
      if (dz < sinObstruction) skyObstructed[p] = (skyObstructed[p] as number) + w;
      else skyOpen[p] = (skyOpen[p] as number) + w;
    }
  }
  return { point, normal, aperture, skyOpen, skyObstructed, ground, windowView: view };
}

function planeCoefficients(win: PlacedWindow): Pick<WindowCoefficients, 'planeSkyOpen' | 'planeSkyObstructed' | 'planeGround'> {
  const open = new Float64Array(TREGENZA_PATCH_COUNT);
  const obstructed = new Float64Array(TREGENZA_PATCH_COUNT);
  let ground = 0;
  const step = 1 * DEG;
  const n = win.outwardNormal;
  const facadeAz = Math.atan2(n.x, n.y);
  const sinObstruction = Math.sin(win.obstructionAngle_deg * DEG);
  for (let i = 0; i < 180; i++) {
    const alt = -Math.PI / 2 + (i + 0.5) * step;
    const cosAlt = Math.cos(alt);
    const sinAlt = Math.sin(alt);
    for (let j = 0; j < 180; j++) {
      const psi = -Math.PI / 2 + (j + 0.5) * step;
      const cosTheta = cosAlt * Math.cos(psi);
      // dω = cos(alt)·dalt·dψ; transmitted illuminance weight = dω · cos θ · τ(θ)/τ(0).
      const w = cosAlt * step * step * cosTheta * relativeAngularTransmittance(cosTheta, win.panes);
      if (sinAlt < 0) {
        ground += w;
        continue;
      }
      const az = facadeAz + psi;
      const d = vec3(Math.sin(az) * cosAlt, Math.cos(az) * cosAlt, sinAlt);
      const p = tregenzaPatchIndex(d);
      if (sinAlt < sinObstruction) obstructed[p] = (obstructed[p] as number) + w;
      else open[p] = (open[p] as number) + w;
    }
  }
  return { planeSkyOpen: open, planeSkyObstructed: obstructed, planeGround: ground };
}

/** All geometry-only coefficients of a window for an eye at `eyeHeight_m` looking along `gaze` and a work area at `deskHeight_m`. */
export function windowCoefficients(win: PlacedWindow, eyeHeight_m: number, gaze: Vec3, deskHeight_m: number, perSide = APERTURE_ELEMENTS_PER_SIDE): WindowCoefficients {
  return {
    window: win,
    eye: receiverCoefficients(win, vec3(0, 0, eyeHeight_m), gaze, win.apertureFromEye, perSide),
    desk: receiverCoefficients(win, vec3(0, 0, deskHeight_m), vec3(0, 0, 1), win.apertureFromDesk, perSide),
    ...planeCoefficients(win),
  };
}

/**
 * Whether the ray from the receiver toward the unit direction `s` passes through the aperture
 * (the sun seen through the window; obstruction handled by the caller).
 */
export function rayPassesAperture(rc: ReceiverCoefficients, sx: number, sy: number, sz: number, outwardNormal: Vec3): boolean {
  const a = rc.aperture;
  const cosN = sx * outwardNormal.x + sy * outwardNormal.y + sz * outwardNormal.z;
  if (cosN <= 1e-9) return false;
  const toCentre = vec3(a.centre.x - rc.point.x, a.centre.y - rc.point.y, a.centre.z - rc.point.z);
  const dist = toCentre.x * outwardNormal.x + toCentre.y * outwardNormal.y + toCentre.z * outwardNormal.z;
  const t = dist / cosN;
  const hx = rc.point.x + sx * t - a.centre.x;
  const hy = rc.point.y + sy * t - a.centre.y;
  const hz = rc.point.z + sz * t - a.centre.z;
  const u = hx * a.uAxis.x + hy * a.uAxis.y + hz * a.uAxis.z;
  const v = hx * a.vAxis.x + hy * a.vAxis.y + hz * a.vAxis.z;
  return Math.abs(u) <= a.width_m / 2 && Math.abs(v) <= a.height_m / 2;
}
