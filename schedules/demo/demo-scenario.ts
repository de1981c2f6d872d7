/**
 * The built-in demo scenario — invented places and people, not real ones.
 * Site: the invented town of Lindenhafen (a made-up place on the north German plain, coordinates
 * chosen for a typical mid-latitude site). Two settings, each with its own strategies:
 *  - Hollowmere General, ward "Birch": a nurse on a rotating early / late / night roster;
 *  - Fernbrook open-plan office, a 20 m deep floor lit from its south side only, a building across
 *    the street 15° above the sill: two desk workers with the same week, the same age and the same
 *    flat plan, one at a desk 2 m from the windows and one 15 m from them, deep in the plan. The
 *    floor is one room described from each desk (a room holds one seat), so the office retrofits
 *    change both and show where daylight runs short.
 * The 14 days start on Monday 23 March 2026 and cross the change to summer time on 29 March.
 * Light levels are planning values: ward and office eye illuminances about half of the desk
 * illuminance (E_v ≈ 0.5 × E_h, common practice).
 */
import type { ScenarioInput, SegmentInput } from '../schema/scenario-types.js';

type PlaceInput = ScenarioInput['places'][number];

/** The open-plan floor seen from one desk (`distanceFromWindow_m` from the window wall). */
function officeFloor(id: string, name: string, distanceFromWindow_m: number): PlaceInput {
  return {
    kind: 'room',
    id,
    name,
    width_m: 30,
    depth_m: 20,
    height_m: 2.9,
    reflectances: { ceiling: 0.85, walls: 0.55, floor: 0.2 },
    windows: [{ id: 'south-band', facadeAzimuth_deg: 175, width_m: 26, height_m: 1.8, sillHeight_m: 0.8, visibleTransmittance: 0.6, obstructionAngle_deg: 15 }],
    blinds: { rule: 'manual-sun', threshold_W_m2: 50, loweredTransmittance: 0.2 },
    luminaires: [
      {
        id: 'panels',
        name: 'Suspended 4000 K ceiling panels',
        spectrum: { kind: 'cct', cct_K: 4000 },
        eyeIlluminance_lx: 250,
        schedule: [{ start: '07:00', end: '19:00', level: 1, days: ['mon', 'tue', 'wed', 'thu', 'fri'] }],
      },
    ],
    screens: [{ id: 'desk-monitor', device: 'monitor', luminance_cd_m2: 160, width_m: 0.6, height_m: 0.34, distance_m: 0.7 }],
    viewingPosition: { distanceFromWindow_m, eyeHeight_m: 1.2 },
  };
}

