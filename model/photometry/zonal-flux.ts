/**
 * Luminous flux integrated from a candela grid by the zonal-constant (zonal-lumen) method of
 * the lighting handbooks (IES Lighting Handbook, "zonal constants"; method from memory):
 *
 *   type C:    Φ = Σ_i Ī(γ_i) · 2π (cos γ_a,i − cos γ_b,i)
 *   types A/B: Φ = Σ_i Σ_j I(H_j, V_i) · ΔH_j · (sin V_b,i − sin V_a,i)
 *
 * Each tabulated vertical angle stands for the zone between the midpoints to its neighbours
 * (the first and last zones end at the first and last angles). Ī(γ_i) is the mean over the
 * full circle of C, by the trapezoid rule on the expanded grid; ΔH_j is the width in radians of
 * the midpoint cell of H_j. For A and B, V is measured from the photometric horizontal, so the
 * solid angle of a cell is ΔH · Δ(sin V). Directions outside the table give no flux.
 */
import type { CandelaGrid } from './candela-grid.js';

/** Zone edges (degrees) of each angle: midpoints to the neighbours, clipped to the first and last angle. */
function zoneEdges(a: readonly number[]): [number, number][] {
  return a.map((x, i) => [i === 0 ? x : (x + (a[i - 1] as number)) / 2, i === a.length - 1 ? x : (x + (a[i + 1] as number)) / 2]);
}

const RAD = Math.PI / 180;

/** Total luminous flux (lm) of the grid by the zonal-constant method. */
export function zonalFlux_lm(g: CandelaGrid): number {
  const vs = g.vertical_deg;
  const hs = g.horizontal_deg;
  const zones = zoneEdges(vs);
  let flux = 0;
  if (g.photometryType === 'C') {
    const span = (hs[hs.length - 1] as number) - (hs[0] as number);
    zones.forEach(([a, b], i) => {
      let mean: number;
      if (hs.length === 1 || span === 0) mean = g.candela_cd[0]?.[i] as number;
      else {
        let s = 0;
        for (let j = 0; j + 1 < hs.length; j++) s += (((g.candela_cd[j]?.[i] as number) + (g.candela_cd[j + 1]?.[i] as number)) / 2) * ((hs[j + 1] as number) - (hs[j] as number));
        mean = s / span;
      }
      flux += mean * 2 * Math.PI * (Math.cos(a * RAD) - Math.cos(b * RAD));
    });
    return flux;
  }
  const hz = zoneEdges(hs);
  zones.forEach(([a, b], i) => {
    const dSin = Math.sin(b * RAD) - Math.sin(a * RAD);
    hz.forEach(([h0, h1], j) => {
      flux += (g.candela_cd[j]?.[i] as number) * (h1 - h0) * RAD * dSin;
    });
  });
  return flux;
}
