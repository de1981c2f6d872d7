/**
 * Light at the eye, minute by minute, for one persona under one strategy variant, kept apart
 * per source (methods: docs/methods/pipeline.md §2):
 *   daylight  through room windows (model/eye evaluateEyeLight, windows only) or vehicle windows
 *   electric  room luminaires (scheduled output × stated eye illuminance), vehicle cabin light
 *   screen    the screen in use (model/eye screenEyeIlluminance_lx of its luminance and size)
 *   outdoor   daylight outdoors (model/daylight outdoorEyeSeries) and street lighting after dark
 *   measured  a light log replacing the model where the timeline says so
 * Photopic lux and melanopic EDI (lx). Melanopic EDI = lux × melanopic DER of the source
 * spectrum × lens-age factor (CIE S 026 age correction relative to 32 years, applied per source
 * through its spectrum) × eyewear melanopic transmittance; photopic lux × eyewear photopic
 * transmittance.
 * Behind closed eyelids (the sleeper's eye): each source's melanopic EDI × the eyelid's melanopic
 * transmittance for that source's spectrum as it reaches this observer's eye (spectrum × lens ×
 * eyelid, model/photometry/eyelid-transmittance.ts; ≈ 0.3 %). A light log's closed-eye value
 * takes the ratio of the modelled light at that minute (daylight's where the model has none).
 */
import { evaluateEyeLight, PLACE_ELSEWHERE, PLACE_ROOM, prepareRoom, screenEyeIlluminance_lx, type OutdoorConditions, type PreparedRoom } from '../../model/eye/index.js';
import type { MinuteLightSeries } from '../lightlog/log-to-minutes.js';

import type { Luminaire, Persona, Place, Room, Scenario, Screen } from '../schema/scenario-types.js';
import { clockWindowHolds, exposureContext } from '../timeline/exposure-context.js';
import type { ExposureTimeline } from '../timeline/exposure-types.js';
import type { LocalClock } from './local-clock.js';
import { luminaireWeek } from './luminaire-levels.js';
import type { OutdoorLight } from './outdoor-light.js';
import { defaultGazeAzimuth_deg, roomScene, type NightBlinds } from './room-scene.js';
import { daylightResponse, electricResponse, screenResponse } from './spectra.js';

export const LIGHT_SOURCES = ['daylight', 'electric', 'screen', 'outdoor', 'measured'] as const;
export type LightSource = (typeof LIGHT_SOURCES)[number];

export interface EyeSeries {
  readonly total_min: number;
  readonly photopic_lx: Float64Array;
  /** Melanopic EDI at the open eye (lx), in total and per source. */
  readonly mel_edi_lx: Float64Array;
  readonly melBySource: Readonly<Record<LightSource, Float64Array>>;
  /** Melanopic EDI behind closed eyelids (lx), in total and per source: what reaches the eye while asleep. */
  readonly melClosed_edi_lx: Float64Array;
  readonly melClosedBySource: Readonly<Record<LightSource, Float64Array>>;
}

/** Share of the open-field outdoor eye illuminance under partial and full shade (assumed planning values, docs/methods/pipeline.md). */
export const OUTDOOR_SHADE_FACTOR = { open: 1, partial: 0.5, full: 0.2 } as const;
/** Share of the outdoor eye illuminance reaching a passenger's eye before the window transmittance (roof and body hide part of sky and ground; assumed). */
export const VEHICLE_VIEW_FACTOR = 0.6;
/** Street and cabin lighting are on while the sun is below this elevation (deg; civil-twilight start, common practice). */
export const ARTIFICIAL_OUTDOOR_BELOW_DEG = -0.833;
/** CCT of street and cabin lighting (K; common LED practice). */
export const STREET_LIGHT_CCT_K = 4000;

/** Caches shared by the timelines of one run (and prepared rooms across runs). */
export interface EyeCaches {
  /** Identifies the outdoor conditions of the run (site, weather, period) for the room cache. */
  readonly weatherKey: string;
  /** Per-minute daylight melanopic DER × lens factor, lens factor and eyelid factor, by observer age. */
  readonly daylightFactors: Map<number, { mel: Float32Array; lens: Float32Array; lid: Float32Array }>;
}

