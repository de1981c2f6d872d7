/**
 * Rosters: a repeating cycle of shifts and rest days, with rules for where sleep falls and a
 * commute derived around each shift. Default durations are common practice for planning rosters:
 * 7.5 h main sleep, 60 min to get ready before leaving, 60 min wind-down before bed.
 */
import { z } from 'zod';
import { clockTimeSchema, idSchema, isoDateSchema, nameSchema } from './primitives.js';
import { GAZES, POSTURES } from './personas-schema.js';

export const REST_DAY = 'rest';

export const shiftSchema = z
  .strictObject({
    id: idSchema,
    kind: z.enum(['day', 'evening', 'night']).describe('night shifts run past midnight and move sleep into the day.'),
    start: clockTimeSchema,
    end: clockTimeSchema,
    place: idSchema.describe('Where the shift is worked.'),
    posture: z.enum(POSTURES).default('standing'),
    gaze: z.enum(GAZES).default('room'),
    screen: idSchema.optional(),
  })
  .describe('A shift type.');

export const commuteSchema = z
  .strictObject({
    minutes: z.int().min(0).max(240).default(30),
    place: idSchema.describe('Vehicle or outdoors place used for the journey.'),
    posture: z.enum(POSTURES).default('seated'),
  })
  .describe('Journey before and after each shift.');

export const rosterSleepSchema = z
  .strictObject({
    mainSleep_h: z.number().min(3).max(12).default(7.5).describe('Length of a normal night\'s sleep.'),
    usualBedtime: clockTimeSchema.default('23:00'),
    place: idSchema.optional().describe('Bedroom; the persona\'s home when absent.'),
    prepare_min: z.int().min(0).max(240).default(60).describe('Time between waking and leaving for work.'),
    windDown_min: z.int().min(0).max(240).default(60).describe('Time between getting home and going to bed.'),
    afterNight: z.enum(['morning', 'split']).default('morning').describe('morning: one sleep after a night shift; split: a shorter morning sleep plus an afternoon nap before the next night.'),
    afterNightSleep_h: z.number().min(1).max(12).default(6.5).describe('Sleep after a night shift that is followed by another night.'),
    splitNap_h: z.number().min(0.25).max(6).default(2).describe('Afternoon nap in split sleep.'),
    napBeforeFirstNight_h: z.number().min(0).max(6).default(0).describe('Nap before the first night of a block (0 = none).'),
    recoveryAfterLastNight_h: z.number().min(0).max(12).default(4).describe('Short morning sleep after the last night of a block, before the normal night.'),
  })
  .describe('Rules for where sleep falls around shifts.');

export const rosterSchema = z
  .strictObject({
    id: idSchema,
    name: nameSchema.optional(),
    anchorDate: isoDateSchema.describe('Date on which day 1 of the cycle falls.'),
    cycle: z.array(idSchema).min(1).max(366).describe('Shift identifier (or "rest") for each day of the repeating cycle.'),
    shifts: z.array(shiftSchema).min(1),
    commute: commuteSchema.optional(),
    sleep: rosterSleepSchema.default({
      mainSleep_h: 7.5,
      usualBedtime: '23:00',
      prepare_min: 60,
      windDown_min: 60,
      afterNight: 'morning',
      afterNightSleep_h: 6.5,
      splitNap_h: 2,
      napBeforeFirstNight_h: 0,
      recoveryAfterLastNight_h: 4,
    }),
  })
  .describe('A repeating shift pattern.');
