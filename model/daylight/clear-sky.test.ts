/** Clear-sky and decomposition models against pvlib-python's published test values (tests/test_clearsky.py, tests/test_irradiance.py). */
import { describe, expect, it } from 'vitest';
import { ineichenClearSky } from './clear-sky.js';
import { cloudGlobalFactor, erbsSplit } from './decomposition.js';
import { extraterrestrialNormal_W_m2 } from './extraterrestrial.js';

const close = (a: number, b: number, rtol: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(rtol * Math.abs(b) + 1e-9);

describe('Ineichen–Perez clear sky (pvlib clearsky.ineichen test values)', () => {
  it('zenith 10°, air mass 1, T_L 3, I0 1364 → 1038.159219 / 942.208186 / 110.265293 W/m² (test_ineichen_scalar_input)', () => {
    const r = ineichenClearSky(10, 1, 3);
    close(r.globalHorizontal_W_m2, 1038.159219, 1e-7);
    close(r.directNormal_W_m2, 942.2081860378344, 1e-7);
    close(r.diffuseHorizontal_W_m2, 110.26529293612793, 1e-7);
  });
  it('I0 1370 → 1042.72590228 / 946.35279683 / 110.75033088 (test_ineichen_dni_extra)', () => {
    const r = ineichenClearSky(10, 1, 3, 0, 1370);
    close(r.globalHorizontal_W_m2, 1042.72590228, 1e-7);
    close(r.directNormal_W_m2, 946.35279683, 1e-7);
    close(r.diffuseHorizontal_W_m2, 110.75033088, 1e-7);
  });
  it('altitude 2000 m → 1134.24312405 / 994.95377835 / 154.40492924 (test_ineichen_altitude)', () => {
    const r = ineichenClearSky(10, 1, 3, 2000);
    close(r.globalHorizontal_W_m2, 1134.24312405, 1e-7);
    close(r.directNormal_W_m2, 994.95377835, 1e-7);
    close(r.diffuseHorizontal_W_m2, 154.40492924, 1e-7);
  });
  it('grid of zenith 0/40/80°, air mass 1/5.5/10, T_L 2/3/4 matches test_ineichen_arrays (corner values)', () => {
    // [zenith, am, TL] → [ghi, dni, dhi]
    const cases: [number, number, number, number, number, number][] = [
      [0, 1, 2, 1095.77074798, 1014.38807396, 81.38267402],
      [40, 1, 3, 807.54451692, 942.20818604, 85.77117175],
      [80, 10, 4, 43.72365587, 75.80970012, 30.5594396],
      [40, 5.5, 2, 592.52803177, 687.61305142, 65.78587472],
    ];
    for (const [z, am, tl, g, b, d] of cases) {
      const r = ineichenClearSky(z, am, tl);
      close(r.globalHorizontal_W_m2, g, 1e-7);
      close(r.directNormal_W_m2, b, 1e-7);
      close(r.diffuseHorizontal_W_m2, d, 1e-7);
    }
  });
  it('gives no light with the sun below the horizon; GHI = DNI cos θz + DHI (identity)', () => {
    expect(ineichenClearSky(95, 30, 3).globalHorizontal_W_m2).toBe(0);
    const r = ineichenClearSky(60, 2, 3.5);
    expect(r.directNormal_W_m2 * Math.cos(Math.PI / 3) + r.diffuseHorizontal_W_m2).toBeCloseTo(r.globalHorizontal_W_m2, 9);
  });
});

describe('Erbs decomposition (pvlib irradiance.erbs test values)', () => {
  it('GHI 1000 W/m², zenith 10°, day 180 → DNI 842.36, DHI 170.44, k_t 0.7689 within 1 % (test_erbs_all_scalar; pvlib uses I0 with 1366.1 W/m², we 1367)', () => {
    const r = erbsSplit(1000, 10, extraterrestrialNormal_W_m2(180));
    close(r.directNormal_W_m2, 842.358014, 0.01);
    close(r.diffuseHorizontal_W_m2, 170.439297, 0.01);
    close(r.clearnessIndex, 0.76891947, 0.01);
  });
  it('GHI 50 W/m², zenith 85°, 1 January → DNI 96.7, DHI 41.6 within 1 % (test_erbs)', () => {
    const r = erbsSplit(50, 85, extraterrestrialNormal_W_m2(1));
    close(r.directNormal_W_m2, 96.7192672, 0.01);
    close(r.diffuseHorizontal_W_m2, 41.5703604, 0.01);
  });
});

describe('Kasten & Czeplak cloud factor', () => {
  it('is 1 for a clear sky and 0.25 under full cloud (N = 8 oktas)', () => {
    expect(cloudGlobalFactor(0)).toBe(1);
    expect(cloudGlobalFactor(8)).toBeCloseTo(0.25, 12);
  });
});
