// A minimal new scenario that passes the format's checks: one office room, one person with a
// plain working week. Invented values, meant to be edited.
import type { ScenarioInput, SegmentInput } from './scenario-types.js';

const workday: SegmentInput[] = [
  { start: '07:00', end: '08:00', place: 'home', activity: 'meal' },
  { start: '08:00', end: '12:30', place: 'office', activity: 'work', gaze: 'screen' },
  { start: '12:30', end: '13:00', place: 'office', activity: 'meal' },
  { start: '13:00', end: '17:00', place: 'office', activity: 'work', gaze: 'screen' },
  { start: '17:00', end: '23:00', place: 'home', activity: 'leisure' },
  { start: '23:00', end: '07:00', place: 'home', activity: 'sleep', posture: 'lying' },
];
const restday: SegmentInput[] = [
  { start: '08:00', end: '23:00', place: 'home', activity: 'leisure' },
  { start: '23:00', end: '08:00', place: 'home', activity: 'sleep', posture: 'lying' },
];

export function newScenario(startDate: string): ScenarioInput {
  return {
    format: 'zeitlight-scenario',
    version: 2,
    name: 'New scenario',
    run: { startDate, days: 7 },
    site: { name: 'Site', latitude_deg: 51.5, longitude_deg: 0, timeZone: 'Europe/London', weather: { kind: 'sky-model', seed: 1, seasons: [{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], clear: 0.3, intermediate: 0.35, overcast: 0.35 }] } },
    places: [
      { kind: 'room', id: 'office', name: 'Office', width_m: 6, depth_m: 5, height_m: 2.8, windows: [{ id: 'w1', facadeAzimuth_deg: 180, width_m: 3, height_m: 1.5 }], luminaires: [{ id: 'ceiling', spectrum: { kind: 'cct', cct_K: 4000 }, eyeIlluminance_lx: 250, schedule: [{ start: '07:30', end: '18:00', level: 1 }] }] },
      { kind: 'room', id: 'home', name: 'Home', width_m: 5, depth_m: 4, height_m: 2.5, windows: [{ id: 'w1', facadeAzimuth_deg: 90, width_m: 1.5, height_m: 1.3 }], luminaires: [{ id: 'lamp', spectrum: { kind: 'cct', cct_K: 2700 }, eyeIlluminance_lx: 80, schedule: [{ start: '17:00', end: '23:00', level: 1 }] }] },
    ],
    personas: [
      { id: 'person', name: 'Person 1', age_y: 40, home: 'home', templates: { workday, restday }, week: { mon: 'workday', tue: 'workday', wed: 'workday', thu: 'workday', fri: 'workday', sat: 'restday', sun: 'restday' } },
    ],
    strategies: [],
  };
}
