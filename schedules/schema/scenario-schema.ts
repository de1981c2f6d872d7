/** The whole scenario file (current format version). */
import { z } from 'zod';
import { isoDateSchema, nameSchema } from './primitives.js';
import { siteSchema } from './site-schema.js';
import { placeSchema } from './places-schema.js';
import { personaSchema } from './personas-schema.js';
import { rosterSchema } from './roster-schema.js';
import { strategySchema } from './strategy-schema.js';
import { lightLogSpecSchema } from './light-log-schema.js';

export const SCENARIO_FORMAT = 'zeitlight-scenario';
export const SCENARIO_FORMAT_VERSION = 2;

export const runSettingsSchema = z
  .strictObject({
    startDate: isoDateSchema.describe('First simulated day (local date at the site).'),
    days: z.int().min(1).max(400).describe('Number of simulated days.'),
  })
  .describe('Simulated period.');

export const scenarioSchema = z
  .strictObject({
    format: z.literal(SCENARIO_FORMAT).describe('Always "zeitlight-scenario".'),
    version: z.literal(SCENARIO_FORMAT_VERSION).describe('Format version of this file.'),
    name: nameSchema,
    description: z.string().max(5000).optional(),
    run: runSettingsSchema,
    site: siteSchema,
    places: z.array(placeSchema).min(1),
    personas: z.array(personaSchema).min(1),
    rosters: z.array(rosterSchema).default([]),
    strategies: z.array(strategySchema).default([]),
    lightLogs: z.array(lightLogSpecSchema).default([]),
  })
  .describe('A Zeitlight scenario: site, places, people, rosters, lighting strategies and measured light logs.');
