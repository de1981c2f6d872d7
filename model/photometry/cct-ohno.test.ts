import { describe, expect, it } from 'vitest';
import { cctDuv, cctDuvFromUv, planckianUv } from './cct-ohno.js';
import { illuminantD65 } from './alpha-opic.js';
import { illuminantA } from '../sources/planckian.js';

/** A point at distance `duv` from the locus at T, along the normal (positive = above the locus). */
function offsetFromLocus(t_K: number, duv: number) {
  const p = planckianUv(t_K);
  const a = planckianUv(t_K * 0.9999);
  const b = planckianUv(t_K * 1.0001);
  const tu = b.u - a.u;
  const tv = b.v - a.v;
  const n = Math.hypot(tu, tv);
  // Normal pointing to larger v (the locus runs towards smaller u as T rises).
  let nu = -tv / n;
  let nv = tu / n;
  if (nv < 0) {
    nu = -nu;
    nv = -nv;
  }
  return { u: p.u + duv * nu, v: p.v + duv * nv };
}

describe('CCT and Duv (Ohno 2014 combined method)', () => {
  it('gives illuminant A a CCT of 2856 K within 1 K (ISO/CIE 11664-2:2022: "about 2856 K")', () => {
    const r = cctDuv(illuminantA());
    expect(Math.abs(r.cct_K - 2856)).toBeLessThan(1);
    expect(Math.abs(r.duv)).toBeLessThan(1e-5);
  });

  it('gives D65 a CCT of 6504 K within 1 K (CIE 015:2018: D65 ≈ 6504 K)', () => {
    expect(Math.abs(cctDuv(illuminantD65()).cct_K - 6504)).toBeLessThan(1);
  });

  it('recovers CCT within 0.5 K and Duv within 1e-5 for points set off the locus along its normal (self-consistency)', () => {
    for (const t of [1500, 2700, 4000, 6500, 12000, 30000]) {
      for (const duv of [-0.03, -0.01, -0.001, 0, 0.0015, 0.005, 0.02]) {
        const r = cctDuvFromUv(offsetFromLocus(t, duv));
        expect(Math.abs(r.cct_K - t), `T ${t} duv ${duv}`).toBeLessThan(0.5);
        expect(Math.abs(r.duv - duv), `T ${t} duv ${duv}`).toBeLessThan(1e-5);
        expect(r.solution).toBe(Math.abs(duv) < 0.002 ? 'triangular' : 'parabolic');
      }
    }
  });

  it('reports a chromaticity beyond the 1000–100 000 K table as out of range rather than inventing a CCT', () => {
    const r = cctDuvFromUv(planckianUv(600));
    expect(r.solution).toBe('out-of-range');
    expect(Number.isNaN(r.cct_K)).toBe(true);
  });
});
