/**
 * Adapter from the outdoor daylight series (model/daylight) to the per-minute conditions of the
 * light-at-the-eye model: sun position, E_bn/E_dh (lx), DNI (W/m²) for the blinds rule, Perez ε
 * for the sky type, sky and sun CCTs, and snow on the ground (snow depth > 0 cm; unknown = none).
 * The calendar month depends on the local time zone, so the caller supplies it.
 */
import type { DaylightSeries } from '../daylight/daylight-series.js';
import { SceneInputError } from './scene-input-error.js';
import type { OutdoorConditions } from './scene.js';

export function outdoorConditionsFromDaylightSeries(series: DaylightSeries, month: Uint8Array, outdoorEye_lx?: Float64Array): OutdoorConditions {
  if (series.step_min !== 1) throw new SceneInputError('series.step_min', `light at the eye needs 1-minute samples (got ${series.step_min})`);
  if (month.length !== series.count) throw new SceneInputError('month', `has ${month.length} samples but the daylight series has ${series.count}`);
  const snow = Uint8Array.from(series.snowDepth_cm, (d) => (d > 0 ? 1 : 0));
  const epsilon = Float64Array.from(series.clearness, (e) => (Number.isFinite(e) && e >= 1 ? e : 1));
  return {
    sunZenith_deg: series.sun.zenith_deg,
    sunAzimuth_deg: series.sun.azimuth_deg,
    directNormal_lx: series.directNormal_lx,
    diffuseHorizontal_lx: series.diffuseHorizontal_lx,
    directNormal_W_m2: series.directNormal_W_m2,
    daylightCct_K: series.skyCct_K,
    sunCct_K: series.sunCct_K,
    perezEpsilon: epsilon,
    snowOnGround: snow,
    month,
    ...(outdoorEye_lx !== undefined ? { outdoorEye_lx } : {}),
  };
}
