/**
 * Site: where the scenario happens — position, IANA time zone, weather source, ground and snow.
 * Ground reflectance defaults: 0.2 (common default; EnergyPlus normal ground reflectance, from
 * memory) and snow 0.65 / fresh snow 0.75 (pvlib SURFACE_ALBEDOS table).
 */
import { z } from 'zod';
import { fractionSchema } from './primitives.js';

const monthSchema = z.int().min(1).max(12);

export const skySeasonSchema = z
  .strictObject({
    months: z.array(monthSchema).min(1).max(12).describe('Months (1 = January) this sky mix applies to.'),
    clear: fractionSchema.describe('Share of days with a clear sky (0–1).'),
    intermediate: fractionSchema.describe('Share of days with a partly cloudy sky (0–1).'),
    overcast: fractionSchema.describe('Share of days with an overcast sky (0–1).'),
  })
  .describe('Sky-condition mix for some months; the three shares add up to 1.');

export const weatherFileSchema = z
  .strictObject({
    kind: z.literal('file'),
    file: z.string().min(1).describe('Path of the weather file, relative to the scenario file.'),
    format: z.enum(['epw']).default('epw').describe('Weather file format (EnergyPlus EPW).'),
    snowFromFile: z.boolean().default(true).describe('Take snow cover from the file\'s snow-depth column.'),
  })
  .describe('Hourly weather from a file.');

export const skyModelSchema = z
  .strictObject({
    kind: z.literal('sky-model'),
    seasons: z.array(skySeasonSchema).min(1).describe('Sky mix by month; every month must be covered exactly once.'),
    seed: z.int().min(0).default(1).describe('Seed for drawing each day\'s sky from the mix (same seed, same days).'),
  })
  .describe('Generated sky conditions following a seasonal pattern.');

export const weatherSchema = z.discriminatedUnion('kind', [weatherFileSchema, skyModelSchema]);

export const snowSchema = z
  .strictObject({
    months: z.array(monthSchema).default([]).describe('Months with snow on the ground (ignored when the weather file gives snow).'),
    reflectance: fractionSchema.default(0.65).describe('Ground reflectance with snow (0.65 settled snow, 0.75 fresh).'),
  })
  .describe('Snow cover.');

export const groundSchema = z
  .strictObject({
    reflectance: fractionSchema.default(0.2).describe('Ground reflectance without snow (grass ≈ 0.2, concrete ≈ 0.3, asphalt ≈ 0.12).'),
    snow: snowSchema.default({ months: [], reflectance: 0.65 }),
  })
  .describe('Ground around the building.');

export const siteSchema = z
  .strictObject({
    name: z.string().max(200).optional(),
    latitude_deg: z.number().min(-90).max(90).describe('Latitude in degrees, north positive.'),
    longitude_deg: z.number().min(-180).max(180).describe('Longitude in degrees, east positive.'),
    elevation_m: z.number().min(-500).max(9000).default(0).describe('Height above sea level in metres.'),
    timeZone: z.string().min(1).describe('IANA time zone name, e.g. "Europe/Berlin"; daylight-saving time follows it.'),
    weather: weatherSchema,
    ground: groundSchema.default({ reflectance: 0.2, snow: { months: [], reflectance: 0.65 } }),
  })
  .describe('Where the scenario happens.');
