/** fast-check generators of valid scenarios, for property-based tests of validation and expansion. */
import fc from 'fast-check';
import type { ScenarioInput, SegmentInput } from '../../schedules/schema/scenario-types.js';
import { minutesToClockTime } from '../../schedules/time/clock-time.js';

/** Zones with and without daylight saving, both hemispheres (IANA tz database names). */
export const ZONES = [
  { zone: 'Europe/Berlin', lon: 13.4 },
  { zone: 'America/New_York', lon: -74 },
  { zone: 'Australia/Sydney', lon: 151.2 },
  { zone: 'America/Santiago', lon: -70.7 },
  { zone: 'Asia/Tokyo', lon: 139.7 },
  { zone: 'UTC', lon: 0 },
] as const;

const PLACES = ['home', 'bedroom', 'office', 'bus', 'garden'] as const;

/** A day plan: ordered, non-overlapping segments; the last may run past midnight. */
export const dayPlanArb: fc.Arbitrary<SegmentInput[]> = fc
  .uniqueArray(fc.integer({ min: 0, max: 95 }), { minLength: 2, maxLength: 10 })
  .chain((cuts) => {
    const sorted = [...cuts].sort((a, b) => a - b).map((q) => q * 15);
    return fc.tuple(
      fc.constant(sorted),
      fc.array(fc.constantFrom(...PLACES), { minLength: sorted.length, maxLength: sorted.length }),
      fc.array(fc.constantFrom('sleep', 'work', 'leisure', 'commute', 'meal', 'nap') as fc.Arbitrary<SegmentInput['activity']>, { minLength: sorted.length, maxLength: sorted.length }),
      fc.integer({ min: 0, max: 8 * 60 }),
    );
  })
  .map(([times, places, acts, spill]) =>
    times.map((t, i) => {
      const next = times[i + 1];
      const end = next ?? Math.min(t + 15 + spill, 1440 + (times[0] ?? 0)); // last one may spill past midnight
      return { start: minutesToClockTime(t), end: minutesToClockTime(end % 1440 === t % 1440 ? t + 15 : end), place: places[i] ?? 'home', activity: acts[i] ?? 'other' };
    }),
  );

const isoDateArb = fc.date({ min: new Date(Date.UTC(2020, 0, 1)), max: new Date(Date.UTC(2030, 11, 1)), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10));

export const scenarioArb: fc.Arbitrary<ScenarioInput> = fc
  .record({
    zone: fc.constantFrom(...ZONES),
    lat: fc.double({ min: -60, max: 65, noNaN: true }),
    start: isoDateArb,
    days: fc.integer({ min: 1, max: 12 }),
    week: fc.array(dayPlanArb, { minLength: 7, maxLength: 7 }),
    useRoster: fc.boolean(),
    cycle: fc.array(fc.constantFrom('d', 'e', 'n', 'rest'), { minLength: 1, maxLength: 10 }),
    commute: fc.integer({ min: 0, max: 90 }),
    free: fc.boolean(),
    age: fc.integer({ min: 18, max: 90 }),
  })
  .map((r): ScenarioInput => {
    const [mon, tue, wed, thu, fri, sat, sun] = r.week;
    const room = (id: string) => ({ kind: 'room' as const, id, width_m: 5, depth_m: 4, height_m: 2.7, luminaires: [{ id: 'l', spectrum: { kind: 'cct' as const, cct_K: 3000 }, eyeIlluminance_lx: 100, schedule: [{ start: '18:00', end: '23:00', level: 1 }] }] });
    return {
      format: 'zeitlight-scenario',
      version: 2,
      name: 'generated',
      run: { startDate: r.start, days: r.days },
      site: { latitude_deg: r.lat, longitude_deg: r.zone.lon, timeZone: r.zone.zone, weather: { kind: 'sky-model', seasons: [{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], clear: 0.3, intermediate: 0.3, overcast: 0.4 }] } },
      places: [room('home'), room('bedroom'), room('office'), { kind: 'vehicle', id: 'bus' }, { kind: 'outdoors', id: 'garden' }],
      personas: [
        {
          id: 'p',
          name: 'Generated person',
          age_y: r.age,
          home: 'home',
          sleep: { mode: r.free ? 'free' : 'habitual' },
          ...(r.useRoster
            ? { roster: { roster: 'rota' } }
            : { week: { mon: mon ?? [], tue: tue ?? [], wed: wed ?? [], thu: thu ?? [], fri: fri ?? [], sat: sat ?? [], sun: sun ?? [] } }),
        },
      ],
      rosters: [
        {
          id: 'rota',
          anchorDate: '2024-01-01',
          cycle: r.cycle,
          shifts: [
            { id: 'd', kind: 'day', start: '07:00', end: '15:00', place: 'office' },
            { id: 'e', kind: 'evening', start: '15:00', end: '23:00', place: 'office' },
            { id: 'n', kind: 'night', start: '23:00', end: '07:00', place: 'office' },
          ],
          commute: { minutes: r.commute, place: 'bus' },
        },
      ],
      strategies: [
        { id: 'walk', name: 'Walk', changes: [{ op: 'add-segment', persona: 'p', days: ['mon', 'wed'], segment: { start: '12:00', end: '12:30', place: 'garden', activity: 'exercise' } }] },
        { id: 'dim', name: 'Dim', changes: [{ op: 'set-luminaire', place: 'home', luminaire: 'l', eyeIlluminance_lx: 30 }] },
      ],
    };
  });
