import { describe, expect, it } from 'vitest';
import { inRoom, skyOnlyScene } from '../../tests/eye/scene-fixtures.js';
import { evaluateEyeLight } from './eye-light.js';
import { prepareRoom } from './prepared-room.js';
import { BLIND_LOWERED, BLIND_OPEN } from './blinds.js';
import { PLACE_OUTDOORS, type OutdoorConditions, type RoomScene } from './scene.js';

/** An invented clear equinox day at 45° N: simple sun path, smooth illuminances. */
function clearDay(): OutdoorConditions {
  const n = 1440;
  const zen = new Float64Array(n);
  const az = new Float64Array(n);
  const ebn = new Float64Array(n);
  const edh = new Float64Array(n);
  const lat = (45 * Math.PI) / 180;
  for (let i = 0; i < n; i++) {
    const h = ((i / 60 - 12) * 15 * Math.PI) / 180; // hour angle, declination 0
    const sinAlt = Math.cos(lat) * Math.cos(h);
    const alt = Math.asin(sinAlt);
    zen[i] = 90 - (alt * 180) / Math.PI;
    const azS = Math.atan2(Math.sin(h), Math.cos(h) * Math.sin(lat)); // from south, + west
    az[i] = ((azS * 180) / Math.PI + 180 + 360) % 360;
    ebn[i] = sinAlt > 0 ? 90000 * Math.exp(-0.2 / sinAlt) : 0;
    edh[i] = sinAlt > 0 ? 15000 * Math.sqrt(sinAlt) : 0;
  }
  return { sunZenith_deg: zen, sunAzimuth_deg: az, directNormal_lx: ebn, diffuseHorizontal_lx: edh, month: new Uint8Array(n).fill(3), skyType: new Uint8Array(n).fill(12) };
}

function officeScene(shading?: RoomScene['windows'][number]['shading']): RoomScene {
  const base = skyOnlyScene();
  return {
    ...base,
    room: { width_m: 4, depth_m: 5, height_m: 3, reflectance: { ceiling: 0.8, walls: 0.6, floor: 0.3 } },
    ground: { monthlyReflectance: new Array<number>(12).fill(0.2) },
    gaze: { azimuth_deg: 90 },
    windows: [{ ...base.windows[0]!, sillHeight_m: 0.9, height_m: 1.8, glazing: { visibleTransmittance: 0.7, panes: 2 }, eye: { distanceToWall_m: 1.5, windowOffset_m: 0.5 }, desk: { distanceToWall_m: 1.2, windowOffset_m: 0.3 }, shading }],
  };
}

describe('a clear day in an office', () => {
  it('interpolating the sky every 30 min (default) stays within 1 % of evaluating it every minute', () => {
    const c = clearDay();
    const exact = evaluateEyeLight(prepareRoom({ ...officeScene(), skyStep_min: 1 }), c, inRoom(1440, 0)).bySource.daylight.photopic_lx;
    const fast = evaluateEyeLight(prepareRoom(officeScene()), c, inRoom(1440, 0)).bySource.daylight.photopic_lx;
    let worst = 0;
    for (let i = 0; i < 1440; i++) if ((exact[i] as number) > 50) worst = Math.max(worst, Math.abs((fast[i] as number) / (exact[i] as number) - 1));
    expect(worst).toBeLessThan(0.01);
  });

  it('the sun rule lowers the blind when the sun reaches the desk, and the lowered blind removes the sun from the eye', () => {
    const c = clearDay();
    const open = evaluateEyeLight(prepareRoom(officeScene()), c, inRoom(1440, 0));
    const ruled = evaluateEyeLight(prepareRoom(officeScene({ control: { kind: 'sun-on-work-area' } })), c, inRoom(1440, 0));
    const states = ruled.blindState[0]!;
    expect(states.includes(BLIND_LOWERED)).toBe(true);
    expect(states[300]).toBe(BLIND_OPEN);
    let lowerInRuled = 0;
    for (let i = 0; i < 1440; i++) {
      if (states[i] === BLIND_LOWERED) {
        lowerInRuled++;
        expect(ruled.bySource.daylight.photopic_lx[i] as number).toBeLessThan(open.bySource.daylight.photopic_lx[i] as number);
      }
    }
    expect(lowerInRuled).toBeGreaterThan(60);
  });

  it('daylight peaks around noon, is zero at night and the total is the sum of the sources', () => {
    const out = evaluateEyeLight(prepareRoom(officeScene()), clearDay(), inRoom(1440, 0));
    const d = out.bySource.daylight;
    expect(d.photopic_lx[120]).toBe(0);
    expect(d.photopic_lx[720] as number).toBeGreaterThan(1000);
    for (let i = 0; i < 1440; i += 37) expect(out.total.mel_edi_lx[i]).toBeCloseTo((d.mel_edi_lx[i] as number) + (out.bySource.electric.mel_edi_lx[i] as number) + (out.bySource.screen.mel_edi_lx[i] as number) + (out.bySource.outdoor.mel_edi_lx[i] as number), 9);
    // CIE D65-like daylight through neutral glass keeps a melanopic DER close to 1 (DER 1 for D65 by definition, CIE S 026).
    expect((d.mel_edi_lx[720] as number) / (d.photopic_lx[720] as number)).toBeCloseTo(1, 1);
  });

  it('outdoors, the outdoor eye illuminance becomes the outdoor column and the room sources stop', () => {
    const c = { ...clearDay(), outdoorEye_lx: new Float64Array(1440).fill(20000) };
    const occ = inRoom(1440, 0);
    occ.place.fill(PLACE_OUTDOORS, 700, 760);
    const out = evaluateEyeLight(prepareRoom(officeScene()), c, occ);
    expect(out.bySource.outdoor.photopic_lx[730]).toBeCloseTo(20000, 9);
    expect(out.bySource.daylight.photopic_lx[730]).toBe(0);
    expect(out.bySource.outdoor.photopic_lx[800]).toBe(0);
  });
});
