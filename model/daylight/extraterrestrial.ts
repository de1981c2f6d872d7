/**
 * Extraterrestrial normal irradiance and relative air mass.
 * I0 = Isc·(1.00011 + 0.034221 cos Γ + 0.00128 sin Γ + 0.000719 cos 2Γ + 0.000077 sin 2Γ),
 * Γ = 2π(doy − 1)/365 (Spencer 1971 series, as used by open-source sky generators), Isc = 1367 W/m² (same source).
 */
export const SOLAR_CONSTANT_W_M2 = 1367;

let lastDoy = Number.NaN;
let lastFactor = 1;
export function extraterrestrialNormal_W_m2(dayOfYear: number, solarConstant_W_m2 = SOLAR_CONSTANT_W_M2): number {
  if (dayOfYear !== lastDoy) {
    const g = (2 * Math.PI * (dayOfYear - 1)) / 365;
    lastFactor = 1.00011 + 0.034221 * Math.cos(g) + 0.00128 * Math.sin(g) + 0.000719 * Math.cos(2 * g) + 0.000077 * Math.sin(2 * g);
    lastDoy = dayOfYear; // memoised: per-minute callers ask for the same day many times
  }
  return solarConstant_W_m2 * lastFactor;
}

/** Day of year (1–366) of a UT instant (memoised for the last day asked; per-minute callers repeat it). */
let lastDay = Number.NaN;
let lastDayOfYear = 1;
export function dayOfYearUtc(epochMs: number): number {
  const day = Math.floor(epochMs / 86_400_000);
  if (day !== lastDay) {
    const d = new Date(epochMs);
    lastDayOfYear = Math.floor((epochMs - Date.UTC(d.getUTCFullYear(), 0, 1)) / 86_400_000) + 1;
    lastDay = day;
  }
  return lastDayOfYear;
}

/** Relative air mass, Kasten (1966): 1/(cos θz + 0.15 (93.885 − θz)^−1.253), θz in degrees. */
export function airMassKasten1966(zenith_deg: number): number {
  if (zenith_deg >= 93.885) return Number.NaN;
  return 1 / (Math.cos((zenith_deg * Math.PI) / 180) + 0.15 * (93.885 - zenith_deg) ** -1.253);
}

/** Relative air mass, Kasten & Young (1989): 1/(cos θz + 0.50572 (96.07995 − θz)^−1.6364). */
export function airMassKastenYoung1989(zenith_deg: number): number {
  if (zenith_deg >= 96.07995) return Number.NaN;
  return 1 / (Math.cos((zenith_deg * Math.PI) / 180) + 0.50572 * (96.07995 - zenith_deg) ** -1.6364);
}
