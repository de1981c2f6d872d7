/**
 * People: personas with their body-clock parameters, sleep mode, devices, eyewear and routine
 * (a week of day templates, or a shift roster).
 * Defaults, with sources:
 *  - intrinsicPeriod_h 24.18: population mean intrinsic circadian period of young and older
 *    adults, Czeisler et al. 1999, Science 284:2177 (abstract). Spread 24 h 9 min ± 12 min SD
 *    as cited in Skeldon et al. 2017 (used by the sense checks).
 *  - lightSensitivity 1: a multiplier on the photic drive of the circadian model; 1 means the
 *    published model as calibrated. Individual sensitivity varies widely (Phillips et al. 2019,
 *    PNAS 116:12019, over 50-fold range in evening light sensitivity — from memory).
 *  - age: used for the lens-transmission correction of CIE S 026 (age 32 = reference observer).
 */
import { z } from 'zod';
import { clockTimeSchema, dateTimeSchema, fractionSchema, idSchema, nameSchema } from './primitives.js';
import { screenSchema } from './places-schema.js';

export const ACTIVITIES = ['sleep', 'nap', 'work', 'commute', 'leisure', 'meal', 'exercise', 'other'] as const;
export type Activity = (typeof ACTIVITIES)[number];
export const POSTURES = ['seated', 'standing', 'walking', 'lying'] as const;
export type Posture = (typeof POSTURES)[number];
export const GAZES = ['room', 'window', 'screen', 'desk', 'ahead'] as const;
export type Gaze = (typeof GAZES)[number];

export const segmentSchema = z
  .strictObject({
    start: clockTimeSchema,
    end: clockTimeSchema.describe('End clock time; at or before the start means the segment runs past midnight.'),
    place: idSchema.describe('Identifier of the place (room, vehicle or outdoors).'),
    activity: z.enum(ACTIVITIES).default('other').describe('sleep and nap mean eyes closed.'),
    posture: z.enum(POSTURES).default('seated'),
    gaze: z.enum(GAZES).default('room').describe('What the person mostly looks at.'),
    gazeAzimuth_deg: z.number().min(0).max(360).optional().describe('Compass direction of the gaze, when known.'),
    screen: idSchema.optional().describe('Screen in use: one in the room or one of the persona\'s devices.'),
    screenBrightness: fractionSchema.default(1).describe('Brightness setting as a fraction of the screen\'s stated luminance.'),
    eyewear: idSchema.optional().describe('Eyewear worn: one of the persona\'s eyewear items.'),
    note: z.string().max(500).optional(),
  })
  .describe('A stretch of time in one place doing one thing.')
  .meta({ id: 'Segment' });

export const dayPlanSchema = z
  .union([z.array(segmentSchema).describe('The day\'s segments in order.'), idSchema.describe('Name of one of the persona\'s day templates.')])
  .meta({ id: 'DayPlan' });

export const weekSchema = z
  .strictObject({
    mon: dayPlanSchema,
    tue: dayPlanSchema,
    wed: dayPlanSchema,
    thu: dayPlanSchema,
    fri: dayPlanSchema,
    sat: dayPlanSchema,
    sun: dayPlanSchema,
  })
  .describe('The routine: one plan per weekday, inline or by template name.');

export const eyewearSchema = z
  .strictObject({
    id: idSchema,
    kind: z.enum(['clear', 'sunglasses', 'blue-blocking', 'custom']),
    photopicTransmittance: fractionSchema.optional().describe('Share of photopic illuminance passed; defaults by kind.'),
    melanopicTransmittance: fractionSchema.optional().describe('Share of melanopic irradiance passed; defaults by kind.'),
  })
  .describe('Glasses the persona may wear.');

export const sleepModeSchema = z
  .strictObject({
    mode: z.enum(['habitual', 'free']).default('habitual').describe('habitual: sleep as written; free: the model predicts sleep, allowed whenever the person is not working or travelling.'),
  })
  .describe('How sleep timing is set.');

export const rosterAssignmentSchema = z
  .strictObject({
    roster: idSchema.describe('Identifier of the roster.'),
    offsetDays: z.int().min(0).max(365).default(0).describe('Days this persona runs ahead in the roster cycle.'),
  })
  .describe('Shift roster followed by this persona.');

export const measuredLightUseSchema = z
  .strictObject({
    log: idSchema.describe('Identifier of a measured light log.'),
    from: dateTimeSchema.optional().describe('Start of the replaced period (ISO 8601; no offset means site time).'),
    to: dateTimeSchema.optional().describe('End of the replaced period.'),
  })
  .describe('Replace the modelled light at the eye with a measured log for this persona.');

export const personaSchema = z
  .strictObject({
    id: idSchema,
    name: nameSchema,
    age_y: z.number().min(1).max(110).describe('Age in years (lens-transmission correction).'),
    intrinsicPeriod_h: z.number().min(23).max(25.5).default(24.18).describe('Intrinsic circadian period in hours (default 24.18 h, Czeisler et al. 1999).'),
    lightSensitivity: z.number().min(0.05).max(20).default(1).describe('Multiplier on the circadian response to light; 1 is the published model.'),
    sleep: sleepModeSchema.default({ mode: 'habitual' }),
    home: idSchema.describe('Place used when no segment says where the person is.'),
    templates: z.record(idSchema, z.array(segmentSchema)).default({}).describe('Named day templates.'),
    week: weekSchema.optional(),
    roster: rosterAssignmentSchema.optional(),
    devices: z.array(screenSchema).default([]).describe('Screens the persona carries.'),
    eyewear: z.array(eyewearSchema).default([]),
    measuredLight: z.array(measuredLightUseSchema).default([]),
  })
  .describe('A person: give either a week or a roster.');
