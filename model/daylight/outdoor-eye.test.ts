import { describe, expect, it } from 'vitest';
import { groundReflectanceWithSnow } from './ground-reflectance.js';
import { meanPositiveCosine, outdoorEyeIlluminance, type OutdoorEyeInput } from './outdoor-eye.js';
import { perezSkyIndices } from './perez-sky-indices.js';

const close = (a: number, b: number, atol: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(atol);

describe('eye illuminance outdoors against pvlib-python test values (tests/test_irradiance.py)', () => {
  it('isotropic sky on a 40° tilt: 100 → 88.30222215594891 (test_isotropic_float)', () => {
    const r = outdoorEyeIlluminance({ sunZenith_deg: 30, sunAzimuth_deg: 180, directNormal_lx: 0, diffuseHorizontal_lx: 100, globalHorizontal_lx: 0, groundReflectance: 0, gazeAzimuth_deg: 180, gazeTilt_deg: 40, skyModel: 'isotropic' });
    close(r.sky_lx, 88.30222215594891, 1e-9);
  });

  it('ground-reflected on a 40° tilt with albedo 0.25: 900 → 26.32000014911496 (test_get_ground_diffuse_simple_float)', () => {
    const r = outdoorEyeIlluminance({ sunZenith_deg: 30, sunAzimuth_deg: 180, directNormal_lx: 0, diffuseHorizontal_lx: 0, globalHorizontal_lx: 900, groundReflectance: 0.25, gazeAzimuth_deg: 180, gazeTilt_deg: 40, skyModel: 'isotropic' });
    close(r.ground_lx, 26.32000014911496, 1e-9);
  });

  it('Perez sky, 40° tilt facing south: 109.084332 (test_perez_scalar)', () => {
    const idx = perezSkyIndices(10.56413562, 939.95469881, 118.45831879, 1.01688136, 1321.1655834833093);
    const r = outdoorEyeIlluminance({
      sunZenith_deg: 10.56413562, sunAzimuth_deg: 144.76567754, directNormal_lx: 939.95469881, diffuseHorizontal_lx: 118.45831879,
      groundReflectance: 0, gazeAzimuth_deg: 180, gazeTilt_deg: 40, skyModel: 'perez', clearness: idx.clearness, brightness: idx.brightness,
    });
    close(r.sky_lx, 109.084332, 1e-5);
  });

  it('Perez sky components, 34° tilt facing south, Goodwin Creek afternoon (test_perez_negative_horizon), to 2 decimals', () => {
    const dni = [158, 19, 1, 0, 0];
    const dhi = [249, 165, 136, 93, 50];
    const zen = [57.746951, 57.564205, 60.813841, 66.989435, 75.353368];
    const azi = [171.003315, 187.346924, 202.974357, 216.725599, 228.317233];
    const am = [1.869315, 1.859981, 2.044429, 2.544943, 3.900136];
    const expected = [
      [281.410185, 166.785419, 113.548755, 1.07601],
      [152.20879, 142.24475, 16.09757, -6.13353],
      [123.867898, 119.173875, 9.956174, -5.262151],
      [82.836412, 83.52515, 3.142467, -3.83123],
      [43.517015, 45.725931, 0, -2.208923],
    ];
    for (let k = 0; k < 5; k++) {
      const idx = perezSkyIndices(zen[k] as number, dni[k] as number, dhi[k] as number, am[k] as number, 1414);
      const r = outdoorEyeIlluminance({
        sunZenith_deg: zen[k] as number, sunAzimuth_deg: azi[k] as number, directNormal_lx: dni[k] as number, diffuseHorizontal_lx: dhi[k] as number,
        groundReflectance: 0, gazeAzimuth_deg: 180, gazeTilt_deg: 34, skyModel: 'perez', clearness: idx.clearness, brightness: idx.brightness,
      });
      const [total, iso, circ, hor] = expected[k] as number[];
      close(r.sky_lx, total as number, 0.005);
      close(r.skyIsotropic_lx, iso as number, 0.005);
      close(r.skyCircumsolar_lx, circ as number, 0.005);
      close(r.skyHorizon_lx, hor as number, 0.005);
    }
  });
});

describe('eye illuminance outdoors: physical identities', () => {
  const base: OutdoorEyeInput = { sunZenith_deg: 50, sunAzimuth_deg: 200, directNormal_lx: 60_000, diffuseHorizontal_lx: 20_000, groundReflectance: 0.2, gazeAzimuth_deg: 180, skyModel: 'isotropic' };

  it('a uniform sky gives a vertical plane half the horizontal diffuse illuminance (analytic)', () => {
    const r = outdoorEyeIlluminance({ ...base, directNormal_lx: 0 });
    close(r.sky_lx, 10_000, 1e-9);
  });

  it('a horizontal plane facing up receives exactly the global horizontal illuminance, with either sky model', () => {
    const eGh = 60_000 * Math.cos((50 * Math.PI) / 180) + 20_000;
    for (const skyModel of ['isotropic', 'perez'] as const) {
      const r = outdoorEyeIlluminance({ ...base, gazeTilt_deg: 0, skyModel, clearness: 3, brightness: 0.25 });
      close(r.total_lx, eGh, 1e-6);
    }
  });

  it('facing the sun gets E_bn·sin θz of beam, facing away none', () => {
    close(outdoorEyeIlluminance({ ...base, gazeAzimuth_deg: 200 }).sun_lx, 60_000 * Math.sin((50 * Math.PI) / 180), 1e-6);
    expect(outdoorEyeIlluminance({ ...base, gazeAzimuth_deg: 20 }).sun_lx).toBe(0);
  });

  it('"all directions" equals the numerical mean over 720 gaze azimuths, for both sky models and a tilted plane', () => {
    for (const skyModel of ['isotropic', 'perez'] as const) {
      for (const tilt of [90, 60, 120]) {
        const common = { ...base, skyModel, clearness: 4, brightness: 0.2, gazeTilt_deg: tilt };
        let mean = 0;
        for (let k = 0; k < 720; k++) mean += outdoorEyeIlluminance({ ...common, gazeAzimuth_deg: k / 2 }).total_lx / 720;
        close(outdoorEyeIlluminance({ ...common, gazeAzimuth_deg: 'all-directions' }).total_lx, mean, 1e-5 * mean); // quadrature error of a 0.5° rectangle sum over a kinked integrand
      }
    }
    close(meanPositiveCosine(0, 1), 1 / Math.PI, 1e-12);
  });

  it('no beam when the sun is below the horizon', () => {
    expect(outdoorEyeIlluminance({ ...base, sunZenith_deg: 95 }).sun_lx).toBe(0);
  });

  it('refuses negative illuminance, a reflectance above 1 and a Perez sky without ε, Δ — naming the field', () => {
    expect(() => outdoorEyeIlluminance({ ...base, diffuseHorizontal_lx: -1 })).toThrow(/diffuseHorizontal_lx/);
    expect(() => outdoorEyeIlluminance({ ...base, groundReflectance: 1.5 })).toThrow(/groundReflectance/);
    expect(() => outdoorEyeIlluminance({ ...base, skyModel: 'perez' })).toThrow(/clearness/);
  });

  it('snow on the ground switches the reflectance to 0.75 (fresh) or 0.65 (pvlib SURFACE_ALBEDOS)', () => {
    expect(groundReflectanceWithSnow(0.2, 0, 88)).toBe(0.2);
    expect(groundReflectanceWithSnow(0.2, 5, 1)).toBe(0.75);
    expect(groundReflectanceWithSnow(0.2, 5, 10)).toBe(0.65);
    expect(groundReflectanceWithSnow(0.2, Number.NaN, 1)).toBe(0.2);
  });
});

describe('eye illuminance over a clear summer day (series)', () => {
  it('facing the sun side beats facing away at midday, "all directions" lies between, and the night is dark', async () => {
    const { daylightFromSkyConditions } = await import('./daylight-series.js');
    const { outdoorEyeSeries } = await import('./outdoor-eye.js');
    const s = daylightFromSkyConditions({ startEpochMs: Date.UTC(2025, 5, 20, 23), step_min: 5, count: 288, site: { latitude_deg: 52.3, longitude_deg: 4.77 }, utcOffset_h: 1, conditions: ['clear'] });
    const south = outdoorEyeSeries(s, { gazeAzimuth_deg: 180 });
    const north = outdoorEyeSeries(s, { gazeAzimuth_deg: 0 });
    const all = outdoorEyeSeries(s, { gazeAzimuth_deg: 'all-directions' });
    const noon = 12 * 12 + 8; // ≈ 12:40 local standard time
    expect(south.total_lx[noon]).toBeGreaterThan(all.total_lx[noon] as number);
    expect(all.total_lx[noon]).toBeGreaterThan(north.total_lx[noon] as number);
    expect(north.sun_lx[noon]).toBe(0);
    expect(south.total_lx[12]).toBe(0); // 01:00
  });
});
