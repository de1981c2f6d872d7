import { describe, expect, test } from 'vitest';
import { skyConditionForDay } from './sky-days.js';

const weather = { kind: 'sky-model' as const, seed: 3, seasons: [{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], clear: 0.2, intermediate: 0.3, overcast: 0.5 }] };

function dates(n: number): string[] {
  return Array.from({ length: n }, (_, i) => new Date(Date.UTC(2000, 0, 1) + i * 86_400_000).toISOString().slice(0, 10));
}

describe('sky condition per day', () => {
  test('meets the mix shares over many days (law of large numbers: 4000 days, 3 standard errors ≈ 0.024)', () => {
    const ds = dates(4000).map((d) => skyConditionForDay(weather, d));
    const share = (c: string) => ds.filter((x) => x === c).length / ds.length;
    expect(Math.abs(share('clear') - 0.2)).toBeLessThan(0.024);
    expect(Math.abs(share('intermediate') - 0.3)).toBeLessThan(0.024);
    expect(Math.abs(share('overcast') - 0.5)).toBeLessThan(0.024);
  });

  test('depends on the seed and the date only, not on the run start', () => {
    const d = dates(30);
    expect(d.slice(10).map((x) => skyConditionForDay(weather, x))).toEqual(d.map((x) => skyConditionForDay(weather, x)).slice(10));
    expect(d.map((x) => skyConditionForDay({ ...weather, seed: 4 }, x))).not.toEqual(d.map((x) => skyConditionForDay(weather, x)));
  });
});