function daylightFactors(outdoor: OutdoorLight, age: number, caches: EyeCaches): { mel: Float32Array; lens: Float32Array; lid: Float32Array } {
  let f = caches.daylightFactors.get(age);
  if (f === undefined) {
    const cct = outdoor.series.skyCct_K;
    const mel = new Float32Array(cct.length);
    const lens = new Float32Array(cct.length);
    const lid = new Float32Array(cct.length);
    let last = Number.NaN;
    let r = daylightResponse(6504, age);
    for (let m = 0; m < cct.length; m++) {
      const c = cct[m] ?? 6504;
      if (c !== last) {
        r = daylightResponse(c, age);
        last = c;
      }
      mel[m] = r.melDer * r.lensFactor;
      lens[m] = r.lensFactor;
      lid[m] = r.eyelidFactor;
    }
    f = { mel, lens, lid };
    caches.daylightFactors.set(age, f);
  }
  return f;
}

const preparedRooms = new Map<string, PreparedRoom>();
function prepared(key: string, build: () => PreparedRoom): PreparedRoom {
  let p = preparedRooms.get(key);
  if (p === undefined) {
    p = build();
    if (preparedRooms.size > 64) preparedRooms.clear();
    preparedRooms.set(key, p);
  }
  return p;
}

function subConditions(c: OutdoorConditions, a: number, b: number): OutdoorConditions {
  const s = <T extends Float64Array | Uint8Array>(x: T | undefined): T | undefined => (x === undefined ? undefined : (x.subarray(a, b) as T));
  return {
    sunZenith_deg: c.sunZenith_deg.subarray(a, b),
    sunAzimuth_deg: c.sunAzimuth_deg.subarray(a, b),
    directNormal_lx: c.directNormal_lx.subarray(a, b),
    diffuseHorizontal_lx: c.diffuseHorizontal_lx.subarray(a, b),
    month: c.month.subarray(a, b),
    ...(c.directNormal_W_m2 !== undefined ? { directNormal_W_m2: s(c.directNormal_W_m2) as Float64Array } : {}),
    ...(c.daylightCct_K !== undefined ? { daylightCct_K: s(c.daylightCct_K) as Float64Array } : {}),
    ...(c.sunCct_K !== undefined ? { sunCct_K: s(c.sunCct_K) as Float64Array } : {}),
    ...(c.perezEpsilon !== undefined ? { perezEpsilon: s(c.perezEpsilon) as Float64Array } : {}),
    ...(c.snowOnGround !== undefined ? { snowOnGround: s(c.snowOnGround) as Uint8Array } : {}),
  };
}

/** Warm-up before the first occupied minute of a day for blinds with a memory (auto-solar), min. */
const BLIND_WARMUP_MIN = 60;

/** Room daylight kept across runs (the app reruns after each edit); keyed by scene, weather and occupancy. */
const roomDaylightCache = new Map<string, { photopic: Float64Array; mel: Float64Array }>();
const ROOM_DAYLIGHT_CACHE_LIMIT = 96;

/** Forget cached rooms and daylight (benchmarks measure runs without them). */
export function clearEyeCaches(): void {
  roomDaylightCache.clear();
  preparedRooms.clear();
}

/**
 * Daylight at the eye in one room with one gaze at the minutes marked in `occupied` (reference
 * observer, no eyewear). Evaluated per local day from the first to the last occupied minute
 * (from BLIND_WARMUP_MIN earlier for automatic blinds): the first minute of each span is the
 * day's arrival, which is what the manual blinds rule needs, and the other rules keep no memory.
 */
function roomDaylight(room: Room, gaze_deg: number, occupied: Uint8Array, scenario: Scenario, outdoor: OutdoorLight, clock: LocalClock, night: NightBlinds, caches: EyeCaches): { photopic: Float64Array; mel: Float64Array } {
  const sceneKey = JSON.stringify([room.width_m, room.depth_m, room.height_m, room.reflectances, room.windows, room.blinds, room.viewingPosition ?? null, Math.round(gaze_deg), scenario.site.ground, night]);
  const edges: number[] = [];
  for (let m = 0; m < occupied.length; m++) if ((occupied[m] ?? 0) !== (m === 0 ? 0 : (occupied[m - 1] ?? 0))) edges.push(m);
  const key = `${caches.weatherKey}|${sceneKey}|${edges.join(',')}`;
  const hit = roomDaylightCache.get(key);
  if (hit !== undefined) return hit;
  const n = clock.total_min;
  const prep = prepared(sceneKey, () => prepareRoom(roomScene(room, gaze_deg, night, { reflectance: scenario.site.ground.reflectance, snowReflectance: scenario.site.ground.snow.reflectance })));
  const photopic = new Float64Array(n);
  const mel = new Float64Array(n);
  const place = new Uint8Array(n);
  for (let m = 0; m < n; m++) place[m] = (occupied[m] ?? 0) === 1 ? PLACE_ROOM : PLACE_ELSEWHERE;
  const warmup = room.blinds.rule === 'auto-solar' ? BLIND_WARMUP_MIN : 0;
  const dhi = outdoor.conditions.diffuseHorizontal_lx;
  for (const ch of clock.chunks) {
    // From the day's first occupied minute (its arrival) to the last occupied minute with daylight.
    let first = -1;
    let last = -1;
    for (let m = ch.start; m < ch.end; m++) {
      if (occupied[m] !== 1) continue;
      if (first < 0) first = m;
      if ((dhi[m] ?? 0) > 0) last = m;
    }
    if (last < 0) continue;
    const a = Math.max(ch.start, first - warmup);
    const b = last + 1;
    const cols = evaluateEyeLight(prep, subConditions(outdoor.conditions, a, b), { startMinuteOfDay: clock.minuteOfDay[a] ?? 0, place: place.subarray(a, b) });
    photopic.set(cols.bySource.daylight.photopic_lx, a);
    mel.set(cols.bySource.daylight.mel_edi_lx, a);
  }
  const out = { photopic, mel };
  if (roomDaylightCache.size >= ROOM_DAYLIGHT_CACHE_LIMIT) roomDaylightCache.delete(roomDaylightCache.keys().next().value ?? '');
  roomDaylightCache.set(key, out);
  return out;
}

