/**
 * Sun and outdoor daylight for one site over 14 days at 1-minute resolution (20 160 steps):
 * the cheap per-minute SPA path, the full SPA for comparison, and the whole daylight series
 * from sky conditions (no weather file).
 */
import { daylightFromSkyConditions } from '../../model/daylight/daylight-series.js';
import { outdoorEyeSeries } from '../../model/daylight/outdoor-eye.js';
import { solarPosition } from '../../model/sun/spa.js';
import { sunPositionsEvery } from '../../model/sun/sun-track.js';
import { medianMs } from '../timing.js';

/** Fastest of `repeats` runs (ms): on a shared, loaded machine the minimum is the steadier figure. */
function fastestMs(fn: () => void, repeats = 9): number {
  fn();
  let best = Infinity;
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    fn();
    best = Math.min(best, performance.now() - t0);
  }
  return best;
}

export async function bench(): Promise<Record<string, unknown>> {
  const site = { latitude_deg: 52.3, longitude_deg: 4.77 };
  const start = Date.UTC(2025, 2, 10);
  const minutes = 14 * 1440;
  const cheap = () => {
    sunPositionsEvery(start, 1, minutes, site);
  };
  const cheap_ms = medianMs(cheap);
  const cheap_fastest_ms = fastestMs(cheap);
  const fullSample = 2000;
  const fullMs = medianMs(() => {
    for (let i = 0; i < fullSample; i++) solarPosition(start + i * 60_000, site);
  }, 5, 1);
  const daylight = () => {
    daylightFromSkyConditions({ startEpochMs: start, step_min: 1, count: minutes, site, utcOffset_h: 1, conditions: ['clear', 'intermediate', 'overcast'] });
  };
  const daylight_ms = medianMs(daylight, 5, 1);
  const daylight_fastest_ms = fastestMs(daylight, 5);
  const series = daylightFromSkyConditions({ startEpochMs: start, step_min: 1, count: minutes, site, utcOffset_h: 1, conditions: ['clear', 'overcast'] });
  const eye_ms = medianMs(() => {
    outdoorEyeSeries(series, { gazeAzimuth_deg: 'all-directions' });
  }, 5, 1);
  return {
    sun_14d_per_minute_cheap_ms: cheap_ms,
    sun_14d_per_minute_cheap_fastest_ms: cheap_fastest_ms,
    sun_14d_per_minute_full_spa_ms_extrapolated: (fullMs / fullSample) * minutes,
    daylight_sky_conditions_14d_per_minute_ms: daylight_ms,
    daylight_sky_conditions_14d_per_minute_fastest_ms: daylight_fastest_ms,
    outdoor_eye_14d_per_minute_ms: eye_ms,
  };
}
