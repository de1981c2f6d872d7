/**
 * Display model: three primaries, a white point, a brightness control and a warmer "night"
 * white point. PARAMETRIC MODEL, NOT A PUBLISHED TABLE. Default primaries are Gaussian bands
 * typical of an LED-backlit or emissive display (representative values chosen by us, from
 * memory); the normal white point is D65 (x 0.3127, y 0.3290, CIE 015:2018), the default night
 * white point lies on the Planckian locus at 3400 K (a representative strong warm-shift
 * setting; night modes commonly reach about 3000–4000 K, from memory).
 *
 * Physics: the white of the display is the mix of the primaries that has the white-point
 * chromaticity (three-primary-mix.ts). In normal mode full brightness gives
 * `maxWhiteLuminance_cd_m2`, with each primary at its full drive. A night white point is
 * reached by lowering primaries (no primary can exceed its full drive), so the night-mode
 * maximum luminance is lower; `nightLuminanceRatio` reports the factor.
 */
import { photopicIlluminance_lx } from '../photometry/alpha-opic.js';
import { uv1960ToXy, type Chromaticity } from '../photometry/colorimetry.js';
import { planckianUv } from '../photometry/cct-ohno.js';
import { scaleSpectrum, spectrum, type Spectrum } from '../photometry/spectrum.js';
import { gaussianBand, weightedSumOfBands } from './spectral-shapes.js';
import { mixWeightsForChromaticity } from './three-primary-mix.js';

export interface DisplayModel {
  /** Relative spectra of the blue, green and red primaries at full drive (any scale). */
  readonly primaries: readonly [Float64Array, Float64Array, Float64Array];
  readonly whitePoint: Chromaticity;
  readonly nightWhitePoint: Chromaticity;
  /** Luminance of full white in normal mode, cd/m². */
  readonly maxWhiteLuminance_cd_m2: number;
}

export type DisplayMode = 'normal' | 'night';

export const D65_WHITE_POINT: Chromaticity = { x: 0.3127, y: 0.329 };
export const DEFAULT_NIGHT_CCT_K = 3400;

/** Default parametric display: B 450/20 nm, G 535/35 nm, R 625/25 nm (peak/FWHM), 250 cd/m² white. */
export function defaultDisplayModel(): DisplayModel {
  return {
    primaries: [gaussianBand(450, 20), gaussianBand(535, 35), gaussianBand(625, 25)],
    whitePoint: D65_WHITE_POINT,
    nightWhitePoint: uv1960ToXy(planckianUv(DEFAULT_NIGHT_CCT_K)),
    maxWhiteLuminance_cd_m2: 250,
  };
}

export interface DisplayWhite {
  /** Relative SPD of the display white in this mode, scaled so that its photopic value is 1 (per lux / per cd·m⁻²). */
  readonly unitSpectrum: Spectrum;
  /** Drive level of each primary (blue, green, red), 0–1, at full brightness in this mode. */
  readonly drive: readonly [number, number, number];
  /** Luminance at full brightness in this mode, cd/m². */
  readonly maxLuminance_cd_m2: number;
  /** Night-mode maximum luminance divided by normal-mode maximum (1 in normal mode). */
  readonly nightLuminanceRatio: number;
}

function weightsFor(model: DisplayModel, target: Chromaticity): [number, number, number] {
  const w = mixWeightsForChromaticity(model.primaries, target);
  if (w.some((x) => !(x >= 0))) throw new RangeError(`white point (${target.x.toFixed(4)}, ${target.y.toFixed(4)}) lies outside the gamut of the display primaries`);
  return w;
}

/** Display white in normal or night mode. */
export function displayWhite(model: DisplayModel, mode: DisplayMode): DisplayWhite {
  if (!(model.maxWhiteLuminance_cd_m2 > 0)) throw new RangeError('display maximum white luminance must be > 0 cd/m²');
  const full = weightsFor(model, model.whitePoint);
  const night = weightsFor(model, model.nightWhitePoint);
  // Night weights scaled so that no primary exceeds its full (normal-white) drive.
  const k = Math.min(...night.map((w, i) => (full[i] as number) / w).filter((r) => Number.isFinite(r)));
  const nightScaled = night.map((w) => w * k) as [number, number, number];
  const lumFull = photopicIlluminance_lx(spectrum(weightedSumOfBands(model.primaries, full), false));
  const lumNight = photopicIlluminance_lx(spectrum(weightedSumOfBands(model.primaries, nightScaled), false));
  const ratio = lumNight / lumFull;
  const weights = mode === 'normal' ? full : nightScaled;
  const raw = spectrum(weightedSumOfBands(model.primaries, weights), false);
  const unit = scaleSpectrum(raw, 1 / photopicIlluminance_lx(raw));
  return {
    unitSpectrum: unit,
    drive: mode === 'normal' ? [1, 1, 1] : [(nightScaled[0] as number) / full[0], (nightScaled[1] as number) / full[1], (nightScaled[2] as number) / full[2]],
    maxLuminance_cd_m2: model.maxWhiteLuminance_cd_m2 * (mode === 'normal' ? 1 : ratio),
    nightLuminanceRatio: mode === 'normal' ? 1 : ratio,
  };
}

/** Luminance (cd/m²) of the display showing content of average picture level `apl` (0–1) at brightness setting `brightness` (0–1). */
export function displayLuminance_cd_m2(model: DisplayModel, mode: DisplayMode, brightness: number, apl = 1): number {
  if (!(brightness >= 0 && brightness <= 1)) throw new RangeError(`display brightness ${brightness} must be within 0–1`);
  if (!(apl >= 0 && apl <= 1)) throw new RangeError(`average picture level ${apl} must be within 0–1`);
  return displayWhite(model, mode).maxLuminance_cd_m2 * brightness * apl;
}
