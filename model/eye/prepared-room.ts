/**
 * Validation and one-off precomputation for a room: window coefficients, split-flux room
 * constants, shading, luminaires, screens, eyewear schedule and spectral responses.
 */
import { expandDailySchedule } from './daily-schedule.js';
import { prepareLuminaire, type PreparedLuminaire } from './electric-lighting.js';
import { prepareShading, type PreparedShading } from './blinds.js';
import { prepareScreen, type PreparedScreen } from './screen.js';
import { SceneInputError, requireFinite, requireFraction, requirePositive } from './scene-input-error.js';
import type { RoomScene } from './scene.js';
import { DaylightResponses, flatTransmittance } from './source-response.js';
import { directionFromAltAz_deg } from './vector3.js';
import { placeWindow } from './window-geometry.js';
import { windowCoefficients, type WindowCoefficients } from './window-coefficients.js';

export interface PreparedWindow {
  readonly coefficients: WindowCoefficients;
  readonly shading: PreparedShading;
  /** Daylight responses through this glazing, [eyewear off, eyewear on]. */
  readonly daylight: readonly [DaylightResponses, DaylightResponses];
  /** Split-flux factor A_w / (A·(1 − ρ̄)). */
  readonly reflectedPerFlux: number;
}

export interface PreparedRoom {
  readonly windows: readonly PreparedWindow[];
  readonly luminaires: readonly PreparedLuminaire[];
  readonly screens: readonly PreparedScreen[];
  /** Outdoor daylight responses (no glazing), [eyewear off, eyewear on]. */
  readonly outdoorDaylight: readonly [DaylightResponses, DaylightResponses];
  readonly eyewearWorn: Uint8Array;
  readonly groundMonthly: readonly number[];
  readonly groundSnow: number;
  /** Area-weighted reflectances of the lower zone (floor, lower walls) and upper zone (ceiling, upper walls). */
  readonly rhoLower: number;
  readonly rhoUpper: number;
  readonly skyStep_min: number;
}

/** Validate the scene (throws SceneInputError naming the field) and precompute everything that does not depend on time. */
export function prepareRoom(scene: RoomScene): PreparedRoom {
  const r = scene.room;
  requirePositive('room.width_m', r.width_m);
  requirePositive('room.depth_m', r.depth_m);
  requirePositive('room.height_m', r.height_m);
  const rc = requireFraction('room.reflectance.ceiling', r.reflectance.ceiling);
  const rw = requireFraction('room.reflectance.walls', r.reflectance.walls);
  const rf = requireFraction('room.reflectance.floor', r.reflectance.floor);
  const eyeHeight = requirePositive('eyeHeight_m', scene.eyeHeight_m ?? 1.2);
  const deskHeight = requirePositive('deskHeight_m', scene.deskHeight_m ?? 0.75);
  if (eyeHeight >= r.height_m) throw new SceneInputError('eyeHeight_m', `must be below the ceiling (${eyeHeight} ≥ ${r.height_m} m)`);
  if (deskHeight >= r.height_m) throw new SceneInputError('deskHeight_m', `must be below the ceiling (${deskHeight} ≥ ${r.height_m} m)`);
  requireFinite('gaze.azimuth_deg', scene.gaze.azimuth_deg);
  const gazeElevation = requireFinite('gaze.elevation_deg', scene.gaze.elevation_deg ?? 0);
  if (Math.abs(gazeElevation) > 90) throw new SceneInputError('gaze.elevation_deg', `must be within ±90° (got ${gazeElevation})`);
  const gaze = directionFromAltAz_deg(gazeElevation, scene.gaze.azimuth_deg);
  const skyStep = scene.skyStep_min ?? 30;
  if (!Number.isInteger(skyStep) || skyStep < 1 || skyStep > 60) throw new SceneInputError('skyStep_min', `must be an integer 1–60 (got ${skyStep})`);

  // Split-flux room constants (EnergyPlus Engineering Reference, "Daylight Factor Calculation").
  const floorArea = r.width_m * r.depth_m;
  const wallArea = 2 * (r.width_m + r.depth_m) * r.height_m;
  const totalArea = 2 * floorArea + wallArea;
  const rhoMean = (rc * floorArea + rf * floorArea + rw * wallArea) / totalArea;
  const halfWall = wallArea / 2;
  const rhoLower = (rf * floorArea + rw * halfWall) / (floorArea + halfWall);
  const rhoUpper = (rc * floorArea + rw * halfWall) / (floorArea + halfWall);

  const eyewear = scene.eyewear;
  if (eyewear !== undefined) {
    eyewear.transmittance.values.forEach((v, i) => {
      if (!(v >= 0 && v <= 1)) throw new SceneInputError(`eyewear.transmittance[${i}]`, `must lie between 0 and 1 (got ${v})`);
    });
  }
  const eyewearWorn = eyewear !== undefined ? Uint8Array.from(expandDailySchedule('eyewear.worn', eyewear.worn), (b) => (b ? 1 : 0)) : new Uint8Array(1440);
  const eyewearFilters = eyewear !== undefined ? [eyewear.transmittance] : [];

  const windows = scene.windows.map((w, i): PreparedWindow => {
    const field = `windows[${i}]`;
    const placed = placeWindow(field, w, r.height_m);
    const glass = w.glazing.spectralTransmittance ?? flatTransmittance(w.glazing.visibleTransmittance as number, `${w.name} glazing`);
    return {
      coefficients: windowCoefficients(placed, eyeHeight, gaze, deskHeight),
      shading: prepareShading(`${field}.shading`, w.shading),
      daylight: [new DaylightResponses([glass]), new DaylightResponses([glass, ...eyewearFilters])],
      reflectedPerFlux: placed.area_m2 / (totalArea * (1 - rhoMean)),
    };
  });
  const luminaires = (scene.luminaires ?? []).map((l, i) => prepareLuminaire(`luminaires[${i}]`, l, eyewear?.transmittance));
  const screens = (scene.screens ?? []).map((s, i) => prepareScreen(`screens[${i}]`, s, eyewear?.transmittance));
  const monthly = scene.ground?.monthlyReflectance ?? new Array<number>(12).fill(0.2);
  if (monthly.length !== 12) throw new SceneInputError('ground.monthlyReflectance', `needs 12 monthly values (got ${monthly.length})`);
  monthly.forEach((v, i) => requireFraction(`ground.monthlyReflectance[${i}]`, v));
  const snow = requireFraction('ground.snowReflectance', scene.ground?.snowReflectance ?? 0.65);
  return {
    windows,
    luminaires,
    screens,
    outdoorDaylight: [new DaylightResponses([]), new DaylightResponses(eyewearFilters)],
    eyewearWorn,
    groundMonthly: monthly,
    groundSnow: snow,
    rhoLower,
    rhoUpper,
    skyStep_min: skyStep,
  };
}
