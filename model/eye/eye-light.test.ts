import { describe, expect, it } from 'vitest';
import { cornerFormFactor, offsetRectangleFormFactor } from '../../tests/eye/handbook-form-factor.js';
import { constantConditions, inRoom, skyOnlyScene } from '../../tests/eye/scene-fixtures.js';
import { evaluateEyeLight } from './eye-light.js';
import { prepareRoom } from './prepared-room.js';
import { relativeAngularTransmittance, relativeAngularTransmittanceFast } from './glazing.js';
import type { RoomScene } from './scene.js';

const EDH = 10000;
const uniform = (n = 1) => constantConditions(n, { zenith_deg: 50, azimuth_deg: 180, ebn_lx: 0, edh_lx: EDH, skyType: 5 });

function eyeLux(scene: RoomScene, c = uniform()): number {
  return evaluateEyeLight(prepareRoom(scene), c, inRoom(c.month.length)).bySource.daylight.photopic_lx[0] as number;
}

describe('sky through a window, uniform sky (analytic)', () => {
  it('an unobstructed window facing the eye matches the parallel-rectangle form factor: E = E_dh · F (Howell B-3)', () => {
    // Window 2 m × 1 m, bottom edge at eye height, centred, 2 m away: two corner rectangles 1 m × 1 m.
    const expected = EDH * 2 * cornerFormFactor(1, 1, 2);
    expect(Math.abs(eyeLux(skyOnlyScene()) / expected - 1)).toBeLessThan(1e-3);
  });

  it('an off-centre window matches corner superposition of the same form factor', () => {
    const base = skyOnlyScene();
    const w0 = base.windows[0]!;
    const scene: RoomScene = { ...base, windows: [{ ...w0, width_m: 1.5, height_m: 1.1, sillHeight_m: 1.5, eye: { distanceToWall_m: 1.7, windowOffset_m: 0.9 } }] };
    // Right is west for a south façade; the form factor is symmetric so only offsets matter.
    const expected = EDH * offsetRectangleFormFactor(0.9 - 0.75, 0.9 + 0.75, 0.3, 1.4, 1.7);
    expect(Math.abs(eyeLux(scene) / expected - 1)).toBeLessThan(1e-3);
  });

  it('a vertical eye plane behind an unbounded opening onto a uniform sky receives half the horizontal illuminance, π·L/2 (analytic)', () => {
    const base = skyOnlyScene();
    const scene: RoomScene = { ...base, room: { ...base.room, height_m: 1e5 }, windows: [{ ...base.windows[0]!, width_m: 1e5, height_m: 5e4, sillHeight_m: 1.2, eye: { distanceToWall_m: 0.01, windowOffset_m: 0 } }] };
    // L = E_dh/π, so π·L/2 = E_dh/2.
    expect(eyeLux(scene) / (EDH / 2)).toBeCloseTo(1, 3);
  });

  it('glazing scales the view linearly and the Fresnel angular loss lowers it', () => {
    const clear = eyeLux(skyOnlyScene());
    const base = skyOnlyScene();
    const tinted: RoomScene = { ...base, windows: [{ ...base.windows[0]!, glazing: { visibleTransmittance: 0.6, panes: 0 } }] };
    expect(eyeLux(tinted) / clear).toBeCloseTo(0.6, 10);
    const glazed: RoomScene = { ...base, windows: [{ ...base.windows[0]!, glazing: { visibleTransmittance: 1, panes: 2 } }] };
    const ratio = eyeLux(glazed) / clear;
    expect(ratio).toBeLessThan(1);
    expect(ratio).toBeGreaterThan(0.9);
  });
});

describe('Fresnel angular transmittance (Born & Wolf §1.5)', () => {
  it('is 1 at normal incidence, 0 at grazing and falls steeply beyond 70°', () => {
    expect(relativeAngularTransmittance(1, 2)).toBeCloseTo(1, 12);
    expect(relativeAngularTransmittance(0, 2)).toBe(0);
    // Hand calculation, n = 1.526 at 60°: sin θt = 0.5675, R_s = 0.1855, R_p = 0.00145, interface T = 0.9065;
    // at 0°: R = (0.526/2.526)² = 0.04336, T = 0.95664. One pane (two interfaces): (0.9065/0.95664)² = 0.898.
    expect(relativeAngularTransmittance(0.5, 1)).toBeCloseTo(0.898, 3);
    expect(relativeAngularTransmittance(Math.cos((80 * Math.PI) / 180), 2)).toBeLessThan(0.6);
  });

  it('the per-minute table agrees with the formula to 1e-4', () => {
    for (let c = 0.0005; c <= 1; c += 0.0037) expect(Math.abs(relativeAngularTransmittanceFast(c, 2) - relativeAngularTransmittance(c, 2))).toBeLessThan(1e-4);
  });
});

