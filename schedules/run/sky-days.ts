/**
 * Sky condition of each local day drawn from the scenario's seasonal sky mix: a uniform number
 * per (seed, date) from the SplitMix64 finaliser (Steele, Lea & Flood 2014; model/cohort), so
 * the same seed gives the same days whatever the run length or start, and the shares of the
 * mix are met on average.
 */
import { mix64 } from '../../model/cohort/index.js';
import type { SkyCondition } from '../../model/daylight/index.js';
import type { Site } from '../schema/scenario-types.js';

type SkyModel = Extract<Site['weather'], { kind: 'sky-model' }>;

function uniformFor(seed: number, date: string): number {
  const [y, m, d] = date.split('-').map(Number);
  const dayNumber = Math.floor(Date.UTC(y ?? 1970, (m ?? 1) - 1, d ?? 1) / 86_400_000);
  const h = mix64((BigInt(seed) << 32n) ^ BigInt(dayNumber + 1_000_000));
  return Number(h >> 11n) / 2 ** 53;
}

export function skyConditionForDay(weather: SkyModel, date: string): SkyCondition {
  const month = Number(date.slice(5, 7));
  const season = weather.seasons.find((s) => s.months.includes(month)) ?? weather.seasons[0];
  if (season === undefined) return 'intermediate';
  const u = uniformFor(weather.seed, date);
  const total = season.clear + season.intermediate + season.overcast;
  if (u * total < season.clear) return 'clear';
  if (u * total < season.clear + season.intermediate) return 'intermediate';
  return 'overcast';
}
