/**
 * Small shared pieces of the scenario schema: identifiers, clock times, dates, fractions, weekdays.
 * Clock times are local wall-clock times "HH:MM" (24 h); "24:00" means the end of the day.
 */
import { z } from 'zod';

export const WEEKDAYS = ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'] as const;
export type Weekday = (typeof WEEKDAYS)[number];
export const weekdaySchema = z.enum(WEEKDAYS);

export const idSchema = z
  .string()
  .regex(/^[A-Za-z][A-Za-z0-9_-]{0,63}$/, {
    message: 'an identifier starts with a letter and holds only letters, digits, "-" or "_" (at most 64 characters)',
  })
  .describe('Identifier used to refer to this item from elsewhere in the scenario.');

export const clockTimeSchema = z
  .string()
  .regex(/^(?:[01]\d|2[0-3]):[0-5]\d$|^24:00$/, { message: 'a clock time is written "HH:MM" in 24-hour form, from 00:00 to 24:00' })
  .describe('Local wall-clock time "HH:MM" (24-hour); "24:00" is the end of the day.');

export const isoDateSchema = z
  .string()
  .regex(/^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/, { message: 'a date is written "YYYY-MM-DD"' })
  .describe('Calendar date "YYYY-MM-DD" (local to the site).');

export const fractionSchema = z.number().min(0).max(1);

export const nameSchema = z.string().min(1).max(200);

export const dateTimeSchema = z
  .string()
  .regex(/^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])T([01]\d|2[0-3]):[0-5]\d(:[0-5]\d(\.\d{1,9})?)?(Z|[+-]([01]\d|2[0-3]):?[0-5]\d)?$/, {
    message: 'a date-time is written "YYYY-MM-DDTHH:MM", optionally with seconds and an offset such as "+01:00" or "Z"',
  })
  .describe('ISO 8601 date-time; without an offset it is local time at the site.');
