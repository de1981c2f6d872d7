import { describe, expect, it } from 'vitest';
import { cornerFormFactor } from '../../tests/eye/handbook-form-factor.js';
import { constantConditions, inRoom, ledLikeSpectrum, skyOnlyScene } from '../../tests/eye/scene-fixtures.js';
import { alphaOpicQuantities, scaleToIlluminance } from '../photometry/alpha-opic.js';
import { addSpectra, applyTransmittance } from '../photometry/spectrum.js';
import { GRID_LENGTH, gridWavelength_nm } from '../photometry/wavelength-grid.js';
import { tristimulus } from '../photometry/colorimetry.js';
import { coolShareForCct } from './electric-lighting.js';
import { evaluateEyeLight } from './eye-light.js';
import { prepareRoom } from './prepared-room.js';
import type { RoomScene } from './scene.js';
import { displaySpectra, screenEyeIlluminance_lx } from './screen.js';
import { defaultDisplayModel } from '../sources/display.js';
import { cieDaylightSpectrum } from '../sources/cie-daylight.js';

const dark = (n: number) => constantConditions(n, { zenith_deg: 120, azimuth_deg: 0, ebn_lx: 0, edh_lx: 0 });
const warm = ledLikeSpectrum(0.15, 610);
const cool = ledLikeSpectrum(1.2, 560);

describe('screens (E = ∫ L cos θ dω)', () => {
  it.each([
    [0.53, 0.3, 0.6],
    [0.07, 0.15, 0.3],
    [1.2, 0.7, 0.5],
  ])('a uniform %s×%s m screen at %s m matches the parallel-rectangle form factor (Howell B-3)', (w, h, d) => {
    const expected = 200 * Math.PI * 4 * cornerFormFactor(w / 2, h / 2, d);
    expect(Math.abs(screenEyeIlluminance_lx(200, w, h, d) / expected - 1)).toBeLessThan(1e-4);
  });

  it('night mode on the library display model lowers the melanopic EDI per lux and the luminance (Xu et al. 2023: DER falls more than luminance)', () => {
    const spectra = displaySpectra(defaultDisplayModel());
    const scene: RoomScene = {
      ...skyOnlyScene({ windows: [] }),
      screens: [{ name: 'monitor', width_m: 0.6, height_m: 0.34, viewingDistance_m: 0.65, whiteLuminance_cd_m2: 200, ...spectra, onSchedule: [{ fromMinute: 0, value: true }], nightMode: [{ fromMinute: 0, value: false }, { fromMinute: 1, value: true }] }],
    };
    const out = evaluateEyeLight(prepareRoom(scene), dark(2), inRoom(2, 0)).bySource.screen;
    const derDay = (out.mel_edi_lx[0] as number) / (out.photopic_lx[0] as number);
    const derNight = (out.mel_edi_lx[1] as number) / (out.photopic_lx[1] as number);
    expect(derNight).toBeLessThan(derDay * 0.8);
    expect(out.photopic_lx[1] as number).toBeLessThanOrEqual(out.photopic_lx[0] as number);
  });

  it('a small screen tends to L·A/d² (small-source limit)', () => {
    expect(screenEyeIlluminance_lx(300, 0.02, 0.01, 2) / ((300 * 0.02 * 0.01) / 4)).toBeCloseTo(1, 4);
  });

  it('gaze turned 60° from a small screen keeps about cos 60° of the illuminance', () => {
    expect(screenEyeIlluminance_lx(300, 0.02, 0.01, 2, 60) / screenEyeIlluminance_lx(300, 0.02, 0.01, 2)).toBeCloseTo(0.5, 3);
  });
});

