/**
 * Light at the eye, minute by minute, for one person in one room (and outdoors), kept apart per
 * source: daylight through the windows, electric lighting, screens, outdoor daylight.
 *
 * Daylight per window and minute (methods in docs/methods/light-at-eye.md):
 *   sky     E_dh · (c_open + c_obstructed · F_obs(month))      c: Tregenza daylight coefficients
 *           dotted with the CIE-sky patch luminances per lux of E_dh, evaluated exactly every
 *           `skyStep_min` minutes and interpolated linearly in between
 *   ground  L_g · c_ground,  L_g = ρ(month, snow) · E_gh / π,  E_gh = E_dh + E_bn cos Z
 *   sun     E_bn · τ(θ)/τ(0) · max(0, ŝ·ĝ) when the ray eye→sun passes the aperture (× obstruction transmittance below its horizon angle)
 *   inter-reflected (split flux)  A_w (Φ_FW ρ_FW + Φ_CW ρ_CW)/(A (1 − ρ̄)) per unit window area
 *   lowered/closed shade: diffuser of luminance τ_shade · E_transmitted / π, flux split half up, half down
 *   F_obs = τ_obs + (1 − τ_obs) · f_lum  (hidden sky seen through the obstruction plus its own luminance)
 * Spectral: glazing τ(λ), eyewear τ(λ) and the daylight spectrum (CIE D at the minute's CCT) enter
 * through per-source responses (source-response.ts).
 */
import { addResponse2, emptyQuantityColumns, type EyeLightColumns } from './eye-light-columns.js';
import { luminaireLevel } from './electric-lighting.js';
import { relativeAngularTransmittanceFast } from './glazing.js';
import { BLIND_OPEN, nextBlindState, type BlindMemory } from './blinds.js';
import type { PreparedRoom } from './prepared-room.js';
import { SceneInputError } from './scene-input-error.js';
import { PLACE_OUTDOORS, PLACE_ROOM, type Occupancy, type OutdoorConditions } from './scene.js';
import { cieSkyTypeFromClearness, perezClearness } from './sky-type-choice.js';
import { skyLuminancePerDiffuseLux } from './sky-luminance.js';
import { TREGENZA_PATCH_COUNT } from './tregenza-patches.js';
import { nonZeroPatches, rayPassesAperture } from './window-coefficients.js';
import { directionFromAltAz_deg, type Vec3 } from './vector3.js';

/** Daylight efficacy used to turn E_bn into W/m² when no irradiance is given (lm/W; a quick fallback, from memory). */
export const FALLBACK_BEAM_EFFICACY_LM_W = 100;
const DEG = Math.PI / 180;

function checkConditions(c: OutdoorConditions, occ: Occupancy): number {
  const n = occ.place.length;
  const arrays: [string, ArrayLike<number> | undefined, number, number][] = [
    ['sunZenith_deg', c.sunZenith_deg, 0, 180],
    ['sunAzimuth_deg', c.sunAzimuth_deg, -360, 720],
    ['directNormal_lx', c.directNormal_lx, 0, 2e5],
    ['diffuseHorizontal_lx', c.diffuseHorizontal_lx, 0, 2e5],
    ['directNormal_W_m2', c.directNormal_W_m2, 0, 1500],
    ['daylightCct_K', c.daylightCct_K, 1000, 1e5],
    ['sunCct_K', c.sunCct_K, 1000, 1e5],
    ['skyType', c.skyType, 1, 15],
    ['perezEpsilon', c.perezEpsilon, 0.5, 100],
    ['snowOnGround', c.snowOnGround, 0, 1],
    ['month', c.month, 1, 12],
    ['outdoorEye_lx', c.outdoorEye_lx, 0, 5e5],
  ];
  for (const [name, a, lo, hi] of arrays) {
    if (a === undefined) continue;
    if (a.length !== n) throw new SceneInputError(`conditions.${name}`, `has ${a.length} samples but occupancy.place has ${n}`);
    for (let i = 0; i < n; i++) {
      const v = a[i] as number;
      if (!(v >= lo && v <= hi)) throw new SceneInputError(`conditions.${name}[${i}]`, `must lie in [${lo}, ${hi}] (got ${v})`);
    }
  }
  if (!Number.isInteger(occ.startMinuteOfDay) || occ.startMinuteOfDay < 0 || occ.startMinuteOfDay > 1439) {
    throw new SceneInputError('occupancy.startMinuteOfDay', `must be an integer 0–1439 (got ${occ.startMinuteOfDay})`);
  }
  return n;
}

