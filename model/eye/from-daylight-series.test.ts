import { describe, expect, it } from 'vitest';
import { daylightFromSkyConditions } from '../daylight/daylight-series.js';
import { inRoom, skyOnlyScene } from '../../tests/eye/scene-fixtures.js';
import { evaluateEyeLight } from './eye-light.js';
import { outdoorConditionsFromDaylightSeries } from './from-daylight-series.js';
import { prepareRoom } from './prepared-room.js';
import type { RoomScene } from './scene.js';
import { alphaOpicDer } from '../photometry/alpha-opic.js';
import { cieDaylightSpectrum } from '../sources/cie-daylight.js';

describe('outdoor daylight series → light at the eye', () => {
  it('a clear June day at 52° N through a south window: dark at night, bright at noon, melanopic DER that of CIE D-series skylight between 5700 K and 11000 K (CIE S 026)', () => {
    // Invented site and day; local standard time UTC+1, series starts at local midnight.
    const start = Date.UTC(2026, 5, 20, 23, 0) - 86_400_000;
    const series = daylightFromSkyConditions({ startEpochMs: start, step_min: 1, count: 1440, site: { latitude_deg: 52, longitude_deg: 5 }, utcOffset_h: 1, conditions: ['clear'] });
    const c = outdoorConditionsFromDaylightSeries(series, new Uint8Array(1440).fill(6));
    const base = skyOnlyScene();
    const scene: RoomScene = { ...base, room: { ...base.room, reflectance: { ceiling: 0.8, walls: 0.6, floor: 0.3 } }, ground: {}, windows: [{ ...base.windows[0]!, sillHeight_m: 0.9, height_m: 1.5, glazing: { visibleTransmittance: 0.7 } }] };
    const out = evaluateEyeLight(prepareRoom(scene), c, inRoom(1440, 0));
    const d = out.bySource.daylight;
    expect(d.photopic_lx[60]).toBe(0); // 01:00
    expect(d.photopic_lx[12 * 60 + 40] as number).toBeGreaterThan(500);
    const der = (d.mel_edi_lx[12 * 60 + 40] as number) / (d.photopic_lx[12 * 60 + 40] as number);
    expect(der).toBeGreaterThan(alphaOpicDer(cieDaylightSpectrum(5700)).mel);
    expect(der).toBeLessThan(alphaOpicDer(cieDaylightSpectrum(11000)).mel + 1e-9);
  });

  it('refuses a month array of the wrong length, naming it', () => {
    const series = daylightFromSkyConditions({ startEpochMs: Date.UTC(2026, 0, 1), step_min: 1, count: 10, site: { latitude_deg: 52, longitude_deg: 5 }, utcOffset_h: 1, conditions: ['overcast'] });
    expect(() => outdoorConditionsFromDaylightSeries(series, new Uint8Array(3).fill(1))).toThrow(/^month:/);
  });
});
