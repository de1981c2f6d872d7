import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { asinD, cosD, sinD } from './angles.js';
import { solarPosition } from './spa.js';
import { sunPositionsEvery } from './sun-track.js';

/** Great-circle angle between two sun directions (deg), from the chord (accurate near 0). */
function separation_deg(z1: number, a1: number, z2: number, a2: number): number {
  const v = (z: number, a: number) => [sinD(z) * sinD(a), sinD(z) * cosD(a), cosD(z)] as const;
  const p = v(z1, a1);
  const q = v(z2, a2);
  const chord = Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
  return 2 * asinD(chord / 2);
}

describe('per-minute solar positions (interpolated geocentric sun, exact topocentric step)', () => {
  const sites = [
    { latitude_deg: 52.3, longitude_deg: 4.77 },
    { latitude_deg: -33.9, longitude_deg: 151.2, elevation_m: 50 },
    { latitude_deg: 69.6, longitude_deg: 18.9 },
    { latitude_deg: 1.3, longitude_deg: 103.8 },
  ];
  // Internal bound (our own design target, far below the SPA's stated ±0.0003°).
  const BOUND_DEG = 1e-6;

  for (const site of sites) {
    it(`stays within ${BOUND_DEG}° of the full SPA every minute for two days at latitude ${site.latitude_deg}°`, () => {
      const start = Date.UTC(2025, 2, 19, 0, 0); // across the March equinox (α wraps 360° → 0°)
      const samples = sunPositionsEvery(start, 1, 2 * 1440, site, { deltaT_s: 69 });
      let worst = 0;
      for (let i = 0; i < samples.count; i += 7) {
        const exact = solarPosition(start + i * 60_000, site, { deltaT_s: 69 });
        const sep = separation_deg(samples.zenith_deg[i] as number, samples.azimuth_deg[i] as number, exact.zenith_deg, exact.azimuth_deg);
        worst = Math.max(worst, sep, Math.abs((samples.zenith_deg[i] as number) - exact.zenith_deg));
      }
      expect(worst).toBeLessThan(BOUND_DEG);
    });
  }

  it('stays within the bound at random instants, sites and steps (property test)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(1990, 0, 1), max: Date.UTC(2060, 0, 1) }),
        fc.double({ min: -89, max: 89, noNaN: true }),
        fc.double({ min: -180, max: 180, noNaN: true }),
        fc.integer({ min: 0, max: 600 }),
        (start, lat, lon, offset) => {
          const site = { latitude_deg: lat, longitude_deg: lon };
          const s = sunPositionsEvery(start, 1.5, offset + 1, site, { deltaT_s: 60 });
          const exact = solarPosition(start + offset * 90_000, site, { deltaT_s: 60 });
          const sep = separation_deg(s.zenith_deg[offset] as number, s.azimuth_deg[offset] as number, exact.zenith_deg, exact.azimuth_deg);
          return sep < BOUND_DEG && Math.abs((s.zenith_deg[offset] as number) - exact.zenith_deg) < BOUND_DEG;
        },
      ),
      { numRuns: 60 },
    );
  });

  it('keeps elevation = 90° − zenith (identity)', () => {
    const s = sunPositionsEvery(Date.UTC(2025, 5, 1), 10, 144, sites[0] ?? { latitude_deg: 0, longitude_deg: 0 });
    for (let i = 0; i < s.count; i++) expect((s.elevation_deg[i] as number) + (s.zenith_deg[i] as number)).toBeCloseTo(90, 12);
  });

  it('refuses a non-positive step and a negative count, naming the field', () => {
    expect(() => sunPositionsEvery(0, 0, 10, { latitude_deg: 0, longitude_deg: 0 })).toThrow(/step_min/);
    expect(() => sunPositionsEvery(0, 1, -1, { latitude_deg: 0, longitude_deg: 0 })).toThrow(/count/);
  });
});
