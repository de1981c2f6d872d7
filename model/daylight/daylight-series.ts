/**
 * Outdoor daylight per time step (e.g. every minute), the common input of the light-at-eye
 * models: sun position, direct normal / diffuse horizontal / global horizontal illuminance and
 * irradiance, Perez sky clearness and brightness, a sky-condition class, snow on the ground and
 * the CCTs of sun and sky. Two sources: a parsed EPW file, or a sky condition per day.
 */
import { sunPositionsEvery, type SunSamples } from '../sun/sun-track.js';
import { dayOfYearUtc, extraterrestrialNormal_W_m2, airMassKasten1966 } from './extraterrestrial.js';
import { perezIlluminance, PEREZ_MAX_ZENITH_DEG } from './perez-efficacy.js';
import { perezSkyIndices } from './perez-sky-indices.js';
import { skyCct_K, sunCct_K } from './daylight-cct.js';
import { SKY_CONDITION_CLOUD_OKTAS, skyConditionFromClearness, skyConditionIrradiance, type SkyCondition } from './sky-condition.js';
import { cloudGlobalFactor } from './decomposition.js';
import { twilightDiffuseFloor_lx } from './twilight.js';

const DARK = { clearness: 1, brightness: 0, bin: 0 } as const;
const CLOUD_FACTOR: Readonly<Record<SkyCondition, number>> = {
  clear: cloudGlobalFactor(SKY_CONDITION_CLOUD_OKTAS.clear),
  intermediate: cloudGlobalFactor(SKY_CONDITION_CLOUD_OKTAS.intermediate),
  overcast: cloudGlobalFactor(SKY_CONDITION_CLOUD_OKTAS.overcast),
};

/** Sky condition codes stored per sample. */
export const SKY_CONDITION_CODE: Readonly<Record<SkyCondition, number>> = { clear: 0, intermediate: 1, overcast: 2 };

export interface DaylightSeries {
  readonly source: 'weather-file' | 'sky-conditions';
  readonly startEpochMs: number;
  readonly step_min: number;
  readonly count: number;
  readonly sun: SunSamples;
  readonly directNormal_lx: Float64Array;
  readonly diffuseHorizontal_lx: Float64Array;
  readonly globalHorizontal_lx: Float64Array;
  readonly directNormal_W_m2: Float64Array;
  readonly diffuseHorizontal_W_m2: Float64Array;
  readonly globalHorizontal_W_m2: Float64Array;
  /** Perez sky clearness ε (1 when dark). */
  readonly clearness: Float64Array;
  /** Perez sky brightness Δ (0 when dark). */
  readonly brightness: Float64Array;
  /** SKY_CONDITION_CODE per sample. */
  readonly skyCondition: Uint8Array;
  /** Snow depth on the ground (cm); 0 without a weather file; NaN where the file has no value. */
  readonly snowDepth_cm: Float64Array;
  /** Days since last snowfall (NaN unknown). */
  readonly daysSinceSnowfall: Float64Array;
  /** CCT of direct sun and of skylight (K), for `cieDaylightSpectrum` (rule in daylight-cct.ts). */
  readonly sunCct_K: Float64Array;
  readonly skyCct_K: Float64Array;
}

export interface SampleWindow {
  /** First instant (Unix epoch ms, UT). */
  readonly startEpochMs: number;
  /** Spacing (minutes), e.g. 1. */
  readonly step_min: number;
  readonly count: number;
}

export interface Site {
  readonly latitude_deg: number;
  readonly longitude_deg: number;
  readonly elevation_m?: number;
}

export function allocateSeries(source: DaylightSeries['source'], w: SampleWindow, sun: SunSamples): DaylightSeries {
  const f = () => new Float64Array(w.count);
  return {
    source, startEpochMs: w.startEpochMs, step_min: w.step_min, count: w.count, sun,
    directNormal_lx: f(), diffuseHorizontal_lx: f(), globalHorizontal_lx: f(),
    directNormal_W_m2: f(), diffuseHorizontal_W_m2: f(), globalHorizontal_W_m2: f(),
    clearness: f(), brightness: f(), skyCondition: new Uint8Array(w.count),
    snowDepth_cm: f(), daysSinceSnowfall: f().fill(Number.NaN), sunCct_K: f(), skyCct_K: f(),
  };
}

