/**
 * The model ensemble stage on the built-in demo (2 personas × baseline + 4 strategies × 14 days):
 * the other body-clock models of the default ensemble re-run on the light at the eye the run has
 * already computed, each with both sleepiness models, plus ranges and ranks. Reported beside the
 * default run it follows, and for the interactive case (desk worker alone), which the app runs
 * after the default model's results are on screen (so it never delays them).
 * `*_first_ms`: first call in this process (the other models' limit cycles and entrainment).
 */
import { DEMO_SCENARIO, validateScenarioValue } from '../../schedules/index.js';
import { assembleEnsemble, planEnsemble, runEnsembleJob, runScenario, withEnsemble } from '../../schedules/run/index.js';
import { medianMs } from '../timing.js';

export async function bench(): Promise<Record<string, unknown>> {
  const v = validateScenarioValue(DEMO_SCENARIO);
  if (v.scenario === undefined) throw new Error('demo scenario does not validate');
  const scenario = v.scenario;
  const demo = runScenario({ scenario });
  const t0 = performance.now();
  withEnsemble(demo);
  const firstMs = performance.now() - t0;
  const plan = planEnsemble(demo);
  const demoMs = medianMs(() => withEnsemble(demo), 5, 1);
  const one = runScenario({ scenario, personaIds: ['desk-worker'] });
  const onePlan = planEnsemble(one);
  const interactiveMs = medianMs(() => assembleEnsemble(onePlan, onePlan.jobs.map((j) => runEnsembleJob(onePlan, j))), 5, 1);
  const job = onePlan.jobs[0];
  if (job === undefined) throw new Error('the interactive case has no ensemble job');
  const jobMs = medianMs(() => runEnsembleJob(onePlan, job), 5, 1);
  return {
    ensemble_members: plan.members.length,
    ensemble_jobs_demo: plan.jobs.length,
    ensemble_demo_first_ms: Math.round(firstMs),
    ensemble_demo_ms: Math.round(demoMs),
    ensemble_interactive_ms: Math.round(interactiveMs),
    ensemble_job_ms: Math.round(jobMs),
  };
}
