import { describe, expect, it } from 'vitest';
import { constantConditions, inRoom, skyOnlyScene } from '../../tests/eye/scene-fixtures.js';
import { evaluateEyeLight } from './eye-light.js';
import { prepareRoom } from './prepared-room.js';
import { SceneInputError } from './scene-input-error.js';
import type { RoomScene, RoomWindowSpec } from './scene.js';

function withWindow(patch: Partial<RoomWindowSpec>): RoomScene {
  const base = skyOnlyScene();
  return { ...base, windows: [{ ...base.windows[0]!, ...patch }] };
}

function refusal(scene: RoomScene): SceneInputError {
  try {
    prepareRoom(scene);
  } catch (e) {
    if (e instanceof SceneInputError) return e;
    throw e;
  }
  throw new Error('scene was accepted');
}

describe('impossible window geometry is refused with the field named', () => {
  it.each([
    [{ width_m: 0 }, 'windows[0].width_m'],
    [{ width_m: -1 }, 'windows[0].width_m'],
    [{ height_m: 0 }, 'windows[0].height_m'],
    [{ height_m: Number.NaN }, 'windows[0].height_m'],
    [{ sillHeight_m: -0.2 }, 'windows[0].sillHeight_m'],
    [{ height_m: 2.5 }, 'windows[0].height_m'],
    [{ eye: { distanceToWall_m: 0, windowOffset_m: 0 } }, 'windows[0].eye.distanceToWall_m'],
    [{ eye: { distanceToWall_m: -1.5, windowOffset_m: 0 } }, 'windows[0].eye.distanceToWall_m'],
    [{ desk: { distanceToWall_m: -0.1, windowOffset_m: 0 } }, 'windows[0].desk.distanceToWall_m'],
    [{ glazing: { visibleTransmittance: 1.3 } }, 'windows[0].glazing.visibleTransmittance'],
    [{ glazing: {} }, 'windows[0].glazing'],
    [{ obstruction: { horizonAngle_deg: 95 } }, 'windows[0].obstruction.horizonAngle_deg'],
    [{ obstruction: { horizonAngle_deg: 10, monthlyTransmittance: [0.5] } }, 'windows[0].obstruction.monthlyTransmittance'],
  ] as [Partial<RoomWindowSpec>, string][])('%j → %s', (patch, field) => {
    const e = refusal(withWindow(patch));
    expect(e.field).toBe(field);
    expect(e.message.startsWith(field)).toBe(true);
  });

  it('"behind the wall" is said in words', () => {
    expect(refusal(withWindow({ eye: { distanceToWall_m: -1, windowOffset_m: 0 } })).message).toMatch(/behind the window wall/);
  });

  it('room, eye height and schedules are checked too', () => {
    const base = skyOnlyScene();
    expect(refusal({ ...base, room: { ...base.room, depth_m: 0 } }).field).toBe('room.depth_m');
    expect(refusal({ ...base, eyeHeight_m: 3.5 }).field).toBe('eyeHeight_m');
    expect(refusal({ ...base, luminaires: [{ name: 'x', eyeAtFullOutput_lx: 100, schedule: [{ fromMinute: 1500, value: { level: 1 } }], spectrum: undefined }] }).field).toBe('luminaires[0]');
  });
});

describe('bad per-minute conditions are refused with the sample named', () => {
  it('negative illuminance, wrong length, month out of range', () => {
    const room = prepareRoom(skyOnlyScene());
    const c = constantConditions(3, { zenith_deg: 40, azimuth_deg: 180, ebn_lx: 0, edh_lx: 1000 });
    c.diffuseHorizontal_lx[2] = -5;
    expect(() => evaluateEyeLight(room, c, inRoom(3))).toThrow(/conditions\.diffuseHorizontal_lx\[2\]/);
    expect(() => evaluateEyeLight(room, constantConditions(3, { zenith_deg: 40, azimuth_deg: 180, ebn_lx: 0, edh_lx: 1000 }), inRoom(4))).toThrow(/conditions\.sunZenith_deg: has 3 samples/);
    const m = constantConditions(1, { zenith_deg: 40, azimuth_deg: 180, ebn_lx: 0, edh_lx: 1000, month: 13 });
    expect(() => evaluateEyeLight(room, m, inRoom(1))).toThrow(/conditions\.month\[0\]/);
  });
});
