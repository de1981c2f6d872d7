/**
 * A candela table with its symmetry expanded, and intensity lookup by bilinear interpolation.
 *
 * Type C: the stored C planes are mirrored by the file's symmetry onto the full circle, giving a
 * grid over C = 0…360° (360° repeats 0°, so interpolation wraps) × the file's γ angles. Mirrors
 * (IES LM-63-2002 §5.15; EULUMDAT Isym): quadrant C → 180−C, 180+C, 360−C; plane C0–C180
 * C → 360−C; plane C90–C270 C → 180−C (mod 360); rotational: one plane for every C.
 * Types A and B: H 0–90° mirrored to −90…0° (lateral), V 0–90° mirrored to −90…0°; the grid
 * covers H, V = −90…90°.
 * Outside the file's vertical range (e.g. γ above 90° for a 0–90° downlight) the intensity is 0:
 * LM-63 gives only the hemisphere the luminaire lights. Bilinear: linear in the horizontal angle
 * between the two neighbouring planes, then linear in the vertical angle.
 */
import type { CandelaTable, HorizontalSymmetry, PhotometryType } from './candela-table.js';

export interface CandelaGrid {
  readonly photometryType: PhotometryType;
  /** C (0…360, last = 360) or H (−90…90), degrees. */
  readonly horizontal_deg: readonly number[];
  /** γ (within 0…180) or V (−90…90), degrees. */
  readonly vertical_deg: readonly number[];
  /** candela_cd[h][v]. */
  readonly candela_cd: readonly (readonly number[])[];
}

const EPS = 1e-9;

/** The stored-range C angle that a C angle in [0, 360) is the mirror image of. */
export function foldC_deg(c: number, symmetry: HorizontalSymmetry): number {
  let x = ((c % 360) + 360) % 360;
  switch (symmetry) {
    case 'rotational':
      return 0;
    case 'quadrant':
      if (x > 180) x = 360 - x;
      return x > 90 ? 180 - x : x;
    case 'plane-C0-C180':
      return x > 180 ? 360 - x : x;
    case 'plane-C90-C270':
      if (x < 90) return 180 - x;
      return x > 270 ? 540 - x : x;
    default:
      return x;
  }
}

function images(s: number, symmetry: HorizontalSymmetry): number[] {
  switch (symmetry) {
    case 'quadrant':
      return [s, 180 - s, 180 + s, 360 - s];
    case 'plane-C0-C180':
      return [s, 360 - s];
    case 'plane-C90-C270':
      return [s, 180 - s];
    default:
      return [s];
  }
}

function uniqueSorted(values: number[]): number[] {
  const out: number[] = [];
  for (const v of [...values].sort((a, b) => a - b)) if (out.length === 0 || v - (out[out.length - 1] as number) > EPS) out.push(v);
  return out;
}

/** Index i with a[i] ≤ x ≤ a[i+1] (a increasing, a[0] ≤ x ≤ a[last]). */
function bracket(a: readonly number[], x: number): number {
  let lo = 0;
  let hi = a.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((a[mid] as number) <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Linear interpolation of row values y over angles a at x (x within a's range; one angle: that value). */
function interp(a: readonly number[], y: readonly number[], x: number): number {
  if (a.length === 1) return y[0] as number;
  const i = Math.min(bracket(a, x), a.length - 2);
  const a0 = a[i] as number;
  const a1 = a[i + 1] as number;
  const t = Math.min(1, Math.max(0, (x - a0) / (a1 - a0)));
  return (y[i] as number) * (1 - t) + (y[i + 1] as number) * t;
}

/** Intensities of the stored table at stored-range horizontal angle h, for every stored vertical angle. */
function storedColumn(t: CandelaTable, h: number): number[] {
  const hs = t.horizontal_deg;
  return t.vertical_deg.map((_, i) => interp(hs, t.candela_cd.map((row) => row[i] as number), h));
}

/** The table with its symmetry expanded onto the full horizontal range. */
export function expandCandelaTable(t: CandelaTable): CandelaGrid {
  if (t.photometryType === 'C') {
    const angles = t.symmetry === 'rotational' ? [0] : uniqueSorted(t.horizontal_deg.flatMap((s) => images(s, t.symmetry)).map((c) => ((c % 360) + 360) % 360));
    const full = [...angles, 360];
    return { photometryType: 'C', horizontal_deg: full, vertical_deg: t.vertical_deg, candela_cd: full.map((c) => storedColumn(t, foldC_deg(c, t.symmetry))) };
  }
  const mirrorH = t.symmetry === 'lateral';
  const mirrorV = (t.vertical_deg[0] as number) === 0;
  const hs = mirrorH ? uniqueSorted(t.horizontal_deg.flatMap((h) => [h, -h])) : [...t.horizontal_deg];
  const vs = mirrorV ? uniqueSorted(t.vertical_deg.flatMap((v) => [v, -v])) : [...t.vertical_deg];
  const cd = hs.map((h) => {
    const col = storedColumn(t, mirrorH ? Math.abs(h) : h);
    return vs.map((v) => interp(t.vertical_deg, col, mirrorV ? Math.abs(v) : v));
  });
  return { photometryType: t.photometryType, horizontal_deg: hs, vertical_deg: vs, candela_cd: cd };
}

/**
 * Intensity (cd) toward horizontal angle h (C, any value, wrapped to 0–360; or H) and vertical
 * angle v (γ or V), by bilinear interpolation in the expanded grid; 0 outside the grid's range.
 */
export function candelaAt_cd(g: CandelaGrid, h_deg: number, v_deg: number): number {
  const vs = g.vertical_deg;
  if (!(v_deg >= (vs[0] as number) - EPS && v_deg <= (vs[vs.length - 1] as number) + EPS)) return 0;
  const hs = g.horizontal_deg;
  const h = g.photometryType === 'C' ? ((h_deg % 360) + 360) % 360 : h_deg;
  if (!(h >= (hs[0] as number) - EPS && h <= (hs[hs.length - 1] as number) + EPS)) return 0;
  const v = Math.min(Math.max(v_deg, vs[0] as number), vs[vs.length - 1] as number);
  if (hs.length === 1) return interp(vs, g.candela_cd[0] as readonly number[], v);
  const j = Math.min(bracket(hs, h), hs.length - 2);
  const h0 = hs[j] as number;
  const h1 = hs[j + 1] as number;
  const t = Math.min(1, Math.max(0, (h - h0) / (h1 - h0)));
  return interp(vs, g.candela_cd[j] as readonly number[], v) * (1 - t) + interp(vs, g.candela_cd[j + 1] as readonly number[], v) * t;
}

/** Largest intensity of the grid and where it is (first occurrence). */
export function peakCandela(g: CandelaGrid): { candela_cd: number; horizontal_deg: number; vertical_deg: number } {
  let best = { candela_cd: -1, horizontal_deg: 0, vertical_deg: 0 };
  g.candela_cd.forEach((row, j) =>
    row.forEach((c, i) => {
      if (c > best.candela_cd) best = { candela_cd: c, horizontal_deg: g.horizontal_deg[j] as number, vertical_deg: g.vertical_deg[i] as number };
    }),
  );
  return best;
}
