/** Sense checks on persona traits and cohort spreads, each error naming its field. */
import type { CohortSpread, PersonaTraits } from './occupant-traits.js';

function finite(value: number, field: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${field}: must be a finite number, got ${String(value)}`);
}

export function assertPersonaTraits(p: PersonaTraits): void {
  finite(p.intrinsicPeriod_h, 'intrinsicPeriod_h');
  // 20–28 h: far outside every measured human period (23.5–24.9 h in Eastman et al. 2012,
  // Duffy 2011 range) yet wide enough for what-if personas; common practice.
  if (p.intrinsicPeriod_h < 20 || p.intrinsicPeriod_h > 28) throw new RangeError(`intrinsicPeriod_h: must lie in 20–28 h, got ${p.intrinsicPeriod_h}`);
  finite(p.lightSensitivity, 'lightSensitivity');
  if (p.lightSensitivity <= 0) throw new RangeError(`lightSensitivity: must be > 0, got ${p.lightSensitivity}`);
  finite(p.age_y, 'age_y');
  if (p.age_y < 0 || p.age_y > 120) throw new RangeError(`age_y: must lie in 0–120, got ${p.age_y}`);
}

export function assertCohortSpread(s: CohortSpread): void {
  for (const [field, v] of [
    ['intrinsicPeriodSd_h', s.intrinsicPeriodSd_h],
    ['lightSensitivitySdLn', s.lightSensitivitySdLn],
    ['habitualMidSleepSd_h', s.habitualMidSleepSd_h],
  ] as const) {
    finite(v, field);
    if (v < 0) throw new RangeError(`${field}: a spread cannot be negative, got ${v}`);
  }
  if (s.intrinsicPeriodSd_h > 1) throw new RangeError(`intrinsicPeriodSd_h: at most 1 h, got ${s.intrinsicPeriodSd_h}`);
  if (s.habitualMidSleepSd_h > 6) throw new RangeError(`habitualMidSleepSd_h: at most 6 h, got ${s.habitualMidSleepSd_h}`);
  if (s.lightSensitivitySdLn > 3) throw new RangeError(`lightSensitivitySdLn: at most 3, got ${s.lightSensitivitySdLn}`);
  if (s.ageRange_y !== null) {
    const [min, max] = s.ageRange_y;
    finite(min, 'ageRange_y[0]');
    finite(max, 'ageRange_y[1]');
    if (min < 0 || max > 120 || min > max) throw new RangeError(`ageRange_y: need 0 ≤ min ≤ max ≤ 120, got [${min}, ${max}]`);
  }
}
