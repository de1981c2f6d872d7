/**
 * Division of a plane rectangle, seen from a point, into elements with their exact solid angles.
 *
 * Method: with D the perpendicular distance from the point to the rectangle's plane and (x, z) the
 * in-plane coordinates measured from the foot of the perpendicular, the solid angle of the
 * rectangle [0, x]×[0, z] is  Ω(x, z) = atan( x·z / (D·√(D² + x² + z²)) )  (odd in x and in z;
 * standard result for a rectangle with one corner at the foot of the normal, e.g. the solid-angle
 * form in Howell's catalogue of configuration factors — from memory, checked in tests by summing
 * to 2π for an infinite plane). An element [x0,x1]×[z0,z1] then has
 *   Ω = Ω(x1,z1) − Ω(x0,z1) − Ω(x1,z0) + Ω(x0,z0).
 * Element edges are spaced uniformly in angle (x = D·tan u), so near and far elements subtend
 * similar angles and very large apertures stay accurate.
 *
 * For the cosine-weighted integral over an element we keep its "vector form factor" from
 * Lambert's contour integral (Lambert 1760; see e.g. Siegel & Howell, contour integration of
 * configuration factors — a textbook identity):
 *   ∫_element r̂·ĝ dω = V·ĝ,   V = ½ Σ_edges γ_i n̂_i
 * where γ_i is the angle the edge subtends at the viewpoint and n̂_i the unit normal of the plane
 * through the viewpoint and that edge (oriented toward the element). This is exact for any
 * receiver orientation ĝ while the element lies wholly in front of the receiver. Each element also
 * carries the direction to its centre, to look up the luminance behind it.
 */
import { add, normalize, scale, sub, dot, type Vec3 } from './vector3.js';

export interface PlaneRectangle {
  /** Centre of the rectangle (m, site frame). */
  readonly centre: Vec3;
  /** Unit vector along the rectangle's width. */
  readonly uAxis: Vec3;
  /** Unit vector along the rectangle's height (perpendicular to uAxis). */
  readonly vAxis: Vec3;
  readonly width_m: number;
  readonly height_m: number;
}

export interface RectangleElements {
  readonly count: number;
  /** Unit directions from the viewpoint to each element centre. */
  readonly dirX: Float64Array;
  readonly dirY: Float64Array;
  readonly dirZ: Float64Array;
  /** Solid angle of each element (sr). */
  readonly solidAngle_sr: Float64Array;
  /** Vector form factor V of each element (sr): ∫ r̂·ĝ dω = V·ĝ. */
  readonly vecX: Float64Array;
  readonly vecY: Float64Array;
  readonly vecZ: Float64Array;
}

function cross(a: Vec3, b: Vec3): Vec3 {
  return { x: a.y * b.z - a.z * b.y, y: a.z * b.x - a.x * b.z, z: a.x * b.y - a.y * b.x };
}

/** Lambert's vector form factor of a planar polygon (vertices relative to the viewpoint), oriented toward the polygon. */
function vectorFormFactor(corners: readonly Vec3[], towardElement: Vec3): Vec3 {
  let vx = 0;
  let vy = 0;
  let vz = 0;
  for (let i = 0; i < corners.length; i++) {
    const a = corners[i] as Vec3;
    const b = corners[(i + 1) % corners.length] as Vec3;
    const c = cross(a, b);
    const cn = Math.hypot(c.x, c.y, c.z);
    if (cn === 0) continue;
    const gamma = Math.atan2(cn, dot(a, b));
    vx += (gamma * c.x) / cn;
    vy += (gamma * c.y) / cn;
    vz += (gamma * c.z) / cn;
  }
  const sign = vx * towardElement.x + vy * towardElement.y + vz * towardElement.z >= 0 ? 0.5 : -0.5;
  return { x: vx * sign, y: vy * sign, z: vz * sign };
}

/** ∫ max(0, r̂·ĝ) dω of element k: exact (V·ĝ) when the element is in front of the receiver, centre-sampled near its horizon. */
export function elementCosineWeight(el: RectangleElements, k: number, g: Vec3): number {
  const centreCos = (el.dirX[k] as number) * g.x + (el.dirY[k] as number) * g.y + (el.dirZ[k] as number) * g.z;
  if (centreCos <= 0) return 0;
  const v = (el.vecX[k] as number) * g.x + (el.vecY[k] as number) * g.y + (el.vecZ[k] as number) * g.z;
  return v > 0 ? v : 0;
}

