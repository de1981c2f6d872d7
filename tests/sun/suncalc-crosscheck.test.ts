/**
 * Independent cross-check of the solar position against the general-purpose npm package
 * `suncalc` (v2, test-only import). suncalc follows Meeus, "Astronomical Algorithms" (1998),
 * ch. 25 low-accuracy solar coordinates, which Meeus states are good to about 0.01°; it omits
 * the topocentric parallax (≤ 0.0024°) and uses the same Sæmundsson-type refraction with a fixed
 * standard atmosphere. Tolerance: 0.015° on the angle between the two sun directions, for
 * elevations above 2° (below, suncalc clamps its refraction formula at 0° altitude).
 * Sunrise/sunset: suncalc states it matches the U.S. Naval Observatory to the minute; we allow 1.5 min.
 */
import * as SunCalc from 'suncalc';
import { describe, expect, it } from 'vitest';
import { asinD, cosD, sinD } from '../../model/sun/angles.js';
import { solarPosition } from '../../model/sun/spa.js';
import { sunTimes } from '../../model/sun/sunrise-sunset.js';

function separation_deg(z1: number, a1: number, z2: number, a2: number): number {
  const v = (z: number, a: number) => [sinD(z) * sinD(a), sinD(z) * cosD(a), cosD(z)] as const;
  const p = v(z1, a1);
  const q = v(z2, a2);
  return 2 * asinD(Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]) / 2);
}

const SITES = [
  { name: 'Amsterdam', latitude_deg: 52.3, longitude_deg: 4.77 },
  { name: 'Tromsø', latitude_deg: 69.65, longitude_deg: 18.96 },
  { name: 'Singapore', latitude_deg: 1.35, longitude_deg: 103.82 },
  { name: 'Sydney', latitude_deg: -33.87, longitude_deg: 151.21 },
  { name: 'Denver', latitude_deg: 39.74, longitude_deg: -104.99 },
];

describe('solar position agrees with suncalc over a year (Meeus ch. 25, ±0.01°)', () => {
  for (const site of SITES) {
    it(`every 5 h of 2025 at ${site.name}: within 0.015° above 2° elevation`, () => {
      let worst = 0;
      let compared = 0;
      for (let t = Date.UTC(2025, 0, 1); t < Date.UTC(2026, 0, 1); t += 5 * 3_600_000 + 7 * 60_000) {
        // Standard atmosphere of suncalc's refraction (1010 hPa, 10 °C) so only the methods differ.
        const ours = solarPosition(t, { ...site, pressure_hPa: 1010, temperature_C: 10 });
        if (ours.elevation_deg < 2) continue;
        const theirs = SunCalc.getPosition(new Date(t), site.latitude_deg, site.longitude_deg);
        worst = Math.max(worst, separation_deg(ours.zenith_deg, ours.azimuth_deg, 90 - theirs.altitude, theirs.azimuth));
        compared++;
      }
      expect(compared).toBeGreaterThan(300);
      expect(worst).toBeLessThan(0.015);
    });
  }

  for (const site of SITES.filter((s) => Math.abs(s.latitude_deg) < 60)) {
    it(`sunrise and sunset within 1.5 min of suncalc on the 1st and 15th of each month at ${site.name}`, () => {
      let worst = 0;
      for (let m = 1; m <= 12; m++) {
        for (const d of [1, 15]) {
          const offset_h = Math.round(site.longitude_deg / 15);
          const ours = sunTimes({ year: 2025, month: m, day: d }, site, offset_h);
          const noonUt = Date.UTC(2025, m - 1, d, 12) - offset_h * 3_600_000;
          const theirs = SunCalc.getTimes(new Date(noonUt), site.latitude_deg, site.longitude_deg);
          if (ours.sunriseEpochMs === null || ours.sunsetEpochMs === null || !theirs.sunrise || !theirs.sunset) throw new Error('expected a sunrise');
          worst = Math.max(worst, Math.abs(ours.sunriseEpochMs - theirs.sunrise.getTime()), Math.abs(ours.sunsetEpochMs - theirs.sunset.getTime()));
        }
      }
      expect(worst / 60_000).toBeLessThan(1.5);
    });
  }
});
