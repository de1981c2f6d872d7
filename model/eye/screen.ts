/**
 * Screens at the eye. A display of mean luminance L = APL × L_white is a
 * uniformly luminous rectangle; the eye illuminance is E = ∫ L cos θ_eye dω, evaluated with the
 * exact element solid angles of rectangle-view.ts (the small-screen form L·Ω·cos θ is its limit).
 * The eye is on the screen's central normal at the viewing distance; the gaze may be tilted away
 * from the screen normal by `gazeOffset_deg` (looking past the screen).
 * A night mode swaps the display spectrum (and optionally scales luminance) on a daily schedule.
 */
import type { Spectrum, Transmittance } from '../photometry/spectrum.js';
import { expandDailySchedule, type DailySchedule } from './daily-schedule.js';
import { uniformRectangleIlluminance_lx } from './rectangle-view.js';
import { SceneInputError, requireFinite, requireFraction, requirePositive } from './scene-input-error.js';
import { sourceResponse, type SourceResponse } from './source-response.js';
import { directionFromAltAz_deg, vec3 } from './vector3.js';
import { displayWhite, type DisplayModel } from '../sources/display.js';

/** Day and night spectra and the night luminance factor of a display from the source library's display model. */
export function displaySpectra(model: DisplayModel): Pick<ScreenSpec, 'spectrum' | 'nightSpectrum' | 'nightLuminanceFactor'> {
  const night = displayWhite(model, 'night');
  return { spectrum: displayWhite(model, 'normal').unitSpectrum, nightSpectrum: night.unitSpectrum, nightLuminanceFactor: night.nightLuminanceRatio };
}

export interface ScreenSpec {
  readonly name: string;
  readonly width_m: number;
  readonly height_m: number;
  readonly viewingDistance_m: number;
  /** Angle between the gaze and the screen's normal toward the eye (deg, default 0). */
  readonly gazeOffset_deg?: number;
  /** Luminance of full white (cd/m²). */
  readonly whiteLuminance_cd_m2: number;
  /** Average picture level: mean content luminance / white luminance (0–1, default 0.5 [assumed, mixed content]). */
  readonly averagePictureLevel?: number;
  readonly spectrum: Spectrum;
  /** Night-mode spectrum and luminance factor, used while `nightMode` is true. */
  readonly nightSpectrum?: Spectrum;
  readonly nightLuminanceFactor?: number;
  /** When the screen is on (in use and looked at). */
  readonly onSchedule: DailySchedule<boolean>;
  readonly nightMode?: DailySchedule<boolean>;
}

export interface PreparedScreen {
  readonly name: string;
  /** Eye illuminance while on, day mode and night mode (lx). */
  readonly dayEye_lx: number;
  readonly nightEye_lx: number;
  readonly on: Uint8Array;
  readonly night: Uint8Array;
  /** Responses [eyewear off, on] × [day, night]. */
  readonly responses: readonly [readonly [SourceResponse, SourceResponse], readonly [SourceResponse, SourceResponse]];
}

/** Eye illuminance (lx) from a uniformly luminous rectangle w×h at distance d on its central normal, gaze tilted by `gazeOffset_deg`. */
export function screenEyeIlluminance_lx(luminance_cd_m2: number, width_m: number, height_m: number, distance_m: number, gazeOffset_deg = 0): number {
  const eye = vec3(0, 0, 0);
  // Screen straight ahead along +y (north), at eye height; gaze turned horizontally by the offset.
  const rect = { centre: vec3(0, distance_m, 0), uAxis: vec3(1, 0, 0), vAxis: vec3(0, 0, 1), width_m, height_m };
  return uniformRectangleIlluminance_lx(eye, rect, directionFromAltAz_deg(0, gazeOffset_deg), luminance_cd_m2, 48);
}

export function prepareScreen(field: string, spec: ScreenSpec, eyewear: Transmittance | undefined): PreparedScreen {
  requirePositive(`${field}.width_m`, spec.width_m);
  requirePositive(`${field}.height_m`, spec.height_m);
  requirePositive(`${field}.viewingDistance_m`, spec.viewingDistance_m);
  requirePositive(`${field}.whiteLuminance_cd_m2`, spec.whiteLuminance_cd_m2);
  const offset = requireFinite(`${field}.gazeOffset_deg`, spec.gazeOffset_deg ?? 0);
  if (Math.abs(offset) >= 90) throw new SceneInputError(`${field}.gazeOffset_deg`, `must be within ±90° (got ${offset})`);
  const apl = requireFraction(`${field}.averagePictureLevel`, spec.averagePictureLevel ?? 0.5);
  const nightFactor = requireFraction(`${field}.nightLuminanceFactor`, spec.nightLuminanceFactor ?? 1);
  const dayEye = screenEyeIlluminance_lx(spec.whiteLuminance_cd_m2 * apl, spec.width_m, spec.height_m, spec.viewingDistance_m, offset);
  const on = Uint8Array.from(expandDailySchedule(`${field}.onSchedule`, spec.onSchedule), (b) => (b ? 1 : 0));
  const night = Uint8Array.from(expandDailySchedule(`${field}.nightMode`, spec.nightMode ?? [{ fromMinute: 0, value: false }]), (b) => (b ? 1 : 0));
  const nightSpectrum = spec.nightSpectrum ?? spec.spectrum;
  const plain: [SourceResponse, SourceResponse] = [sourceResponse(spec.spectrum, []), sourceResponse(nightSpectrum, [])];
  const filtered: [SourceResponse, SourceResponse] = eyewear !== undefined ? [sourceResponse(spec.spectrum, [eyewear]), sourceResponse(nightSpectrum, [eyewear])] : plain;
  return { name: spec.name, dayEye_lx: dayEye, nightEye_lx: dayEye * nightFactor, on, night, responses: [plain, filtered] };
}