function cornerSolidAngle(x: number, z: number, d: number): number {
  return Math.atan((x * z) / (d * Math.sqrt(d * d + x * x + z * z)));
}

function tangentEdges(a0: number, a1: number, d: number, n: number): Float64Array {
  const u0 = Math.atan(a0 / d);
  const u1 = Math.atan(a1 / d);
  const out = new Float64Array(n + 1);
  for (let i = 0; i <= n; i++) out[i] = d * Math.tan(u0 + ((u1 - u0) * i) / n);
  return out;
}

/** Elements of `rect` as seen from `eye`; the eye must not lie in the rectangle's plane. */
export function rectangleElements(eye: Vec3, rect: PlaneRectangle, perSide: number): RectangleElements {
  // Plane normal pointing from the eye toward the plane.
  let n: Vec3 = { x: rect.uAxis.y * rect.vAxis.z - rect.uAxis.z * rect.vAxis.y, y: rect.uAxis.z * rect.vAxis.x - rect.uAxis.x * rect.vAxis.z, z: rect.uAxis.x * rect.vAxis.y - rect.uAxis.y * rect.vAxis.x };
  let d = dot(sub(rect.centre, eye), n);
  if (d < 0) {
    n = scale(n, -1);
    d = -d;
  }
  if (!(d > 0)) throw new Error('the viewpoint lies in the plane of the rectangle');
  const foot = add(eye, scale(n, d));
  const rel = sub(rect.centre, foot);
  const xc = dot(rel, rect.uAxis);
  const zc = dot(rel, rect.vAxis);
  const xs = tangentEdges(xc - rect.width_m / 2, xc + rect.width_m / 2, d, perSide);
  const zs = tangentEdges(zc - rect.height_m / 2, zc + rect.height_m / 2, d, perSide);
  const count = perSide * perSide;
  const dirX = new Float64Array(count);
  const dirY = new Float64Array(count);
  const dirZ = new Float64Array(count);
  const omega = new Float64Array(count);
  const vecX = new Float64Array(count);
  const vecY = new Float64Array(count);
  const vecZ = new Float64Array(count);
  let k = 0;
  for (let i = 0; i < perSide; i++) {
    const x0 = xs[i] as number;
    const x1 = xs[i + 1] as number;
    for (let j = 0; j < perSide; j++) {
      const z0 = zs[j] as number;
      const z1 = zs[j + 1] as number;
      omega[k] = cornerSolidAngle(x1, z1, d) - cornerSolidAngle(x0, z1, d) - cornerSolidAngle(x1, z0, d) + cornerSolidAngle(x0, z0, d);
      const centre = add(foot, add(scale(rect.uAxis, (x0 + x1) / 2), scale(rect.vAxis, (z0 + z1) / 2)));
      const dir = normalize(sub(centre, eye));
      dirX[k] = dir.x;
      dirY[k] = dir.y;
      dirZ[k] = dir.z;
      const corner = (x: number, z: number) => sub(add(foot, add(scale(rect.uAxis, x), scale(rect.vAxis, z))), eye);
      const v = vectorFormFactor([corner(x0, z0), corner(x1, z0), corner(x1, z1), corner(x0, z1)], dir);
      vecX[k] = v.x;
      vecY[k] = v.y;
      vecZ[k] = v.z;
      k++;
    }
  }
  return { count, dirX, dirY, dirZ, solidAngle_sr: omega, vecX, vecY, vecZ };
}

/**
 * Illuminance (lx) on a receiver with unit normal `receiverNormal` at `eye` from the rectangle at
 * uniform luminance `luminance_cd_m2`: E = L · Σ_k ∫_k max(0, r̂·n̂) dω.
 */
export function uniformRectangleIlluminance_lx(eye: Vec3, rect: PlaneRectangle, receiverNormal: Vec3, luminance_cd_m2: number, perSide = 32): number {
  const el = rectangleElements(eye, rect, perSide);
  let s = 0;
  for (let k = 0; k < el.count; k++) s += elementCosineWeight(el, k, receiverNormal);
  return luminance_cd_m2 * s;
}
