/** `zeitlight models` lists the sleepiness (KSS) models with their sources and marks the headline. */
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main.js';
import { HEADLINE_SLEEPINESS_ID, SLEEPINESS_MODEL_IDS } from '../../model/circadian/sleepiness-registry.js';

async function cli(args: string[]): Promise<{ code: number; out: string }> {
  let out = '';
  const code = await runCli(args, { stdout: (t) => (out += t), stderr: () => undefined });
  return { code, out };
}

describe('zeitlight models: sleepiness', () => {
  it('lists every sleepiness model with source and parameters, exactly one headline (JSON)', async () => {
    const r = await cli(['models', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as { sleepiness: { id: string; headline: boolean; source: string; parameters: Record<string, number> }[] };
    expect(doc.sleepiness.map((m) => m.id)).toEqual([...SLEEPINESS_MODEL_IDS]);
    expect(doc.sleepiness.filter((m) => m.headline).map((m) => m.id)).toEqual([HEADLINE_SLEEPINESS_ID]);
    expect(doc.sleepiness.find((m) => m.id === 'postnova18-kss')?.parameters.kss0).toBe(-24.34);
    expect(doc.sleepiness.find((m) => m.id === 'tpm-kss')?.source).toContain('Åkerstedt & Folkard 1997');
  });

  it('prints the sleepiness models as a table with the headline starred', async () => {
    const r = await cli(['models']);
    expect(r.out).toContain(`${HEADLINE_SLEEPINESS_ID} *`);
    expect(r.out).toContain('Postnova, Lockley & Robinson 2018');
  });
});
