/**
 * Inputs of the light-at-the-eye model for one room (a "place" of the scenario) and the
 * per-minute outdoor conditions and occupancy. Plain numbers and typed arrays, one sample per
 * minute, so the scenario pipeline and the outdoor model can feed it directly.
 */
import type { Transmittance } from '../photometry/spectrum.js';
import type { ShadingSpec } from './blinds.js';
import type { DailySchedule } from './daily-schedule.js';
import type { LuminaireSpec } from './electric-lighting.js';
import type { ScreenSpec } from './screen.js';
import type { WindowSpec } from './window-geometry.js';

export interface RoomSpec {
  readonly width_m: number;
  readonly depth_m: number;
  readonly height_m: number;
  /** Diffuse reflectances (0–1). Typical: ceiling 0.7–0.85, walls 0.5–0.7, floor 0.2–0.4 (from memory). */
  readonly reflectance: { readonly ceiling: number; readonly walls: number; readonly floor: number };
}

export interface GroundSpec {
  /** Ground reflectance per month Jan…Dec without snow; default 0.2 (grass, pvlib SURFACE_ALBEDOS). */
  readonly monthlyReflectance?: readonly number[];
  /** Reflectance while snow lies on the ground; default 0.65 ("snow", same source). */
  readonly snowReflectance?: number;
}

export interface EyewearSpec {
  readonly name: string;
  readonly transmittance: Transmittance;
  /** When the eyewear is worn (minute of day). It filters every source, outdoors too. */
  readonly worn: DailySchedule<boolean>;
}

export interface RoomWindowSpec extends WindowSpec {
  readonly shading?: ShadingSpec;
}

export interface RoomScene {
  readonly room: RoomSpec;
  /** Eye height above the floor (m); default 1.2 (seated, common practice). */
  readonly eyeHeight_m?: number;
  /** Work-plane height (m); default 0.75 (common practice). */
  readonly deskHeight_m?: number;
  /** Gaze direction: azimuth clockwise from north (deg) and elevation (deg, default 0 = level). */
  readonly gaze: { readonly azimuth_deg: number; readonly elevation_deg?: number };
  readonly windows: readonly RoomWindowSpec[];
  readonly ground?: GroundSpec;
  readonly luminaires?: readonly LuminaireSpec[];
  readonly screens?: readonly ScreenSpec[];
  readonly eyewear?: EyewearSpec;
  /** Time step (min) at which the sky luminance distribution is evaluated exactly; linear in between. Default 30 (worst deviation 0.3 % on a clear day, validation record). */
  readonly skyStep_min?: number;
}

/** Outdoor conditions, one sample per minute (all arrays the same length). */
export interface OutdoorConditions {
  /** Topocentric solar zenith (deg) and azimuth (deg clockwise from north). */
  readonly sunZenith_deg: Float64Array;
  readonly sunAzimuth_deg: Float64Array;
  /** Direct normal and diffuse horizontal illuminance (lx). */
  readonly directNormal_lx: Float64Array;
  readonly diffuseHorizontal_lx: Float64Array;
  /** Direct normal irradiance (W/m²) for the blinds rule; if absent, E_bn / 100 lm/W (a quick fallback, from memory). */
  readonly directNormal_W_m2?: Float64Array;
  /** Daylight CCT (K) for the CIE D-series spectrum of sky, ground and reflected light; default 6504 K (D65). */
  readonly daylightCct_K?: Float64Array;
  /** CCT (K) of direct sun seen through a window; default daylightCct_K. */
  readonly sunCct_K?: Float64Array;
  /** CIE general sky type 1–15 per minute; else from Perez ε (given, or computed from the illuminances). */
  readonly skyType?: Uint8Array;
  readonly perezEpsilon?: Float64Array;
  /** 1 where snow lies on the ground. */
  readonly snowOnGround?: Uint8Array;
  /** Calendar month 1–12 of each minute (local time). */
  readonly month: Uint8Array;
  /** Photopic illuminance at the eye outdoors (lx), from the outdoor model, used when the person is outdoors. */
  readonly outdoorEye_lx?: Float64Array;
}

export const PLACE_ROOM = 0;
export const PLACE_OUTDOORS = 1;
export const PLACE_ELSEWHERE = 2;

export interface Occupancy {
  /** Local minute of day (0–1439) of the first sample; samples are consecutive minutes. */
  readonly startMinuteOfDay: number;
  /** Per minute: PLACE_ROOM (in this room), PLACE_OUTDOORS, PLACE_ELSEWHERE (no light from this model). */
  readonly place: Uint8Array;
}