const screenLuxCache = new Map<string, number>();
function screenEye_lx(s: Screen, brightness: number): number {
  const key = `${s.luminance_cd_m2 * brightness}|${s.width_m}|${s.height_m}|${s.distance_m}`;
  let v = screenLuxCache.get(key);
  if (v === undefined) {
    v = screenEyeIlluminance_lx(s.luminance_cd_m2 * brightness, s.width_m, s.height_m, s.distance_m);
    if (screenLuxCache.size < 1024) screenLuxCache.set(key, v);
  }
  return v;
}

const nightCache = new WeakMap<Screen, Uint8Array>();
/** 1 at the minutes of the day when the screen's night colour setting is on. */
function nightMinutes(s: Screen): Uint8Array {
  let a = nightCache.get(s);
  if (a === undefined) {
    a = new Uint8Array(1440);
    const nm = s.nightMode;
    if (nm !== undefined) for (let m = 0; m < 1440; m++) a[m] = clockWindowHolds(nm.start, nm.end, m) ? 1 : 0;
    nightCache.set(s, a);
  }
  return a;
}

export interface EyeSeriesInput {
  readonly variant: Scenario;
  readonly persona: Persona;
  readonly timeline: ExposureTimeline;
  readonly clock: LocalClock;
  readonly outdoor: OutdoorLight;
  readonly night: NightBlinds;
  readonly logs: ReadonlyMap<string, MinuteLightSeries>;
  readonly caches: EyeCaches;
}

