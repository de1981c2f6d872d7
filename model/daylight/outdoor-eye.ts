/**
 * Illuminance at the eye outdoors, unobstructed: sun, sky and
 * ground on the plane facing the gaze, kept apart.
 *  - sun:    E_bn·max(0, cos θi), cos θi = cos θz cos β + sin θz sin β cos(φs − γ)
 *  - ground: ρ·E_gh·(1 − cos β)/2 (diffusely reflecting horizontal ground; pvlib get_ground_diffuse)
 *  - sky:    isotropic E_dh·(1 + cos β)/2, or Perez (1990) anisotropic (perez-transposition.ts)
 * β = tilt of the eye plane (90° = level gaze), γ = gaze azimuth (from north, clockwise).
 * "All directions": the mean over gaze azimuths, in closed form: the mean of max(0, A + B cos x)
 * over x is (A·x0 + B·sin x0)/π with cos x0 = −A/B (A = cos θz cos β, B = sin θz sin β ≥ 0), or
 * A if A ≥ B, or 0 if A ≤ −B. For a vertical plane this is sin θz/π.
 * Near and below the horizon (θz > 87°) the Perez sky falls back to isotropic.
 */
import type { DaylightSeries } from './daylight-series.js';
import { DEFAULT_GROUND_REFLECTANCE, groundReflectanceWithSnow } from './ground-reflectance.js';
import { perezBrightening, COS_85 } from './perez-transposition.js';

export type SkyDiffuseModel = 'isotropic' | 'perez';

export interface OutdoorEyeInput {
  readonly sunZenith_deg: number;
  readonly sunAzimuth_deg: number;
  readonly directNormal_lx: number;
  readonly diffuseHorizontal_lx: number;
  /** Default E_bn·cos θz + E_dh. */
  readonly globalHorizontal_lx?: number;
  /** Ground reflectance 0–1. */
  readonly groundReflectance: number;
  /** Gaze azimuth (deg from north, clockwise), or 'all-directions' for the mean over azimuths. */
  readonly gazeAzimuth_deg: number | 'all-directions';
  /** Tilt of the eye plane from horizontal-facing-up (deg); 90 = level gaze (default). */
  readonly gazeTilt_deg?: number;
  readonly skyModel: SkyDiffuseModel;
  /** Perez sky clearness ε and brightness Δ (needed for 'perez'). */
  readonly clearness?: number;
  readonly brightness?: number;
}

export interface EyeIlluminance {
  readonly sun_lx: number;
  readonly sky_lx: number;
  readonly ground_lx: number;
  readonly total_lx: number;
  /** Parts of sky_lx (Perez: isotropic, circumsolar, horizon; isotropic model: all in the first). */
  readonly skyIsotropic_lx: number;
  readonly skyCircumsolar_lx: number;
  readonly skyHorizon_lx: number;
}

const D = Math.PI / 180;

/** Mean over a full turn of azimuth of max(0, A + B cos x), B ≥ 0. */
export function meanPositiveCosine(a: number, b: number): number {
  if (a >= b) return a;
  if (a <= -b) return 0;
  const x0 = Math.acos(-a / b);
  return (a * x0 + b * Math.sin(x0)) / Math.PI;
}

function checkInput(i: OutdoorEyeInput): void {
  const fail = (field: string, why: string) => {
    throw new RangeError(`${field}: ${why}`);
  };
  for (const [k, v] of [['sunZenith_deg', i.sunZenith_deg], ['sunAzimuth_deg', i.sunAzimuth_deg], ['directNormal_lx', i.directNormal_lx], ['diffuseHorizontal_lx', i.diffuseHorizontal_lx]] as const) {
    if (!Number.isFinite(v)) fail(k, `must be a finite number, got ${v}`);
  }
  if (i.directNormal_lx < 0) fail('directNormal_lx', `must not be negative, got ${i.directNormal_lx}`);
  if (i.diffuseHorizontal_lx < 0) fail('diffuseHorizontal_lx', `must not be negative, got ${i.diffuseHorizontal_lx}`);
  if (!(i.groundReflectance >= 0 && i.groundReflectance <= 1)) fail('groundReflectance', `must be within 0…1, got ${i.groundReflectance}`);
  const tilt = i.gazeTilt_deg ?? 90;
  if (!(tilt >= 0 && tilt <= 180)) fail('gazeTilt_deg', `must be within 0…180, got ${tilt}`);
  if (i.gazeAzimuth_deg !== 'all-directions' && !Number.isFinite(i.gazeAzimuth_deg)) fail('gazeAzimuth_deg', `must be a number or "all-directions"`);
  if (i.skyModel === 'perez' && (!Number.isFinite(i.clearness) || !Number.isFinite(i.brightness))) fail('clearness', 'the Perez sky needs the clearness ε and brightness Δ');
}