/** A desk worker's day templates, at the desk in `office`. */
function deskTemplates(office: string): Record<string, SegmentInput[]> {
  return {
    workday: [
      { start: '06:45', end: '07:30', place: 'flat-living', activity: 'meal', gaze: 'room' },
      { start: '07:30', end: '07:40', place: 'street', activity: 'commute', posture: 'walking', gaze: 'ahead' },
      { start: '07:40', end: '08:10', place: 'tram', activity: 'commute', screen: 'phone' },
      { start: '08:10', end: '12:30', place: office, activity: 'work', gaze: 'screen', screen: 'desk-monitor' },
      { start: '12:30', end: '13:00', place: office, activity: 'meal', gaze: 'room' },
      { start: '13:00', end: '17:15', place: office, activity: 'work', gaze: 'screen', screen: 'desk-monitor' },
      { start: '17:15', end: '17:45', place: 'tram', activity: 'commute', screen: 'phone' },
      { start: '17:45', end: '17:55', place: 'street', activity: 'commute', posture: 'walking', gaze: 'ahead' },
      { start: '17:55', end: '22:30', place: 'flat-living', activity: 'leisure', gaze: 'screen', screen: 'tv' },
      { start: '22:30', end: '23:15', place: 'flat-bedroom', activity: 'leisure', posture: 'lying', screen: 'phone', screenBrightness: 0.6 },
      { start: '23:15', end: '06:45', place: 'flat-bedroom', activity: 'sleep', posture: 'lying' },
    ],
    weekend: [
      { start: '08:30', end: '10:00', place: 'flat-living', activity: 'meal' },
      { start: '10:00', end: '11:30', place: 'park', activity: 'exercise', posture: 'walking', gaze: 'ahead' },
      { start: '11:30', end: '23:00', place: 'flat-living', activity: 'leisure' },
      { start: '23:00', end: '23:45', place: 'flat-bedroom', activity: 'leisure', posture: 'lying', screen: 'phone', screenBrightness: 0.6 },
      { start: '23:45', end: '08:30', place: 'flat-bedroom', activity: 'sleep', posture: 'lying' },
    ],
    sunday: [
      { start: '08:30', end: '10:00', place: 'flat-living', activity: 'meal' },
      { start: '10:00', end: '11:30', place: 'park', activity: 'exercise', posture: 'walking', gaze: 'ahead' },
      { start: '11:30', end: '22:30', place: 'flat-living', activity: 'leisure' },
      { start: '22:30', end: '23:15', place: 'flat-bedroom', activity: 'leisure', posture: 'lying', screen: 'phone', screenBrightness: 0.6 },
      { start: '23:15', end: '06:45', place: 'flat-bedroom', activity: 'sleep', posture: 'lying' },
    ],
    'friday-night': [
      { start: '06:45', end: '07:30', place: 'flat-living', activity: 'meal' },
      { start: '07:30', end: '07:40', place: 'street', activity: 'commute', posture: 'walking', gaze: 'ahead' },
      { start: '07:40', end: '08:10', place: 'tram', activity: 'commute', screen: 'phone' },
      { start: '08:10', end: '12:30', place: office, activity: 'work', gaze: 'screen', screen: 'desk-monitor' },
      { start: '12:30', end: '13:00', place: office, activity: 'meal' },
      { start: '13:00', end: '16:30', place: office, activity: 'work', gaze: 'screen', screen: 'desk-monitor' },
      { start: '16:30', end: '17:00', place: 'tram', activity: 'commute', screen: 'phone' },
      { start: '17:00', end: '17:10', place: 'street', activity: 'commute', posture: 'walking' },
      { start: '17:10', end: '23:45', place: 'flat-living', activity: 'leisure', gaze: 'screen', screen: 'tv' },
      { start: '23:45', end: '08:30', place: 'flat-bedroom', activity: 'sleep', posture: 'lying' },
    ],
  };
}

const DESK_WEEK = { mon: 'workday', tue: 'workday', wed: 'workday', thu: 'workday', fri: 'friday-night', sat: 'weekend', sun: 'sunday' } as const;
const WEEKDAYS = ['mon', 'tue', 'wed', 'thu', 'fri'] as const;
const OFFICES = ['office-floor', 'office-floor-deep'] as const;

