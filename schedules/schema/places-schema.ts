/**
 * Places: rooms (windows, blinds rule, luminaires with schedules, screens, surface reflectances),
 * vehicles (window transmittance) and outdoors (open or shaded).
 * Defaults: surface reflectances ceiling 0.8 / walls 0.5 / floor 0.2 sit inside the typical
 * interior ranges (from memory);
 * lowered blinds pass 25 % of diffuse daylight and no direct sun (simple dynamic shading
 * convention of annual daylight tools).
 */
import { z } from 'zod';
import { clockTimeSchema, fractionSchema, idSchema, nameSchema, weekdaySchema } from './primitives.js';

export const spectrumRefSchema = z
  .discriminatedUnion('kind', [
    z.strictObject({ kind: z.literal('cct'), cct_K: z.number().min(1000).max(25000).describe('Correlated colour temperature in kelvin.') }),
    z.strictObject({ kind: z.literal('library'), sourceId: z.string().min(1).describe('Identifier of a spectrum in the source library.') }),
    z.strictObject({
      kind: z.literal('tunable'),
      warm_K: z.number().min(1000).max(25000).describe('CCT of the warm channel.'),
      cool_K: z.number().min(1000).max(25000).describe('CCT of the cool channel.'),
    }),
  ])
  .describe('Spectrum of a light source.')
  .meta({ id: 'SpectrumRef' });

export const scheduleEntrySchema = z
  .strictObject({
    start: clockTimeSchema,
    end: clockTimeSchema,
    level: fractionSchema.describe('Output as a fraction of full output (0–1).'),
    cct_K: z.number().min(1000).max(25000).optional().describe('Target CCT for a tunable luminaire.'),
    days: z.array(weekdaySchema).optional().describe('Weekdays this entry applies to; all days when absent.'),
  })
  .describe('A period when a luminaire is on at a given level.')
  .meta({ id: 'ScheduleEntry' });

export const luminaireSchema = z
  .strictObject({
    id: idSchema,
    name: nameSchema.optional(),
    spectrum: spectrumRefSchema,
    eyeIlluminance_lx: z.number().min(0).max(100000).describe('Vertical illuminance at the eye at full output, level gaze (lx).'),
    schedule: z.array(scheduleEntrySchema).default([]).describe('When it is on; off outside these periods.'),
  })
  .describe('Electric light in a room, described by what it delivers at the eye.')
  .meta({ id: 'Luminaire' });

export const screenSchema = z
  .strictObject({
    id: idSchema,
    device: z.enum(['monitor', 'laptop', 'tablet', 'phone', 'tv', 'e-reader']),
    luminance_cd_m2: z.number().min(0).max(5000).describe('Mean luminance of the content at the set brightness (cd/m²).'),
    width_m: z.number().positive().max(5),
    height_m: z.number().positive().max(5),
    distance_m: z.number().positive().max(10).describe('Viewing distance from the eye.'),
    spectrum: spectrumRefSchema.default({ kind: 'cct', cct_K: 6500 }),
    nightMode: z
      .strictObject({ start: clockTimeSchema, end: clockTimeSchema, cct_K: z.number().min(1000).max(10000).default(3000) })
      .optional()
      .describe('Warm "night" colour setting between these times.'),
  })
  .describe('A screen: fixed in a room or carried by a person.')
  .meta({ id: 'Screen' });

export const windowSchema = z
  .strictObject({
    id: idSchema,
    facadeAzimuth_deg: z.number().min(0).max(360).describe('Direction the window faces, clockwise from north.'),
    width_m: z.number().positive().max(50),
    height_m: z.number().positive().max(20),
    sillHeight_m: z.number().min(0).max(20).default(0.9),
    visibleTransmittance: fractionSchema.default(0.7).describe('Glazing visible transmittance at normal incidence.'),
    obstructionAngle_deg: z.number().min(0).max(90).default(0).describe('Elevation of the outside obstruction seen from the window centre.'),
  })
  .describe('A vertical window.');

export const blindsSchema = z
  .strictObject({
    rule: z
      .enum(['none', 'always-down', 'down-at-night', 'manual-sun', 'auto-solar'])
      .describe('none: never lowered; always-down; down-at-night: lowered from dusk to dawn; manual-sun: lowered when direct sun reaches the desk, raised on next arrival; auto-solar: lowered above the threshold with a dead band.'),
    threshold_W_m2: z.number().min(0).max(1500).default(200).describe('Solar irradiance on the window that lowers automatic blinds.'),
    loweredTransmittance: fractionSchema.default(0.25).describe('Share of diffuse daylight passing lowered blinds.'),
  })
  .describe('How the blinds are used.')
  .meta({ id: 'Blinds' });

export const reflectancesSchema = z
  .strictObject({ ceiling: fractionSchema.default(0.8), walls: fractionSchema.default(0.5), floor: fractionSchema.default(0.2) })
  .describe('Surface reflectances (0–1).');

export const roomSchema = z
  .strictObject({
    kind: z.literal('room'),
    id: idSchema,
    name: nameSchema.optional(),
    width_m: z.number().positive().max(200),
    depth_m: z.number().positive().max(200),
    height_m: z.number().positive().max(30),
    reflectances: reflectancesSchema.default({ ceiling: 0.8, walls: 0.5, floor: 0.2 }),
    windows: z.array(windowSchema).default([]),
    blinds: blindsSchema.default({ rule: 'none', threshold_W_m2: 200, loweredTransmittance: 0.25 }),
    luminaires: z.array(luminaireSchema).default([]),
    screens: z.array(screenSchema).default([]),
    viewingPosition: z
      .strictObject({ distanceFromWindow_m: z.number().min(0).max(200), eyeHeight_m: z.number().min(0).max(3).default(1.2) })
      .optional()
      .describe('Where the occupant usually sits.'),
  })
  .describe('An indoor room.');

export const vehicleSchema = z
  .strictObject({
    kind: z.literal('vehicle'),
    id: idSchema,
    name: nameSchema.optional(),
    mode: z.enum(['car', 'bus', 'train', 'tram']).default('car'),
    windowTransmittance: fractionSchema.default(0.7).describe('Visible transmittance of the windows.'),
    interiorIlluminance_lx: z.number().min(0).max(1000).default(0).describe('Cabin lighting at the eye after dark (lx).'),
  })
  .describe('A vehicle used for commuting.');

export const outdoorsSchema = z
  .strictObject({
    kind: z.literal('outdoors'),
    id: idSchema,
    name: nameSchema.optional(),
    shade: z.enum(['open', 'partial', 'full']).default('open').describe('open sky, partly shaded (trees, street canyon) or fully shaded.'),
    streetLighting_lx: z.number().min(0).max(200).default(5).describe('Eye illuminance from street lights after dark (lx).'),
  })
  .describe('Outdoors.');

export const placeSchema = z.discriminatedUnion('kind', [roomSchema, vehicleSchema, outdoorsSchema]);