describe('direct sun through the window', () => {
  const sunScene = (): RoomScene => {
    const base = skyOnlyScene();
    return { ...base, windows: [{ ...base.windows[0]!, sillHeight_m: 0.8, height_m: 1.8 }] };
  };
  const sunAt = (alt: number, az: number) => constantConditions(1, { zenith_deg: 90 - alt, azimuth_deg: az, ebn_lx: 50000, edh_lx: 0, skyType: 5 });

  it('reaches the eye as E_bn·cos θ when the ray to the sun passes the aperture (geometry, §3.4)', () => {
    // Eye 2 m from the wall, window top 2.6 m: the sun at 20° is seen through it (tan 20° · 2 = 0.73 < 1.4).
    expect(eyeLux(sunScene(), sunAt(20, 180))).toBeCloseTo(50000 * Math.cos((20 * Math.PI) / 180), 6);
  });

  it('is blocked when the sun is above the window head or behind the façade', () => {
    expect(eyeLux(sunScene(), sunAt(50, 180))).toBe(0);
    expect(eyeLux(sunScene(), sunAt(20, 0))).toBe(0);
  });

  it('is cut by an obstruction above the sun and passes its monthly transmittance', () => {
    const base = sunScene();
    const monthly = new Array<number>(12).fill(0);
    monthly[5] = 0.3;
    const scene: RoomScene = { ...base, windows: [{ ...base.windows[0]!, obstruction: { horizonAngle_deg: 25, monthlyTransmittance: monthly } }] };
    expect(eyeLux(scene, sunAt(20, 180)) / (50000 * Math.cos((20 * Math.PI) / 180))).toBeCloseTo(0.3, 6);
  });
});

describe('ground and obstruction', () => {
  const groundScene = (monthly: number[], snow: number): RoomScene => {
    const base = skyOnlyScene();
    return { ...base, ground: { monthlyReflectance: monthly, snowReflectance: snow }, windows: [{ ...base.windows[0]!, sillHeight_m: 0.2, height_m: 1.0 }] };
  };

  it('the ground seen below the horizon has luminance ρ·E_gh/π, so its view adds E_gh·ρ·F (Howell B-3)', () => {
    // Window from 1.0 m below to exactly eye height: only ground visible.
    const lux = eyeLux(groundScene(new Array<number>(12).fill(0.2), 0.65));
    expect(Math.abs(lux / (0.2 * EDH * 2 * cornerFormFactor(1, 1, 2)) - 1)).toBeLessThan(1e-3);
  });

  it('snow switches the ground reflectance (0.2 → 0.65, pvlib SURFACE_ALBEDOS)', () => {
    const scene = groundScene(new Array<number>(12).fill(0.2), 0.65);
    const c = constantConditions(1, { zenith_deg: 50, azimuth_deg: 180, ebn_lx: 0, edh_lx: EDH, skyType: 5, snow: true });
    expect(eyeLux(scene, c) / eyeLux(scene)).toBeCloseTo(0.65 / 0.2, 9);
  });

  it('an obstruction above the whole view passes τ + (1 − τ)·f of the hidden sky', () => {
    const base = skyOnlyScene();
    const monthly = new Array<number>(12).fill(0.5);
    const scene: RoomScene = { ...base, windows: [{ ...base.windows[0]!, obstruction: { horizonAngle_deg: 80, monthlyTransmittance: monthly, luminanceFraction: 0.2 } }] };
    expect(eyeLux(scene) / eyeLux(base)).toBeCloseTo(0.5 + 0.5 * 0.2, 9);
  });
});

describe('internally reflected component (split flux, EnergyPlus Engineering Reference)', () => {
  it('adds A_w·(Φ_FW ρ_FW + Φ_CW ρ_CW)/(A(1−ρ̄)) with the window-plane fluxes of a uniform sky (π·L/2 from the sky, analytic)', () => {
    const base = skyOnlyScene();
    const rho = 0.5;
    const room = { width_m: 4, depth_m: 5, height_m: 3, reflectance: { ceiling: rho, walls: rho, floor: rho } };
    const withRefl: RoomScene = { ...base, room };
    const direct = eyeLux(base);
    const total = eyeLux(withRefl);
    const area = 2 * (4 * 5) + 2 * (4 + 5) * 3;
    // Unglazed opening, uniform sky of luminance E_dh/π, no ground light: Φ_FW per unit window area = E_dh/2.
    const expected = (2 * 1 * (EDH / 2) * rho) / (area * (1 - rho));
    expect((total - direct) / expected).toBeCloseTo(1, 3);
  });
});