export function outdoorEyeIlluminance(input: OutdoorEyeInput): EyeIlluminance {
  checkInput(input);
  const beta = (input.gazeTilt_deg ?? 90) * D;
  const z = input.sunZenith_deg * D;
  const cosZ = Math.cos(z);
  const sunUp = input.sunZenith_deg < 90;
  const a = cosZ * Math.cos(beta);
  const b = Math.max(0, Math.sin(z) * Math.sin(beta));
  const projection =
    input.gazeAzimuth_deg === 'all-directions' ? meanPositiveCosine(a, b) : Math.max(0, a + b * Math.cos((input.sunAzimuth_deg - input.gazeAzimuth_deg) * D));
  const sun_lx = sunUp ? input.directNormal_lx * projection : 0;
  const eGh = input.globalHorizontal_lx ?? input.directNormal_lx * Math.max(0, cosZ) + input.diffuseHorizontal_lx;
  const ground_lx = input.groundReflectance * eGh * (1 - Math.cos(beta)) / 2;
  const iso = (1 + Math.cos(beta)) / 2;
  const eDh = input.diffuseHorizontal_lx;
  let skyIsotropic_lx = eDh * iso;
  let skyCircumsolar_lx = 0;
  let skyHorizon_lx = 0;
  if (input.skyModel === 'perez' && input.sunZenith_deg <= 87 && eDh > 0) {
    const f = perezBrightening(input.clearness as number, input.brightness as number, input.sunZenith_deg);
    skyIsotropic_lx = eDh * (1 - f.f1) * iso;
    skyCircumsolar_lx = (eDh * f.f1 * projection) / Math.max(COS_85, cosZ);
    skyHorizon_lx = eDh * f.f2 * Math.sin(beta);
  }
  const sky_lx = Math.max(0, skyIsotropic_lx + skyCircumsolar_lx + skyHorizon_lx);
  return { sun_lx, sky_lx, ground_lx, total_lx: sun_lx + sky_lx + ground_lx, skyIsotropic_lx, skyCircumsolar_lx, skyHorizon_lx };
}

export interface OutdoorEyeSeriesOptions {
  readonly gazeAzimuth_deg: number | 'all-directions';
  readonly gazeTilt_deg?: number;
  readonly skyModel?: SkyDiffuseModel;
  /** Ground reflectance without snow; default grass 0.2. Snow in the series switches it (ground-reflectance.ts). */
  readonly groundReflectance?: number;
}

export interface EyeIlluminanceSeries {
  readonly sun_lx: Float64Array;
  readonly sky_lx: Float64Array;
  readonly ground_lx: Float64Array;
  readonly total_lx: Float64Array;
}

/** Outdoor eye illuminance for every sample of a daylight series (Perez sky by default). */
export function outdoorEyeSeries(series: DaylightSeries, options: OutdoorEyeSeriesOptions): EyeIlluminanceSeries {
  const n = series.count;
  const out = { sun_lx: new Float64Array(n), sky_lx: new Float64Array(n), ground_lx: new Float64Array(n), total_lx: new Float64Array(n) };
  const base = options.groundReflectance ?? DEFAULT_GROUND_REFLECTANCE;
  for (let i = 0; i < n; i++) {
    const r = outdoorEyeIlluminance({
      sunZenith_deg: series.sun.zenith_deg[i] as number,
      sunAzimuth_deg: series.sun.azimuth_deg[i] as number,
      directNormal_lx: series.directNormal_lx[i] as number,
      diffuseHorizontal_lx: series.diffuseHorizontal_lx[i] as number,
      globalHorizontal_lx: series.globalHorizontal_lx[i] as number,
      groundReflectance: groundReflectanceWithSnow(base, series.snowDepth_cm[i] as number, series.daysSinceSnowfall[i] as number),
      gazeAzimuth_deg: options.gazeAzimuth_deg,
      gazeTilt_deg: options.gazeTilt_deg ?? 90,
      skyModel: options.skyModel ?? 'perez',
      clearness: series.clearness[i] as number,
      brightness: series.brightness[i] as number,
    });
    out.sun_lx[i] = r.sun_lx;
    out.sky_lx[i] = r.sky_lx;
    out.ground_lx[i] = r.ground_lx;
    out.total_lx[i] = r.total_lx;
  }
  return out;
}
