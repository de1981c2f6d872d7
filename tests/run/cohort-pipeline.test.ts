/**
 * Cohorts through the real pipeline and worker pool (compiled code in dist/, needs `npm run build`):
 *  - zero spread: every occupant is the persona, so the cohort median of each headline metric is
 *    exactly the single-person value of `runScenario` (a quantile of identical values is that
 *    value — Hyndman & Fan 1996, definition 7);
 *  - stop rule: the cohort ends at the first checkpoint where every running median and IQR moved
 *    by no more than its tolerance over the last batch, and what it keeps is exactly the first k
 *    occupants of a longer cohort (the readout sees only the occupant-ordered prefix);
 *  - habitual sleep timing reaches the model: with only the mid-sleep shift varying, the cohort's
 *    sleep duration of the desk worker spreads (a later sleeper cannot sleep into work), while a
 *    zero shift leaves it at the written value.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, test } from 'vitest';
import { PROJECT_ROOT } from '../helpers/run-cli.js';
import { DEMO_SCENARIO } from '../../schedules/index.js';
import { validateScenarioValue } from '../../schedules/validation/validate-scenario.js';
import type * as CohortRuns from '../../cli/run-output/cohort-runs.js';
import type * as RunModule from '../../schedules/run/index.js';
import { zeroCohortSpread } from '../../model/cohort/occupant-traits.js';

const dist = (p: string) => join(PROJECT_ROOT, 'dist', p);
const built = existsSync(dist('cli/run-output/cohort-job.js')) && existsSync(dist('schedules/run/cohort-occupant.js'));

function twoDayDeskWorker() {
  const v = validateScenarioValue({
    ...DEMO_SCENARIO,
    run: { startDate: '2026-03-23', days: 2 },
    personas: DEMO_SCENARIO.personas.slice(1),
    strategies: (DEMO_SCENARIO.strategies ?? []).filter((s) => s.personas?.includes('desk-worker')),
    rosters: [],
  });
  if (v.scenario === undefined) throw new Error('test scenario invalid');
  return v.scenario;
}

describe.skipIf(!built)('cohorts through the whole pipeline', () => {
  const load = async () => ({
    cohorts: (await import(pathToFileURL(dist('cli/run-output/cohort-runs.js')).href)) as typeof CohortRuns,
    run: (await import(pathToFileURL(dist('schedules/run/index.js')).href)) as typeof RunModule,
  });
  const scenario = twoDayDeskWorker();

  test('a cohort with zero spread has exactly the single-person result as its median', async () => {
    const { cohorts, run } = await load();
    const single = run.runScenario({ scenario }).results.personas[0];
    const section = await cohorts.runCohorts({ scenario }, 3, 5, { workers: 2, spread: zeroCohortSpread() });
    const summary = section.personas[0]?.summary;
    if (single === undefined || summary === undefined) throw new Error('missing results');
    let compared = 0;
    for (const s of single.strategies) {
      for (const metric of section.metrics) {
        const expected = s.summary[metric as keyof typeof s.summary];
        const got = summary.strategies[s.id]?.[metric];
        if (typeof expected === 'number') {
          expect(got?.median, `${s.id}/${metric}`).toBe(expected);
          expect(got?.iqr, `${s.id}/${metric}`).toBe(0);
          compared++;
        } else expect(got?.n ?? 0).toBe(0);
      }
    }
    expect(compared).toBeGreaterThan(10);
  }, 180_000);

  test('the stop rule ends the cohort at the first settled checkpoint and keeps exactly that prefix', async () => {
    const { cohorts } = await load();
    // Generous tolerance: settles at the first eligible checkpoint (minOccupants).
    const loose = await cohorts.runCohorts({ scenario }, 24, 9, { workers: 2, stopRule: { batchSize: 4, minOccupants: 8, tolerance: { default: 1e9 } } });
    expect(loose.personas[0]?.converged_at).toBe(8);
    expect(loose.personas[0]?.occupants_run).toBe(8);
    const first8 = await cohorts.runCohorts({ scenario }, 8, 9, { workers: 1 });
    expect(loose.personas[0]?.summary).toEqual(first8.personas[0]?.summary);
    // Zero tolerance with spread-out traits: never settles, every occupant runs.
    const strict = await cohorts.runCohorts({ scenario }, 12, 9, { workers: 2, stopRule: { batchSize: 4, minOccupants: 8, tolerance: { default: 0 } } });
    expect(strict.personas[0]?.converged_at).toBeNull();
    expect(strict.personas[0]?.occupants_run).toBe(12);
  }, 240_000);

  test('the habitual mid-sleep shift changes sleep in the model; none leaves it as written', async () => {
    const { cohorts } = await load();
    const onlySleep = { ...zeroCohortSpread(), habitualMidSleepSd_h: 1.27 };
    const shifted = await cohorts.runCohorts({ scenario }, 8, 3, { workers: 2, spread: onlySleep });
    const none = await cohorts.runCohorts({ scenario }, 4, 3, { workers: 2, spread: zeroCohortSpread() });
    const dur = (s: typeof shifted) => s.personas[0]?.summary.strategies['baseline']?.['mean_sleep_duration_h'];
    expect(dur(none)?.iqr).toBe(0);
    expect((dur(shifted)?.max ?? 0) - (dur(shifted)?.min ?? 0)).toBeGreaterThan(0.1);
  }, 240_000);
});
