/**
 * A strategy change to a persona's roster: work another roster of the scenario, start at another
 * day of its cycle, or change the cycle, shift times or sleep rules — so roster designs can be
 * compared like lighting options. The persona works a copy of the roster; other people who
 * follow the same roster keep it as it is.
 */
import { z } from 'zod';
import { clockTimeSchema, idSchema } from './primitives.js';
import { rosterSchema, rosterSleepSchema, shiftSchema } from './roster-schema.js';

const sleep = rosterSleepSchema.shape;
const shift = shiftSchema.shape;

/** Sleep rules to change; each absent rule stays as the roster has it. */
export const rosterSleepPatchSchema = z
  .strictObject({
    mainSleep_h: sleep.mainSleep_h.unwrap().optional(),
    usualBedtime: sleep.usualBedtime.unwrap().optional(),
    place: sleep.place,
    prepare_min: sleep.prepare_min.unwrap().optional(),
    windDown_min: sleep.windDown_min.unwrap().optional(),
    afterNight: sleep.afterNight.unwrap().optional(),
    afterNightSleep_h: sleep.afterNightSleep_h.unwrap().optional(),
    splitNap_h: sleep.splitNap_h.unwrap().optional(),
    napBeforeFirstNight_h: sleep.napBeforeFirstNight_h.unwrap().optional(),
    recoveryAfterLastNight_h: sleep.recoveryAfterLastNight_h.unwrap().optional(),
  })
  .describe('Sleep rules to change; the others stay.');

/** New times (or kind, or place) for one shift of the roster. */
export const shiftPatchSchema = z
  .strictObject({
    shift: idSchema.describe('Identifier of the shift in the roster.'),
    start: clockTimeSchema.optional(),
    end: clockTimeSchema.optional(),
    kind: shift.kind.optional(),
    place: idSchema.optional(),
  })
  .describe('What to change in one shift.');

export const rosterChangeSchema = z
  .strictObject({
    op: z.literal('set-roster'),
    persona: idSchema,
    roster: idSchema.optional().describe('Another roster of the scenario that the persona works instead.'),
    offsetDays: z.int().min(0).max(365).optional().describe('Days the persona runs ahead in the cycle.'),
    cycle: rosterSchema.shape.cycle.optional().describe('A new cycle: shift identifier (or "rest") for each day.'),
    pattern: z.string().max(4000).optional().describe('A new cycle written as a roster pattern, e.g. "2D 2E 3N 4rest".'),
    shifts: z.array(shiftPatchSchema).optional(),
    sleep: rosterSleepPatchSchema.optional(),
    note: z.string().max(500).optional(),
  })
  .describe('Changes the roster a persona works.');
