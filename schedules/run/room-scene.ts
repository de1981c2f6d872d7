/**
 * Adapter from a scenario room to the light-at-eye model's RoomScene (model/eye) for the
 * daylight through its windows. Electric light and screens are added per minute in
 * eye-series.ts (the scenario describes them by what they give at the eye), so the scene holds
 * windows only.
 *  - Eye point: `viewingPosition.distanceFromWindow_m` from the first window's wall (default
 *    half the room depth), eye height from the same (default 1.2 m seated, common
 *    practice); windows on the opposite wall are seen from depth − distance, windows on a
 *    side wall from half the width. Each window centred on the eye's perpendicular.
 *  - Blinds rules: none → open; always-down → lowered; down-at-night → lowered from sunset to
 *    sunrise of the run's middle day (local clock); manual-sun → sun-on-work-area, raised on the
 *    first arrival of the day (Reinhart's active user, model/eye/blinds.ts); auto-solar →
 *    sun-on-work-area raised once the sun has left the desk; threshold from the scenario.
 *  - Gaze: the person's stated compass direction; else toward the first window for gaze
 *    "window", and parallel to the first window's wall (a desk side-on to the window, common
 *    practice in offices) otherwise.
 */
import type { BlindControl, RoomScene, RoomWindowSpec, ShadingSpec } from '../../model/eye/index.js';
import type { Room } from '../schema/scenario-types.js';

export interface NightBlinds {
  /** Local minute of day of sunset and sunrise (middle of the run). */
  readonly sunset_min: number;
  readonly sunrise_min: number;
}

function shadingFor(room: Room, night: NightBlinds): ShadingSpec {
  const b = room.blinds;
  let control: BlindControl;
  switch (b.rule) {
    case 'none':
      control = { kind: 'manual', state: 'open' };
      break;
    case 'always-down':
      control = { kind: 'manual', state: 'lowered' };
      break;
    case 'down-at-night': {
      const rise = Math.min(1439, Math.max(0, Math.round(night.sunrise_min)));
      const set = Math.min(1439, Math.max(rise + 1, Math.round(night.sunset_min)));
      control = { kind: 'schedule', schedule: [{ fromMinute: rise, value: 'open' }, ...(set < 1440 && set > rise ? [{ fromMinute: set, value: 'lowered' as const }] : [])] };
      break;
    }
    case 'manual-sun':
      control = { kind: 'sun-on-work-area', lowerAbove_W_m2: b.threshold_W_m2, raise: 'on-arrival' };
      break;
    case 'auto-solar':
      control = { kind: 'sun-on-work-area', lowerAbove_W_m2: b.threshold_W_m2, raiseBelow_W_m2: b.threshold_W_m2 / 2, raise: 'when-clear' };
      break;
  }
  return { loweredTransmittance: b.loweredTransmittance, control };
}

function angleBetween_deg(a: number, b: number): number {
  const d = Math.abs((((a - b) % 360) + 540) % 360 - 180);
  return d;
}

export function defaultGazeAzimuth_deg(room: Room, gaze: string): number {
  const facade = room.windows[0]?.facadeAzimuth_deg ?? 180;
  return gaze === 'window' ? facade : (facade + 90) % 360;
}

export function roomScene(room: Room, gazeAzimuth_deg: number, night: NightBlinds, ground: { reflectance: number; snowReflectance: number }): RoomScene {
  const first = room.windows[0];
  const d0 = room.viewingPosition?.distanceFromWindow_m ?? room.depth_m / 2;
  const eyeHeight = Math.min(room.viewingPosition?.eyeHeight_m ?? 1.2, room.height_m - 0.1);
  const shading = shadingFor(room, night);
  const windows: RoomWindowSpec[] = room.windows.map((w) => {
    const rel = first === undefined ? 0 : angleBetween_deg(w.facadeAzimuth_deg, first.facadeAzimuth_deg);
    const span = rel < 45 ? null : rel > 135 ? 'opposite' : 'side';
    const dist = span === null ? d0 : span === 'opposite' ? room.depth_m - d0 : room.width_m / 2;
    return {
      name: w.id,
      facadeAzimuth_deg: w.facadeAzimuth_deg,
      width_m: w.width_m,
      height_m: Math.min(w.height_m, room.height_m - w.sillHeight_m - 0.01),
      sillHeight_m: Math.min(w.sillHeight_m, room.height_m - 0.2),
      eye: { distanceToWall_m: Math.max(0.3, dist), windowOffset_m: 0 },
      glazing: { visibleTransmittance: w.visibleTransmittance },
      ...(w.obstructionAngle_deg > 0 ? { obstruction: { horizonAngle_deg: w.obstructionAngle_deg } } : {}),
      shading,
    };
  });
  return {
    room: { width_m: room.width_m, depth_m: room.depth_m, height_m: room.height_m, reflectance: { ceiling: room.reflectances.ceiling, walls: room.reflectances.walls, floor: room.reflectances.floor } },
    eyeHeight_m: Math.max(0.3, eyeHeight),
    gaze: { azimuth_deg: gazeAzimuth_deg },
    windows,
    ground: { monthlyReflectance: new Array<number>(12).fill(ground.reflectance), snowReflectance: ground.snowReflectance },
  };
}