describe('electric lighting', () => {
  it('tunable white: the cool share reproduces the target CCT of the physically mixed spectrum (McCamy 1992 cubic as an independent CCT check, ±10 K)', () => {
    const target = 4000;
    const f = coolShareForCct(warm, cool, target);
    const mix = addSpectra(scaleToIlluminance(warm, 1 - f), scaleToIlluminance(cool, f));
    const t = tristimulus(mix);
    // McCamy (1992), Color Res. Appl. 17:142: n = (x − 0.3320)/(0.1858 − y), CCT = 449n³ + 3525n² + 6823.3n + 5520.33 (from memory).
    const x = t.X / (t.X + t.Y + t.Z);
    const y = t.Y / (t.X + t.Y + t.Z);
    const n = (x - 0.332) / (0.1858 - y);
    expect(Math.abs(449 * n ** 3 + 3525 * n ** 2 + 6823.3 * n + 5520.33 - target)).toBeLessThan(10);
  });

  it('a CCT the two channels cannot mix is refused naming the schedule entry', () => {
    const scene: RoomScene = { ...skyOnlyScene({ windows: [] }), luminaires: [{ name: 't', tunable: { warm, cool }, eyeAtFullOutput_lx: 100, schedule: [{ fromMinute: 0, value: { level: 1, cct_K: 50000 } }] }] };
    expect(() => prepareRoom(scene)).toThrow(/luminaires\[0\]\.schedule\[0\]\.value\.cct_K/);
  });

  it('eye illuminance from desk × ratio, melanopic EDI equal to that of the physically mixed spectrum (linearity, CIE S 026)', () => {
    const scene: RoomScene = {
      ...skyOnlyScene({ windows: [] }),
      luminaires: [{ name: 'tunable', tunable: { warm, cool }, deskAtFullOutput_lx: 500, eyeToDeskRatio: 0.5, schedule: [{ fromMinute: 0, value: { level: 0.8, cct_K: 5000 } }] }],
    };
    const out = evaluateEyeLight(prepareRoom(scene), dark(1), inRoom(1));
    expect(out.bySource.electric.photopic_lx[0]).toBeCloseTo(200, 9);
    const f = coolShareForCct(warm, cool, 5000);
    const mixed = alphaOpicQuantities(addSpectra(scaleToIlluminance(warm, 200 * (1 - f)), scaleToIlluminance(cool, 200 * f)));
    expect(out.bySource.electric.mel_edi_lx[0]).toBeCloseTo(mixed.alpha_opic.mel.edi_lx, 6);
    expect(out.total.mel_edi_lx[0]).toBeCloseTo(mixed.alpha_opic.mel.edi_lx, 6);
  });

  it('daylight-linked dimming tops the desk up to its target and never goes below the minimum level', () => {
    const base = skyOnlyScene();
    const scene: RoomScene = {
      ...base,
      luminaires: [{ name: 'downlights', spectrum: cool, deskAtFullOutput_lx: 500, schedule: [{ fromMinute: 0, value: { level: 1 } }], daylightDimming: { deskTarget_lx: 500, minimumLevel: 0.1 } }],
    };
    const prepared = prepareRoom(scene);
    const night = evaluateEyeLight(prepared, dark(1), inRoom(1));
    expect(night.bySource.electric.photopic_lx[0]).toBeCloseTo(250, 9);
    const bright = evaluateEyeLight(prepared, constantConditions(1, { zenith_deg: 40, azimuth_deg: 180, ebn_lx: 0, edh_lx: 80000, skyType: 5 }), inRoom(1));
    expect(bright.bySource.electric.photopic_lx[0]).toBeCloseTo(25, 9);
  });
});

describe('eyewear acts on every source', () => {
  it('a long-pass filter (0 below 520 nm, 1 above) gives each source the photopic and melanopic values of its filtered spectrum', () => {
    const values = new Float64Array(GRID_LENGTH);
    for (let i = 0; i < GRID_LENGTH; i++) values[i] = gridWavelength_nm(i) < 520 ? 0 : 1;
    const filter = { values, label: 'amber glasses' };
    const base = skyOnlyScene();
    const screenSpd = ledLikeSpectrum(0.8, 550);
    const scene: RoomScene = {
      ...base,
      luminaires: [{ name: 'lamp', spectrum: warm, eyeAtFullOutput_lx: 100, schedule: [{ fromMinute: 0, value: { level: 1 } }] }],
      screens: [{ name: 'laptop', width_m: 0.3, height_m: 0.2, viewingDistance_m: 0.5, whiteLuminance_cd_m2: 200, averagePictureLevel: 1, spectrum: screenSpd, onSchedule: [{ fromMinute: 0, value: true }] }],
      eyewear: { name: 'amber', transmittance: filter, worn: [{ fromMinute: 0, value: false }, { fromMinute: 1, value: true }] },
    };
    const c = constantConditions(2, { zenith_deg: 40, azimuth_deg: 180, ebn_lx: 0, edh_lx: 10000, skyType: 5 });
    const out = evaluateEyeLight(prepareRoom(scene), c, inRoom(2, 0));
    const expectRatio = (s: typeof warm, col: { photopic_lx: Float64Array; mel_edi_lx: Float64Array }) => {
      const f = alphaOpicQuantities(applyTransmittance(s, filter));
      const u = alphaOpicQuantities(s);
      expect((col.photopic_lx[1] as number) / (col.photopic_lx[0] as number)).toBeCloseTo(f.illuminance_lx / u.illuminance_lx, 9);
      expect((col.mel_edi_lx[1] as number) / (col.mel_edi_lx[0] as number)).toBeCloseTo(f.alpha_opic.mel.edi_lx / u.alpha_opic.mel.edi_lx, 9);
    };
    expectRatio(warm, out.bySource.electric);
    expectRatio(screenSpd, out.bySource.screen);
    // Daylight: CIE D-series at 6504 K (responses are tabulated at 100 K steps) behind clear glass.
    expectRatio(cieDaylightSpectrum(6500), out.bySource.daylight);
  });
});
