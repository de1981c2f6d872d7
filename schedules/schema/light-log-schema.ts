/**
 * Measured light logs from wearable light loggers (CSV). The file is read by the CLI or the
 * desktop app; schedules/ parses its text.
 */
import { z } from 'zod';
import { idSchema } from './primitives.js';

export const TIMESTAMP_FORMATS = ['auto', 'iso', 'epoch-s', 'epoch-ms', 'ymd', 'dmy', 'mdy'] as const;
export type TimestampFormat = (typeof TIMESTAMP_FORMATS)[number];
export const FILL_RULES = ['model', 'dark', 'hold', 'linear'] as const;
export type FillRule = (typeof FILL_RULES)[number];

export const logQuantitySchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('photopic-lux'), column: z.string().min(1).optional().describe('Column name; found automatically when absent.') }),
  z.strictObject({ kind: z.literal('melanopic-edi'), column: z.string().min(1).optional() }),
  z.strictObject({
    kind: z.literal('channels'),
    columns: z.array(z.string().min(1)).min(1).describe('Raw sensor channel columns.'),
    calibration: z
      .strictObject({
        photopic_lx: z.array(z.number()).min(1).describe('Coefficient per channel: lux = Σ kᵢ·channelᵢ.'),
        melanopicEdi_lx: z.array(z.number()).min(1).describe('Coefficient per channel: mEDI = Σ kᵢ·channelᵢ.'),
      })
      .describe('User calibration of the raw channels.'),
  }),
]);

export const lightLogSpecSchema = z
  .strictObject({
    id: idSchema,
    file: z.string().min(1).describe('CSV path, relative to the scenario file.'),
    timeZone: z.string().min(1).optional().describe('IANA zone for timestamps without an offset; the site zone when absent.'),
    timestampColumn: z.string().min(1).optional().describe('Column of timestamps; found automatically when absent.'),
    timestampFormat: z.enum(TIMESTAMP_FORMATS).default('auto'),
    quantity: logQuantitySchema,
    fill: z.enum(FILL_RULES).default('model').describe('How gaps are filled: model (modelled light), dark (0 lx), hold (last value), linear.'),
    maxGap_min: z.number().positive().max(1440).optional().describe('A pause longer than this is a gap; 3 × the usual interval when absent.'),
    wornColumn: z.string().min(1).optional().describe('Column that is 0/false when the logger was not worn.'),
  })
  .describe('A measured light log.');
