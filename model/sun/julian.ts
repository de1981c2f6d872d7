/**
 * Julian day from a UT instant. The Unix epoch 1970-01-01T00:00Z is JD 2440587.5; JavaScript
 * times count proleptic Gregorian milliseconds from it, which equals the SPA calendar formula
 * (Reda & Andreas 2004, Eq. 4) for Gregorian dates (after 1582-10-15).
 */
export const JD_UNIX_EPOCH = 2440587.5;
export const MS_PER_DAY = 86_400_000;
/** J2000.0 epoch (JD). */
export const JD_J2000 = 2451545;

export function julianDayFromEpochMs(epochMs: number): number {
  return epochMs / MS_PER_DAY + JD_UNIX_EPOCH;
}

export function epochMsFromJulianDay(jd: number): number {
  return (jd - JD_UNIX_EPOCH) * MS_PER_DAY;
}