function sunVector(c: OutdoorConditions, i: number): Vec3 {
  return directionFromAltAz_deg(90 - (c.sunZenith_deg[i] as number), c.sunAzimuth_deg[i] as number);
}

function skyTypeAt(c: OutdoorConditions, i: number): number {
  if (c.skyType !== undefined) return c.skyType[i] as number;
  const eps = c.perezEpsilon !== undefined ? (c.perezEpsilon[i] as number) : perezClearness(c.diffuseHorizontal_lx[i] as number, c.directNormal_lx[i] as number, Math.min(90, c.sunZenith_deg[i] as number) * DEG);
  return cieSkyTypeFromClearness(eps);
}

interface SparsePatches {
  readonly index: Int32Array;
  readonly weight: Float64Array;
}

function sparse(v: Float64Array): SparsePatches {
  const index = nonZeroPatches(v);
  return { index, weight: Float64Array.from(index, (k) => v[k] as number) };
}

function dotSparse(lum: Float64Array, c: SparsePatches): number {
  let s = 0;
  for (let j = 0; j < c.index.length; j++) s += (lum[c.index[j] as number] as number) * (c.weight[j] as number);
  return s;
}

function lerpAt(a: Float64Array, k: number, t: number): number {
  const a0 = a[k] as number;
  return t === 0 ? a0 : a0 + ((a[k + 1] as number) - a0) * t;
}

const KNOT_QUANTITIES = 6; // eyeOpen, eyeObstructed, deskOpen, deskObstructed, planeOpen, planeObstructed

/** Sky coefficients (per lux of E_dh) at the knots, per window: [window][quantity][knot]. */
function skyKnots(room: PreparedRoom, c: OutdoorConditions, n: number): { step: number; values: Float64Array[][] } {
  const step = room.skyStep_min;
  const knots = Math.ceil((n - 1) / step) + 1;
  const values = room.windows.map(() => Array.from({ length: KNOT_QUANTITIES }, () => new Float64Array(knots)));
  const lum = new Float64Array(TREGENZA_PATCH_COUNT);
  const vectors = room.windows.map((w) => {
    const wc = w.coefficients;
    return [wc.eye.skyOpen, wc.eye.skyObstructed, wc.desk.skyOpen, wc.desk.skyObstructed, wc.planeSkyOpen, wc.planeSkyObstructed].map(sparse);
  });
  for (let k = 0; k < knots; k++) {
    const i = Math.min(k * step, n - 1);
    // Nothing to scale at night: skip knots when the sky is dark here and at both neighbours.
    const prev = Math.max(0, i - step);
    const next = Math.min(n - 1, i + step);
    if (!((c.diffuseHorizontal_lx[i] as number) > 0 || (c.diffuseHorizontal_lx[prev] as number) > 0 || (c.diffuseHorizontal_lx[next] as number) > 0)) continue;
    skyLuminancePerDiffuseLux(skyTypeAt(c, i), sunVector(c, i), lum);
    for (let wi = 0; wi < vectors.length; wi++) {
      const q = values[wi] as Float64Array[];
      const v = vectors[wi] as SparsePatches[];
      for (let j = 0; j < KNOT_QUANTITIES; j++) (q[j] as Float64Array)[k] = dotSparse(lum, v[j] as SparsePatches);
    }
  }
  return { step, values };
}

/**
 * Evaluate the light at the eye for every minute. `room` comes from prepareRoom(scene); the
 * conditions and occupancy arrays have one sample per minute. Throws SceneInputError naming the
 * first bad sample.
 */
