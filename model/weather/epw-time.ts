/**
 * Time in EPW files: records are in local STANDARD time (UTC + the LOCATION time zone, never
 * daylight saving) and each hour label h covers the interval (h−1 h, h h] (EnergyPlus EPW Data
 * Dictionary). These helpers map between UT instants and records.
 */
import type { EpwFile } from './epw.js';

const MS_PER_H = 3_600_000;

/** UT instant (ms) at which record i's hour ends, placing the record in calendar year `year`. */
export function epwIntervalEndMs(file: EpwFile, i: number, year: number): number {
  return Date.UTC(year, (file.month[i] ?? 1) - 1, file.day[i] ?? 1, file.hour[i] ?? 1) - file.location.timeZone_h * MS_PER_H;
}

/** Lookup of record indices by calendar day (month 1–12, day 1–31). */
export interface EpwDayIndex {
  /** Index of hour 1 of that day, or −1 if the file has no such day. */
  firstRecordOf(month: number, day: number): number;
}

export function epwDayIndex(file: EpwFile): EpwDayIndex {
  const table = new Int32Array(13 * 32).fill(-1);
  for (let i = 0; i < file.count; i++) {
    const k = (file.month[i] ?? 0) * 32 + (file.day[i] ?? 0);
    if (table[k] === -1) table[k] = i;
  }
  return { firstRecordOf: (m, d) => table[m * 32 + d] ?? -1 };
}

/**
 * Record whose hour contains the UT instant `epochMs` (hour-ending: an instant exactly on h:00
 * belongs to hour label h). The calendar year is ignored (typical-year files); 29 February
 * falls back to 28 February when the file has no leap day. Returns −1 when the file does not
 * cover that calendar day.
 */
export function epwRecordIndexAt(file: EpwFile, index: EpwDayIndex, epochMs: number): number {
  // Shift by a hair so h:00 exactly lands in the interval that ends at h:00.
  const local = new Date(epochMs + file.location.timeZone_h * MS_PER_H - 1);
  const month = local.getUTCMonth() + 1;
  const day = local.getUTCDate();
  const label = local.getUTCHours() + 1;
  let first = index.firstRecordOf(month, day);
  if (first < 0 && month === 2 && day === 29) first = index.firstRecordOf(2, 28);
  if (first < 0) return -1;
  return Math.min(file.count - 1, first + label - 1);
}