export function eyeSeries(inp: EyeSeriesInput): EyeSeries {
  const { variant, persona, timeline, clock, outdoor } = inp;
  const n = timeline.total_min;
  const age = persona.age_y;
  const melBySource = { daylight: new Float64Array(n), electric: new Float64Array(n), screen: new Float64Array(n), outdoor: new Float64Array(n), measured: new Float64Array(n) };
  const melClosedBySource = { daylight: new Float64Array(n), electric: new Float64Array(n), screen: new Float64Array(n), outdoor: new Float64Array(n), measured: new Float64Array(n) };
  const photopic = new Float64Array(n);
  const places = new Map<string, Place>(variant.places.map((p) => [p.id, p]));
  const slices = timeline.slices;
  const sunElevation = outdoor.series.sun.elevation_deg;

  // Daylight in rooms: one evaluation per room and gaze direction.
  const groups = new Map<string, { room: Room; gaze: number; occupied: Uint8Array; index: number }>();
  const roomAt = new Int16Array(n).fill(-1);
  for (const s of slices) {
    const p = places.get(s.placeId);
    if (p === undefined || p.kind !== 'room' || p.windows.length === 0) continue;
    const gaze = s.gazeAzimuth_deg ?? defaultGazeAzimuth_deg(p, s.gaze);
    const key = `${p.id}|${Math.round(gaze)}`;
    let g = groups.get(key);
    if (g === undefined) {
      g = { room: p, gaze, occupied: new Uint8Array(n), index: groups.size };
      groups.set(key, g);
    }
    g.occupied.fill(1, s.start_min, s.end_min);
    roomAt.fill(g.index, s.start_min, s.end_min);
  }
  const roomDay = [...groups.values()].map((g) => roomDaylight(g.room, g.gaze, g.occupied, variant, outdoor, clock, inp.night, inp.caches));

  const streetResp = electricResponse({ kind: 'cct', cct_K: STREET_LIGHT_CCT_K }, undefined, age);
  const dayFactor = daylightFactors(outdoor, age, inp.caches);
  // Melanopic EDI per photopic lux (DER × lens factor) and eyelid factor of each luminaire at each target CCT, and of each screen by day / night.
  const lumMel = new Map<Luminaire, Map<number, { mel: number; lid: number }>>();
  const lumMelAt = (l: Luminaire, cct: number): { mel: number; lid: number } => {
    let m = lumMel.get(l);
    if (m === undefined) {
      m = new Map();
      lumMel.set(l, m);
    }
    let v = m.get(cct);
    if (v === undefined) {
      const r = electricResponse(l.spectrum, Number.isFinite(cct) ? cct : undefined, age);
      v = { mel: r.melDer * r.lensFactor, lid: r.eyelidFactor };
      m.set(cct, v);
    }
    return v;
  };
  const scrMel = new Map<Screen, [{ mel: number; lid: number }, { mel: number; lid: number }]>();
  const scrMelAt = (sc: Screen, night: boolean): { mel: number; lid: number } => {
    let v = scrMel.get(sc);
    if (v === undefined) {
      const d = screenResponse(sc.spectrum, undefined, age);
      const nr = sc.nightMode !== undefined ? screenResponse(sc.spectrum, sc.nightMode.cct_K, age) : d;
      v = [
        { mel: d.melDer * d.lensFactor, lid: d.eyelidFactor },
        { mel: nr.melDer * nr.lensFactor, lid: nr.eyelidFactor },
      ];
      scrMel.set(sc, v);
    }
    return night ? v[1] : v[0];
  };
  const lumWeeks = new Map<Luminaire, ReturnType<typeof luminaireWeek>>();
  const weekOf = (l: Luminaire) => {
    let w = lumWeeks.get(l);
    if (w === undefined) {
      w = luminaireWeek(l);
      lumWeeks.set(l, w);
    }
    return w;
  };
  const { daylight: melDaylight, electric: melElectric, screen: melScreen, outdoor: melOutdoor } = melBySource;
  const { daylight: lidDaylight, electric: lidElectric, screen: lidScreen, outdoor: lidOutdoor } = melClosedBySource;
  const streetMel = streetResp.melDer * streetResp.lensFactor;
  const streetLid = streetResp.eyelidFactor;
  for (const s of slices) {
    const ctx = exposureContext(variant, persona, s, clock.minuteOfDay[s.start_min] ?? 0);
    const place = ctx.place;
    const pT = ctx.eyewear?.photopicTransmittance ?? 1;
    const mT = ctx.eyewear?.melanopicTransmittance ?? 1;
    const scr = ctx.screen;
    const scrLux = scr === null ? 0 : screenEye_lx(scr, s.screenBrightness);
    const scrNight = scr === null ? undefined : nightMinutes(scr);
    const scrMelDay = scr === null ? { mel: 0, lid: 0 } : scrMelAt(scr, false);
    const scrMelNight = scr === null ? { mel: 0, lid: 0 } : scrMelAt(scr, true);
    const lums = place.kind === 'room' ? place.luminaires.map((l) => ({ l, w: weekOf(l) })) : [];
    const nL = lums.length;
    // Level and CCT arrays of each luminaire for the current day, and the last CCT's melanopic factor.
    const levelToday: Float32Array[] = new Array<Float32Array>(nL);
    const cctToday: Float32Array[] = new Array<Float32Array>(nL);
    const lastCct = new Float64Array(nL).fill(-1);
    const lastMel = new Float64Array(nL);
    const lastLid = new Float64Array(nL);
    let today = -1;
    const log = s.measuredLogId !== null ? inp.logs.get(s.measuredLogId) : undefined;
    for (let m = s.start_min; m < s.end_min; m++) {
      const minuteOfDay = clock.minuteOfDay[m] ?? 0;
      const dayMel = dayFactor.mel[m] ?? 1;
      const dayLid = dayFactor.lid[m] ?? 0;
      let pDay = 0;
      let mDay = 0;
      let pEl = 0;
      let mEl = 0;
      let cEl = 0;
      let pOut = 0;
      let mOut = 0;
      let cOut = 0;
      const dark = (sunElevation[m] ?? 0) < ARTIFICIAL_OUTDOOR_BELOW_DEG;
      if (place.kind === 'room') {
        const k = roomAt[m] ?? -1;
        const rd = k >= 0 ? roomDay[k] : undefined;
        if (rd !== undefined) {
          pDay = rd.photopic[m] ?? 0;
          mDay = (rd.mel[m] ?? 0) * (dayFactor.lens[m] ?? 1);
        }
        if (nL > 0) {
          const d = clock.dayIndex[m] ?? 0;
          if (d !== today) {
            today = d;
            const weekday = timeline.days[d]?.weekday ?? 'mon';
            for (let j = 0; j < nL; j++) {
              const w = (lums[j] as (typeof lums)[number]).w;
              levelToday[j] = w.level[weekday];
              cctToday[j] = w.cct_K[weekday];
            }
          }
          for (let j = 0; j < nL; j++) {
            const level = (levelToday[j] as Float32Array)[minuteOfDay] ?? 0;
            if (level <= 0) continue;
            const l = (lums[j] as (typeof lums)[number]).l;
            const lux = level * l.eyeIlluminance_lx;
            const cct = (cctToday[j] as Float32Array)[minuteOfDay] ?? Number.NaN;
            if (cct !== lastCct[j]) {
              lastCct[j] = cct;
              const r = lumMelAt(l, cct);
              lastMel[j] = r.mel;
              lastLid[j] = r.lid;
            }
            const mel = lux * (lastMel[j] as number);
            pEl += lux;
            mEl += mel;
            cEl += mel * (lastLid[j] as number);
          }
        }
      } else if (place.kind === 'vehicle') {
        const lux = (outdoor.outdoorEye_lx[m] ?? 0) * VEHICLE_VIEW_FACTOR * place.windowTransmittance;
        pDay = lux;
        mDay = lux * dayMel;
        if (dark && place.interiorIlluminance_lx > 0) {
          pEl = place.interiorIlluminance_lx;
          mEl = pEl * streetMel;
          cEl = mEl * streetLid;
        }
      } else {
        const lux = (outdoor.outdoorEye_lx[m] ?? 0) * OUTDOOR_SHADE_FACTOR[place.shade];
        pOut = lux;
        mOut = lux * dayMel;
        cOut = mOut * dayLid;
        if (dark) {
          pOut += place.streetLighting_lx;
          mOut += place.streetLighting_lx * streetMel;
          cOut += place.streetLighting_lx * streetMel * streetLid;
        }
      }
      const scrR = scrNight !== undefined && scrNight[minuteOfDay] === 1 ? scrMelNight : scrMelDay;
      const mScr = scrNight === undefined ? 0 : scrLux * scrR.mel;
      let p = (pDay + pEl + pOut + scrLux) * pT;
      melDaylight[m] = mDay * mT;
      melElectric[m] = mEl * mT;
      melScreen[m] = mScr * mT;
      melOutdoor[m] = mOut * mT;
      lidDaylight[m] = mDay * dayLid * mT;
      lidElectric[m] = cEl * mT;
      lidScreen[m] = mScr * scrR.lid * mT;
      lidOutdoor[m] = cOut * mT;
      if (log !== undefined && log.measured[m] === 1) {
        const modelMel = (mDay + mEl + mOut + mScr) * mT;
        const modelClosed = (lidDaylight[m] ?? 0) + (lidElectric[m] ?? 0) + (lidScreen[m] ?? 0) + (lidOutdoor[m] ?? 0);
        const ratio = p > 0 ? modelMel / p : 1;
        const lux = log.photopic_lx[m] ?? Number.NaN;
        const melLog = log.melanopicEdi_lx[m] ?? Number.NaN;
        const mel = Number.isFinite(melLog) ? melLog : Number.isFinite(lux) ? lux * ratio : 0;
        p = Number.isFinite(lux) ? lux : ratio > 0 ? mel / ratio : mel;
        melDaylight[m] = 0;
        melElectric[m] = 0;
        melScreen[m] = 0;
        melOutdoor[m] = 0;
        melBySource.measured[m] = Math.max(0, mel);
        lidDaylight[m] = 0;
        lidElectric[m] = 0;
        lidScreen[m] = 0;
        lidOutdoor[m] = 0;
        melClosedBySource.measured[m] = Math.max(0, mel) * (modelMel > 0 ? modelClosed / modelMel : dayLid);
      }
      photopic[m] = p;
    }
  }
  const sum = (by: Readonly<Record<LightSource, Float64Array>>): Float64Array => {
    const total = new Float64Array(n);
    for (let m = 0; m < n; m++) total[m] = (by.daylight[m] ?? 0) + (by.electric[m] ?? 0) + (by.screen[m] ?? 0) + (by.outdoor[m] ?? 0) + (by.measured[m] ?? 0);
    return total;
  };
  return { total_min: n, photopic_lx: photopic, mel_edi_lx: sum(melBySource), melBySource, melClosed_edi_lx: sum(melClosedBySource), melClosedBySource };
}