export function evaluateEyeLight(room: PreparedRoom, c: OutdoorConditions, occ: Occupancy): EyeLightColumns {
  const n = checkConditions(c, occ);
  const daylight = emptyQuantityColumns(n);
  const electric = emptyQuantityColumns(n);
  const screen = emptyQuantityColumns(n);
  const outdoor = emptyQuantityColumns(n);
  const total = emptyQuantityColumns(n);
  const blindState = room.windows.map(() => new Uint8Array(n));
  const memories: BlindMemory[] = room.windows.map(() => ({ state: BLIND_OPEN, clearMinutes: 0 }));
  const knots = n > 0 ? skyKnots(room, c, n) : { step: 1, values: [] };
  const g = room.windows[0]?.coefficients.eye.normal;
  let wasInRoom = false;
  let lastDay = -1;
  let arrivedToday = false;

  for (let i = 0; i < n; i++) {
    const absMinute = occ.startMinuteOfDay + i;
    const minuteOfDay = absMinute % 1440;
    const day = Math.floor(absMinute / 1440);
    if (day !== lastDay) {
      lastDay = day;
      arrivedToday = false;
    }
    const place = occ.place[i] as number;
    const worn = (room.eyewearWorn[minuteOfDay] as number) === 1 ? 1 : 0;
    const cct = c.daylightCct_K !== undefined ? (c.daylightCct_K[i] as number) : 6504;
    if (place === PLACE_OUTDOORS && c.outdoorEye_lx !== undefined) addResponse2(outdoor, total, i, c.outdoorEye_lx[i] as number, room.outdoorDaylight[worn].at(cct));
    const inRoom = place === PLACE_ROOM;
    const arrival = inRoom && !wasInRoom && !arrivedToday;
    if (arrival) arrivedToday = true;
    wasInRoom = inRoom;

    // Daylight through each window (blinds evolve even when nobody is in the room).
    const edh = c.diffuseHorizontal_lx[i] as number;
    const ebn = c.directNormal_lx[i] as number;
    let daylightDesk = 0;
    if (edh <= 0 && ebn <= 0) {
      // Dark outside: only the blinds' memory moves on.
      for (let wi = 0; wi < room.windows.length; wi++) {
        (blindState[wi] as Uint8Array)[i] = nextBlindState((room.windows[wi] as (typeof room.windows)[number]).shading, memories[wi] as BlindMemory, minuteOfDay, 0, arrival);
      }
    } else {
      const bnW = c.directNormal_W_m2 !== undefined ? (c.directNormal_W_m2[i] as number) : ebn / FALLBACK_BEAM_EFFICACY_LM_W;
      const sunZen = (c.sunZenith_deg[i] as number) * DEG;
      const sunAz = (c.sunAzimuth_deg[i] as number) * DEG;
      const sinZen = Math.sin(sunZen);
      const sx = Math.sin(sunAz) * sinZen;
      const sy = Math.cos(sunAz) * sinZen;
      const sz = Math.cos(sunZen);
      const month = (c.month[i] as number) - 1;
      const rhoGround = c.snowOnGround !== undefined && (c.snowOnGround[i] as number) === 1 ? room.groundSnow : (room.groundMonthly[month] as number);
      const egh = edh + ebn * Math.max(0, sz);
      const groundLum = (rhoGround * egh) / Math.PI;
      const k = Math.floor(i / knots.step);
      const t = (i - k * knots.step) / knots.step;
      for (let wi = 0; wi < room.windows.length; wi++) {
        const w = room.windows[wi] as (typeof room.windows)[number];
        const wc = w.coefficients;
        const win = wc.window;
        const q = knots.values[wi] as Float64Array[];
        const obsT = win.obstructionTransmittance[month] as number;
        const obsF = obsT + (1 - obsT) * win.obstructionLuminanceFraction;
        const sunAlt = 90 - (c.sunZenith_deg[i] as number);
        const sunF = sunAlt <= 0 || ebn <= 0 ? 0 : sunAlt < win.obstructionAngle_deg ? obsT : 1;
        const nw = win.outwardNormal;
        const cosW = sx * nw.x + sy * nw.y + sz * nw.z;
        const sunThroughGlass = sunF > 0 && cosW > 0 ? ebn * sunF * relativeAngularTransmittanceFast(cosW, win.panes) : 0;
        const planeSky = edh * (lerpAt(q[4] as Float64Array, k, t) + lerpAt(q[5] as Float64Array, k, t) * obsF);
        const planeSun = sunThroughGlass * Math.max(0, cosW);
        const planeGround = groundLum * wc.planeGround;
        const sunDesk = sunThroughGlass > 0 && rayPassesAperture(wc.desk, sx, sy, sz, nw) ? sunThroughGlass * Math.max(0, sz) : 0;
        const resp = w.daylight[worn].at(cct);
        // Photopic glazing transmittance for this daylight spectrum (no eyewear: the desk is not behind the glasses).
        const glassLux = w.daylight[0].at(cct)[0] as number;
        const sunDesk_W_m2 = ebn > 0 ? (sunDesk / ebn) * bnW * glassLux : 0;
        const state = nextBlindState(w.shading, memories[wi] as BlindMemory, minuteOfDay, sunDesk_W_m2, arrival);
        (blindState[wi] as Uint8Array)[i] = state;
        let eye: number;
        let desk: number;
        if (state === BLIND_OPEN) {
          const reflected = w.reflectedPerFlux * ((planeSky + planeSun) * room.rhoLower + planeGround * room.rhoUpper);
          const sunEye = sunThroughGlass > 0 && g !== undefined && rayPassesAperture(wc.eye, sx, sy, sz, nw) ? sunThroughGlass * Math.max(0, sx * g.x + sy * g.y + sz * g.z) : 0;
          eye = edh * (lerpAt(q[0] as Float64Array, k, t) + lerpAt(q[1] as Float64Array, k, t) * obsF) + groundLum * wc.eye.ground + reflected;
          // Direct sun carries its own spectrum when the outdoor side gives a sun CCT.
          if (inRoom && sunEye > 0) addResponse2(daylight, total, i, sunEye, c.sunCct_K !== undefined ? w.daylight[worn].at(c.sunCct_K[i] as number) : resp);
          desk = edh * (lerpAt(q[2] as Float64Array, k, t) + lerpAt(q[3] as Float64Array, k, t) * obsF) + groundLum * wc.desk.ground + sunDesk + reflected;
        } else {
          const transmitted = (w.shading.transmittance[state] as number) * (planeSky + planeSun + planeGround);
          const reflected = w.reflectedPerFlux * transmitted * 0.5 * (room.rhoLower + room.rhoUpper);
          eye = (transmitted / Math.PI) * wc.eye.windowView + reflected;
          desk = (transmitted / Math.PI) * wc.desk.windowView + reflected;
        }
        daylightDesk += desk * glassLux;
        if (inRoom && eye > 0) addResponse2(daylight, total, i, eye, resp);
      }
    }
    if (!inRoom) continue;

    for (const l of room.luminaires) {
      const level = luminaireLevel(l, minuteOfDay, daylightDesk);
      if (level <= 0) continue;
      const lux = level * l.eyeFull_lx;
      const r = l.responses[worn];
      if (r.length === 1) addResponse2(electric, total, i, lux, r[0] as Float64Array);
      else {
        const f = l.coolShare[minuteOfDay] as number;
        addResponse2(electric, total, i, lux * (1 - f), r[0] as Float64Array);
        addResponse2(electric, total, i, lux * f, r[1] as Float64Array);
      }
    }
    for (const sc of room.screens) {
      if ((sc.on[minuteOfDay] as number) !== 1) continue;
      const night = (sc.night[minuteOfDay] as number) === 1;
      addResponse2(screen, total, i, night ? sc.nightEye_lx : sc.dayEye_lx, sc.responses[worn][night ? 1 : 0]);
    }
  }
  return { minutes: n, startMinuteOfDay: occ.startMinuteOfDay, bySource: { daylight, electric, screen, outdoor }, total, blindState };
}
