import { describe, expect, it } from 'vitest';
import { alphaOpicDer } from '../photometry/alpha-opic.js';
import { cieDaylightSpectrum } from '../sources/cie-daylight.js';
import { daylightMixSpectrum, skyCct_K, sunCct_K } from './daylight-cct.js';
import { daylightFromSkyConditions } from './daylight-series.js';

const AMSTERDAM = { latitude_deg: 52.3, longitude_deg: 4.77 };
// Three local days (UTC+1 standard time) from 20 June 2025 00:00 local, one minute apart.
const window = { startEpochMs: Date.UTC(2025, 5, 19, 23), step_min: 1, count: 3 * 1440 };
const series = daylightFromSkyConditions({ ...window, site: AMSTERDAM, utcOffset_h: 1, conditions: ['clear', 'intermediate', 'overcast'] });
const dayMax = (arr: Float64Array, d: number) => Math.max(...arr.subarray(d * 1440, (d + 1) * 1440));

describe('daylight from a sky condition per day (no weather file)', () => {
  it('gives ≈ 100 klx global horizontal at a clear summer midday (IES "clear sky, summer midday ~100 000 lx"): 80–115 klx', () => {
    const max = dayMax(series.globalHorizontal_lx, 0);
    expect(max).toBeGreaterThan(80_000);
    expect(max).toBeLessThan(115_000);
  });

  it('gives an overcast midday within the "typical overcast day 1 000–30 000 lx" range (common practice) and no direct sun', () => {
    const max = dayMax(series.globalHorizontal_lx, 2);
    expect(max).toBeGreaterThan(5_000);
    expect(max).toBeLessThan(30_000);
    expect(dayMax(series.directNormal_lx, 2)).toBe(0);
  });

  it('orders the days clear > intermediate > overcast at midday, and classes the sky from Perez ε the same way', () => {
    expect(dayMax(series.globalHorizontal_lx, 0)).toBeGreaterThan(dayMax(series.globalHorizontal_lx, 1));
    expect(dayMax(series.globalHorizontal_lx, 1)).toBeGreaterThan(dayMax(series.globalHorizontal_lx, 2));
    const noon = (d: number) => d * 1440 + 12 * 60 + 40;
    expect(series.clearness[noon(0)]).toBeGreaterThan(series.clearness[noon(1)] as number);
    expect(series.clearness[noon(2)]).toBeCloseTo(1, 9);
    expect([series.skyCondition[noon(0)], series.skyCondition[noon(2)]]).toEqual([0, 2]);
  });

  it('keeps E_gh = E_bn·cos θz + E_dh at every minute (identity)', () => {
    for (let i = 0; i < series.count; i += 13) {
      const cosZ = Math.max(0, Math.cos(((series.sun.zenith_deg[i] as number) * Math.PI) / 180));
      expect(series.globalHorizontal_lx[i]).toBeCloseTo((series.directNormal_lx[i] as number) * cosZ + (series.diffuseHorizontal_lx[i] as number), 6);
    }
  });

  it('is dark at night and follows the twilight floor near sunset (≈ 400 lx at the horizon, 3.4 lx at −6°)', () => {
    const midnight = 1440; // local midnight between day 1 and day 2
    expect(series.globalHorizontal_lx[midnight]).toBe(0);
    for (let i = 0; i < 1440; i++) {
      const e = series.sun.elevation_deg[i] as number;
      if (e < 0 && e > -6) {
        expect(series.globalHorizontal_lx[i]).toBeGreaterThanOrEqual(3.4 * 0.99);
        expect(series.globalHorizontal_lx[i]).toBeLessThanOrEqual(400 * 1.01);
      }
    }
  });

  it('refuses an unknown sky condition, naming its position', () => {
    expect(() => daylightFromSkyConditions({ ...window, count: 10, site: AMSTERDAM, utcOffset_h: 1, conditions: ['clear', 'foggy' as 'clear'] })).toThrow(/conditions\[1\]/);
  });
});

describe('daylight CCT rule (common practice, docs/methods/sun-and-daylight.md)', () => {
  it('reddens the sun toward the horizon and keeps it within the D-series range', () => {
    expect(sunCct_K(60)).toBeCloseTo(5700, 6);
    expect(sunCct_K(2)).toBeCloseTo(4000, 6);
    expect(sunCct_K(20)).toBeLessThan(sunCct_K(30));
  });
  it('gives 6500 K overcast and 11 000 K clear skylight', () => {
    expect(skyCct_K(1)).toBeCloseTo(6500, 6);
    expect(skyCct_K(8)).toBeCloseTo(11000, 6);
  });
  it('mixes sun and sky as spectra: the melanopic DER of the mix lies between the parts (linearity of α-opic quantities, CIE S 026)', () => {
    const sun = alphaOpicDer(cieDaylightSpectrum(5000)).mel;
    const sky = alphaOpicDer(cieDaylightSpectrum(11000)).mel;
    const mix = alphaOpicDer(daylightMixSpectrum([{ illuminance_lx: 50_000, cct_K: 5000 }, { illuminance_lx: 20_000, cct_K: 11000 }])).mel;
    expect(sky).toBeGreaterThan(sun);
    expect(mix).toBeCloseTo((50_000 * sun + 20_000 * sky) / 70_000, 9);
  });
});
