/** Invented test scenes for the light-at-the-eye model (our own numbers, not from any building). */
import { spectrum, type Spectrum } from '../../model/photometry/spectrum.js';
import { GRID_LENGTH, gridWavelength_nm } from '../../model/photometry/wavelength-grid.js';
import type { OutdoorConditions, Occupancy, RoomScene } from '../../model/eye/scene.js';

/** A south-facing window 2 m wide, sill at eye height, 1 m tall, eye 2 m from the wall, facing it. */
export function skyOnlyScene(overrides: Partial<RoomScene> = {}): RoomScene {
  return {
    room: { width_m: 4, depth_m: 5, height_m: 3, reflectance: { ceiling: 0, walls: 0, floor: 0 } },
    eyeHeight_m: 1.2,
    gaze: { azimuth_deg: 180 },
    windows: [
      {
        name: 'south',
        facadeAzimuth_deg: 180,
        width_m: 2,
        height_m: 1,
        sillHeight_m: 1.2,
        eye: { distanceToWall_m: 2, windowOffset_m: 0 },
        glazing: { visibleTransmittance: 1, panes: 0 },
      },
    ],
    ground: { monthlyReflectance: new Array<number>(12).fill(0), snowReflectance: 0 },
    ...overrides,
  };
}

/** One-sample (or n-sample) constant conditions. */
export function constantConditions(n: number, c: { zenith_deg: number; azimuth_deg: number; ebn_lx: number; edh_lx: number; skyType?: number; month?: number; snow?: boolean; cct_K?: number }): OutdoorConditions {
  return {
    sunZenith_deg: new Float64Array(n).fill(c.zenith_deg),
    sunAzimuth_deg: new Float64Array(n).fill(c.azimuth_deg),
    directNormal_lx: new Float64Array(n).fill(c.ebn_lx),
    diffuseHorizontal_lx: new Float64Array(n).fill(c.edh_lx),
    skyType: new Uint8Array(n).fill(c.skyType ?? 5),
    month: new Uint8Array(n).fill(c.month ?? 6),
    snowOnGround: new Uint8Array(n).fill(c.snow === true ? 1 : 0),
    daylightCct_K: new Float64Array(n).fill(c.cct_K ?? 6504),
  };
}

export function inRoom(n: number, startMinuteOfDay = 720): Occupancy {
  return { startMinuteOfDay, place: new Uint8Array(n) };
}

/** A smooth invented white-LED-like spectrum: blue peak at `blue_nm` plus a broad phosphor band. */
export function ledLikeSpectrum(blueWeight: number, phosphorPeak_nm = 590): Spectrum {
  const v = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) {
    const wl = gridWavelength_nm(i);
    v[i] = blueWeight * Math.exp(-(((wl - 450) / 12) ** 2)) + Math.exp(-(((wl - phosphorPeak_nm) / 70) ** 2));
  }
  return spectrum(v, false);
}