/** Fills sky indices, condition class (when not given), twilight floor and CCTs for sample i. */
export function finishSample(s: DaylightSeries, i: number, cloudFactor: number, condition: SkyCondition | undefined): void {
  const zenith = s.sun.zenith_deg[i] as number;
  const elevation = s.sun.elevation_deg[i] as number;
  const t = s.startEpochMs + i * s.step_min * 60_000;
  const i0 = extraterrestrialNormal_W_m2(dayOfYearUtc(t));
  const zc = Math.min(zenith, PEREZ_MAX_ZENITH_DEG);
  const dhi = s.diffuseHorizontal_W_m2[i] as number;
  const idx = dhi > 0 ? perezSkyIndices(zc, s.directNormal_W_m2[i] as number, dhi, airMassKasten1966(zc), i0) : DARK;
  s.clearness[i] = idx.clearness;
  s.brightness[i] = idx.brightness;
  const cls = condition ?? skyConditionFromClearness(idx.clearness);
  s.skyCondition[i] = SKY_CONDITION_CODE[cls];
  const floor = twilightDiffuseFloor_lx(elevation, cloudFactor);
  if ((s.diffuseHorizontal_lx[i] as number) < floor) s.diffuseHorizontal_lx[i] = floor;
  if (elevation <= 0) s.directNormal_lx[i] = 0;
  const cosZ = Math.max(0, Math.cos((zenith * Math.PI) / 180));
  s.globalHorizontal_lx[i] = (s.directNormal_lx[i] as number) * cosZ + (s.diffuseHorizontal_lx[i] as number);
  s.sunCct_K[i] = sunCct_K(elevation);
  // Without light the clearness says nothing: use the day's class (sky-condition path) or overcast.
  const skyEps = idx.brightness > 0 ? idx.clearness : cls === 'clear' ? 6 : cls === 'intermediate' ? 2 : 1;
  s.skyCct_K[i] = skyCct_K(skyEps);
}

export interface SkyConditionDaylightInput extends SampleWindow {
  readonly site: Site;
  /** Hours the site's standard clock runs ahead of UT (days start at local standard midnight). */
  readonly utcOffset_h: number;
  /** One condition per local day from the day of the first sample; repeats when shorter. */
  readonly conditions: readonly SkyCondition[];
  readonly linkeTurbidity?: number;
  /** Dew point for the efficacy model (°C); default 10. */
  readonly dewPoint_C?: number;
}

/** Daylight from a sky condition per day (no weather file needed). */
export function daylightFromSkyConditions(input: SkyConditionDaylightInput): DaylightSeries {
  if (input.conditions.length === 0) throw new RangeError('conditions: give at least one sky condition');
  for (const [k, c] of input.conditions.entries()) {
    if (!(c in SKY_CONDITION_CLOUD_OKTAS)) throw new RangeError(`conditions[${k}]: "${String(c)}" is not one of clear, intermediate, overcast`);
  }
  const tl = input.linkeTurbidity ?? 3;
  if (!(tl >= 1 && tl <= 10)) throw new RangeError(`linkeTurbidity: must be within 1…10, got ${tl}`);
  if (!Number.isFinite(input.utcOffset_h) || Math.abs(input.utcOffset_h) > 18) throw new RangeError(`utcOffset_h: must be within −18…18, got ${input.utcOffset_h}`);
  const sun = sunPositionsEvery(input.startEpochMs, input.step_min, input.count, input.site);
  const s = allocateSeries('sky-conditions', input, sun);
  s.daysSinceSnowfall.fill(Number.NaN);
  const dew = input.dewPoint_C ?? 10;
  const offsetMs = input.utcOffset_h * 3_600_000;
  const firstDay = Math.floor((input.startEpochMs + offsetMs) / 86_400_000);
  for (let i = 0; i < input.count; i++) {
    const t = input.startEpochMs + i * input.step_min * 60_000;
    const day = Math.floor((t + offsetMs) / 86_400_000) - firstDay;
    const cond = input.conditions[day % input.conditions.length] as SkyCondition;
    const zenith = sun.zenith_deg[i] as number;
    if (zenith >= 90) {
      finishSample(s, i, CLOUD_FACTOR[cond], cond); // dark apart from the twilight floor
      continue;
    }
    const i0 = extraterrestrialNormal_W_m2(dayOfYearUtc(t));
    const irr = skyConditionIrradiance(cond, zenith, i0, { linkeTurbidity: tl, altitude_m: input.site.elevation_m ?? 0 });
    s.directNormal_W_m2[i] = irr.directNormal_W_m2;
    s.diffuseHorizontal_W_m2[i] = irr.diffuseHorizontal_W_m2;
    s.globalHorizontal_W_m2[i] = irr.globalHorizontal_W_m2;
    const lx = perezIlluminance({ zenith_deg: zenith, directNormal_W_m2: irr.directNormal_W_m2, diffuseHorizontal_W_m2: irr.diffuseHorizontal_W_m2, dewPoint_C: dew, extraterrestrial_W_m2: i0 });
    s.directNormal_lx[i] = lx.directNormal_lx;
    s.diffuseHorizontal_lx[i] = lx.diffuseHorizontal_lx;
    finishSample(s, i, CLOUD_FACTOR[cond], cond);
  }
  return s;
}
