/**
 * Strategies: named overlays on the baseline scenario. Each change says what it alters —
 * a luminaire, the blinds, a screen, the person's behaviour or roster — so the comparison can list it.
 */
import { z } from 'zod';
import { clockTimeSchema, fractionSchema, idSchema, nameSchema, weekdaySchema } from './primitives.js';
import { blindsSchema, luminaireSchema, scheduleEntrySchema, screenSchema, spectrumRefSchema } from './places-schema.js';
import { ACTIVITIES, GAZES, POSTURES, segmentSchema } from './personas-schema.js';
import { rosterChangeSchema } from './roster-change-schema.js';

const dayKindSchema = z.enum(['day', 'evening', 'night', 'rest']);

export const segmentMatchSchema = z
  .strictObject({
    activity: z.array(z.enum(ACTIVITIES)).optional(),
    place: z.array(idSchema).optional(),
    shiftKind: z.array(dayKindSchema).optional().describe('Only on days of these shift kinds (roster personas).'),
    commute: z.enum(['to-work', 'from-work']).optional(),
    days: z.array(weekdaySchema).optional(),
    from: clockTimeSchema.optional().describe('Only the part of matching segments from this clock time…'),
    to: clockTimeSchema.optional().describe('…up to this clock time.'),
  })
  .describe('Which parts of the timeline a change applies to; all conditions must hold.');

export const segmentPatchSchema = z
  .strictObject({
    place: idSchema.optional(),
    posture: z.enum(POSTURES).optional(),
    gaze: z.enum(GAZES).optional(),
    screen: z.union([idSchema, z.null()]).optional().describe('A screen, or null for no screen.'),
    screenBrightness: fractionSchema.optional(),
    eyewear: z.union([idSchema, z.null()]).optional().describe('Eyewear, or null for none.'),
  })
  .describe('What to change in the matching segments.');

export const strategyChangeSchema = z.discriminatedUnion('op', [
  z.strictObject({
    op: z.literal('set-luminaire'),
    place: idSchema,
    luminaire: idSchema,
    eyeIlluminance_lx: z.number().min(0).max(100000).optional(),
    spectrum: spectrumRefSchema.optional(),
    schedule: z.array(scheduleEntrySchema).optional(),
    note: z.string().max(500).optional(),
  }),
  z.strictObject({ op: z.literal('add-luminaire'), place: idSchema, luminaire: luminaireSchema, note: z.string().max(500).optional() }),
  z.strictObject({ op: z.literal('remove-luminaire'), place: idSchema, luminaire: idSchema, note: z.string().max(500).optional() }),
  z.strictObject({ op: z.literal('set-blinds'), place: idSchema, blinds: blindsSchema, note: z.string().max(500).optional() }),
  z.strictObject({
    op: z.literal('set-screen'),
    screen: idSchema,
    place: idSchema.optional().describe('Room holding the screen…'),
    persona: idSchema.optional().describe('…or persona carrying it.'),
    luminance_cd_m2: z.number().min(0).max(5000).optional(),
    nightMode: z.union([screenSchema.shape.nightMode.unwrap(), z.null()]).optional().describe('Night colour setting, or null to switch it off.'),
    note: z.string().max(500).optional(),
  }),
  z.strictObject({
    op: z.literal('add-segment'),
    persona: idSchema,
    days: z.array(weekdaySchema).optional().describe('Weekdays; every day when absent.'),
    shiftKind: z.array(dayKindSchema).optional().describe('Only on days of these shift kinds.'),
    segment: segmentSchema,
    note: z.string().max(500).optional(),
  }),
  z.strictObject({
    op: z.literal('modify-segments'),
    persona: idSchema,
    match: segmentMatchSchema,
    set: segmentPatchSchema,
    note: z.string().max(500).optional(),
  }),
  rosterChangeSchema,
]);

export const strategySchema = z
  .strictObject({
    id: idSchema,
    name: nameSchema,
    description: z.string().max(2000).optional(),
    personas: z.array(idSchema).optional().describe('People this strategy is meant for; everyone when absent.'),
    changes: z.array(strategyChangeSchema).min(1),
  })
  .describe('A lighting strategy compared with the baseline.');