export const DEMO_SCENARIO: ScenarioInput = {
  format: 'zeitlight-scenario',
  version: 2,
  name: 'Lindenhafen demo: night-shift ward and open-plan office',
  description:
    'Invented example. A rotating-shift nurse on ward Birch of Hollowmere General, and two desk workers on the same deep open-plan floor of the Fernbrook office — ' +
    'one by the windows, one deep in the plan, otherwise alike — each compared under lighting and behaviour strategies over two weeks that include the start of summer time.',
  run: { startDate: '2026-03-23', days: 14 },
  site: {
    name: 'Lindenhafen (invented town)',
    latitude_deg: 52.4,
    longitude_deg: 10.8,
    elevation_m: 70,
    timeZone: 'Europe/Berlin',
    weather: {
      kind: 'sky-model',
      seed: 7,
      seasons: [
        { months: [11, 12, 1, 2], clear: 0.15, intermediate: 0.25, overcast: 0.6 },
        { months: [3, 4, 5], clear: 0.3, intermediate: 0.4, overcast: 0.3 },
        { months: [6, 7, 8], clear: 0.4, intermediate: 0.4, overcast: 0.2 },
        { months: [9, 10], clear: 0.25, intermediate: 0.35, overcast: 0.4 },
      ],
    },
    ground: { reflectance: 0.2, snow: { months: [1, 2], reflectance: 0.65 } },
  },
  places: [
    {
      kind: 'room',
      id: 'ward-station',
      name: 'Hollowmere General, ward Birch, nurses\' station',
      width_m: 10,
      depth_m: 7,
      height_m: 3,
      reflectances: { ceiling: 0.8, walls: 0.6, floor: 0.25 },
      windows: [{ id: 'east', facadeAzimuth_deg: 95, width_m: 4, height_m: 1.6, sillHeight_m: 0.9, visibleTransmittance: 0.65 }],
      blinds: { rule: 'manual-sun', threshold_W_m2: 50, loweredTransmittance: 0.25 },
      luminaires: [
        {
          id: 'ceiling',
          name: 'Recessed 4000 K ceiling panels',
          spectrum: { kind: 'cct', cct_K: 4000 },
          eyeIlluminance_lx: 250,
          schedule: [
            { start: '06:30', end: '21:30', level: 1 },
            { start: '21:30', end: '06:30', level: 0.3 },
          ],
        },
      ],
      screens: [{ id: 'station-pc', device: 'monitor', luminance_cd_m2: 180, width_m: 0.53, height_m: 0.3, distance_m: 0.65 }],
      viewingPosition: { distanceFromWindow_m: 4, eyeHeight_m: 1.6 },
    },
    {
      kind: 'room',
      id: 'nurse-bedroom',
      name: 'Nurse\'s bedroom',
      width_m: 3.5,
      depth_m: 4,
      height_m: 2.6,
      windows: [{ id: 'south', facadeAzimuth_deg: 180, width_m: 1.4, height_m: 1.4 }],
      blinds: { rule: 'down-at-night', loweredTransmittance: 0.1 },
      luminaires: [{ id: 'bedside', name: 'Bedside lamp', spectrum: { kind: 'cct', cct_K: 2700 }, eyeIlluminance_lx: 60, schedule: [{ start: '21:00', end: '23:30', level: 1 }] }],
    },
    {
      kind: 'room',
      id: 'nurse-living',
      name: 'Nurse\'s living room',
      width_m: 5,
      depth_m: 4.5,
      height_m: 2.6,
      windows: [{ id: 'west', facadeAzimuth_deg: 270, width_m: 2, height_m: 1.5 }],
      luminaires: [{ id: 'ceiling', name: 'Ceiling light', spectrum: { kind: 'cct', cct_K: 2700 }, eyeIlluminance_lx: 120, schedule: [{ start: '17:00', end: '23:59', level: 1 }] }],
      screens: [{ id: 'tv', device: 'tv', luminance_cd_m2: 150, width_m: 1.2, height_m: 0.68, distance_m: 3 }],
    },
    { kind: 'vehicle', id: 'car', name: 'Compact car', mode: 'car', windowTransmittance: 0.7 },
    officeFloor('office-floor', 'Fernbrook office, floor 3, desk by the windows', 2),
    officeFloor('office-floor-deep', 'Fernbrook office, floor 3, desk deep in the plan', 15),
    {
      kind: 'room',
      id: 'flat-bedroom',
      name: 'Bedroom of a desk worker\'s flat',
      width_m: 3.2,
      depth_m: 3.8,
      height_m: 2.5,
      windows: [{ id: 'east', facadeAzimuth_deg: 90, width_m: 1.2, height_m: 1.3 }],
      blinds: { rule: 'down-at-night', loweredTransmittance: 0.15 },
      luminaires: [{ id: 'lamp', name: 'Bedside lamp', spectrum: { kind: 'cct', cct_K: 3000 }, eyeIlluminance_lx: 80, schedule: [{ start: '22:00', end: '23:30', level: 1 }] }],
    },
    {
      kind: 'room',
      id: 'flat-living',
      name: 'Living room of a desk worker\'s flat',
      width_m: 5.5,
      depth_m: 4,
      height_m: 2.5,
      windows: [{ id: 'west', facadeAzimuth_deg: 265, width_m: 2.4, height_m: 1.6 }],
      luminaires: [{ id: 'ceiling', name: 'Ceiling light', spectrum: { kind: 'cct', cct_K: 3500 }, eyeIlluminance_lx: 150, schedule: [{ start: '06:30', end: '08:00', level: 1 }, { start: '17:30', end: '23:30', level: 1 }] }],
      screens: [{ id: 'tv', device: 'tv', luminance_cd_m2: 150, width_m: 1.1, height_m: 0.62, distance_m: 2.8 }],
    },
    { kind: 'vehicle', id: 'tram', name: 'City tram', mode: 'tram', windowTransmittance: 0.75, interiorIlluminance_lx: 150 },
    { kind: 'outdoors', id: 'park', name: 'Fernbrook park path', shade: 'partial' },
    { kind: 'outdoors', id: 'street', name: 'Street to the tram stop', shade: 'open' },
  ],
  personas: [
    {
      id: 'nurse',
      name: 'Mara Quellbrook (invented)',
      age_y: 34,
      sleep: { mode: 'habitual' },
      home: 'nurse-living',
      roster: { roster: 'birch-rotation', offsetDays: 0 },
      devices: [{ id: 'phone', device: 'phone', luminance_cd_m2: 250, width_m: 0.07, height_m: 0.15, distance_m: 0.3 }],
      eyewear: [{ id: 'amber', kind: 'blue-blocking' }],
    },
    {
      id: 'desk-worker',
      name: 'Tove Arnhelm (invented)',
      age_y: 46,
      sleep: { mode: 'habitual' },
      home: 'flat-living',
      devices: [{ id: 'phone', device: 'phone', luminance_cd_m2: 300, width_m: 0.07, height_m: 0.15, distance_m: 0.3 }],
      templates: deskTemplates('office-floor'),
      week: DESK_WEEK,
    },
    {
      id: 'deep-desk-worker',
      name: 'Jonas Brenner (invented)',
      age_y: 46,
      sleep: { mode: 'habitual' },
      home: 'flat-living',
      devices: [{ id: 'phone', device: 'phone', luminance_cd_m2: 300, width_m: 0.07, height_m: 0.15, distance_m: 0.3 }],
      templates: deskTemplates('office-floor-deep'),
      week: DESK_WEEK,
    },
  ],
  rosters: [
    {
      id: 'birch-rotation',
      name: 'Ward Birch two-week rotation',
      anchorDate: '2026-03-23',
      cycle: ['early', 'early', 'late', 'late', 'night', 'night', 'night', 'rest', 'rest', 'rest', 'early', 'early', 'rest', 'rest'],
      shifts: [
        { id: 'early', kind: 'day', start: '06:45', end: '15:15', place: 'ward-station', posture: 'standing' },
        { id: 'late', kind: 'evening', start: '14:30', end: '22:30', place: 'ward-station', posture: 'standing' },
        { id: 'night', kind: 'night', start: '22:00', end: '07:00', place: 'ward-station', posture: 'standing', screen: 'station-pc' },
      ],
      commute: { minutes: 25, place: 'car' },
      sleep: {
        mainSleep_h: 7.5,
        usualBedtime: '23:00',
        place: 'nurse-bedroom',
        prepare_min: 60,
        windDown_min: 45,
        afterNight: 'morning',
        afterNightSleep_h: 6.5,
        napBeforeFirstNight_h: 1.5,
        recoveryAfterLastNight_h: 4,
      },
    },
  ],
  strategies: [
    {
      id: 'ward-bright-night-start',
      name: 'Bright light early in the night shift',
      description: 'A 6500 K panel at the station gives about 1000 lx at the eye from 22:00 to 01:30, then switches off.',
      personas: ['nurse'],
      changes: [
        {
          op: 'add-luminaire',
          place: 'ward-station',
          luminaire: { id: 'bright-panel', name: 'Bright 6500 K panel', spectrum: { kind: 'cct', cct_K: 6500 }, eyeIlluminance_lx: 1000, schedule: [{ start: '22:00', end: '01:30', level: 1 }] },
        },
      ],
    },
    {
      id: 'ward-amber-drive-home',
      name: 'Blue-blocking glasses on the way home after nights',
      personas: ['nurse'],
      changes: [{ op: 'modify-segments', persona: 'nurse', match: { activity: ['commute'], commute: 'from-work', shiftKind: ['night'] }, set: { eyewear: 'amber' } }],
    },
    {
      id: 'ward-dark-bedroom',
      name: 'Dark bedroom for day sleep',
      description: 'Blackout blinds kept down and no bedside lamp.',
      personas: ['nurse'],
      changes: [
        { op: 'set-blinds', place: 'nurse-bedroom', blinds: { rule: 'always-down', loweredTransmittance: 0.01 } },
        { op: 'set-luminaire', place: 'nurse-bedroom', luminaire: 'bedside', schedule: [] },
      ],
    },
    {
      id: 'ward-tunable-programme',
      name: 'Tunable-white ward programme',
      description: 'Ceiling panels run cool and bright in the day and warm and dim at night.',
      personas: ['nurse'],
      changes: [
        {
          op: 'set-luminaire',
          place: 'ward-station',
          luminaire: 'ceiling',
          spectrum: { kind: 'tunable', warm_K: 2700, cool_K: 6500 },
          eyeIlluminance_lx: 400,
          schedule: [
            { start: '07:00', end: '17:00', level: 1, cct_K: 6000 },
            { start: '17:00', end: '21:30', level: 0.6, cct_K: 4000 },
            { start: '21:30', end: '07:00', level: 0.25, cct_K: 2700 },
          ],
        },
      ],
    },
    {
      id: 'office-tunable-white',
      name: 'Tunable white: brighter day, warmer afternoon',
      description: 'The ceiling panels of the whole floor are replaced by tunable-white panels: brighter and cooler in the morning, warmer in the afternoon.',
      personas: ['desk-worker', 'deep-desk-worker'],
      changes: OFFICES.map((place) => ({
        op: 'set-luminaire' as const,
        place,
        luminaire: 'panels',
        spectrum: { kind: 'tunable' as const, warm_K: 3000, cool_K: 6500 },
        eyeIlluminance_lx: 450,
        schedule: [
          { start: '07:00', end: '13:00', level: 1, cct_K: 6000, days: [...WEEKDAYS] },
          { start: '13:00', end: '19:00', level: 0.7, cct_K: 4000, days: [...WEEKDAYS] },
        ],
      })),
    },
    {
      id: 'office-lunch-walk',
      name: 'Outdoor lunch walk',
      personas: ['desk-worker', 'deep-desk-worker'],
      changes: ['desk-worker', 'deep-desk-worker'].map((persona) => ({
        op: 'add-segment' as const,
        persona,
        days: [...WEEKDAYS],
        segment: { start: '12:30', end: '13:00', place: 'park', activity: 'exercise' as const, posture: 'walking' as const, gaze: 'ahead' as const },
      })),
    },
    {
      id: 'office-daylight-first',
      name: 'Daylight first with automatic blinds',
      description: 'Automatic blinds replace manual ones; panels dim to 60 % while daylight is ample.',
      personas: ['desk-worker', 'deep-desk-worker'],
      changes: OFFICES.flatMap((place) => [
        { op: 'set-blinds' as const, place, blinds: { rule: 'auto-solar' as const, threshold_W_m2: 250, loweredTransmittance: 0.2 } },
        { op: 'set-luminaire' as const, place, luminaire: 'panels', schedule: [{ start: '07:00', end: '19:00', level: 0.6, days: [...WEEKDAYS] }] },
      ]),
    },
    {
      id: 'office-dim-evening',
      name: 'Dimmer evening at home, phone night mode',
      personas: ['desk-worker'],
      changes: [
        { op: 'set-luminaire', place: 'flat-living', luminaire: 'ceiling', schedule: [{ start: '06:30', end: '08:00', level: 1 }, { start: '17:30', end: '20:30', level: 1 }, { start: '20:30', end: '23:30', level: 0.3 }] },
        { op: 'set-screen', persona: 'desk-worker', screen: 'phone', luminance_cd_m2: 150, nightMode: { start: '20:00', end: '07:00', cct_K: 2700 } },
        { op: 'modify-segments', persona: 'desk-worker', match: { from: '21:00', to: '23:00', activity: ['leisure'] }, set: { screen: null, gaze: 'room' } },
      ],
    },
  ],
};
