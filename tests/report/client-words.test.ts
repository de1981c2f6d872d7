// Every plain-language line the demo's strategies and places give a client (schedules/words) is
// free of internal codes: the scenario's ids, the format's fixed values, model ids and paths
// (client-text-checks.ts builds the list from the scenario and the registries).
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../schedules/demo/demo-scenario.js';
import { placeWords, strategyChangeWords } from '../../schedules/words/index.js';
import { codeTokens, internalCodesIn } from './client-text-checks.js';

describe('client words for the demo scenario', () => {
  it('list codes to look for: ids such as the office’s place id, format values such as a blinds rule, model ids', () => {
    const tokens = codeTokens(DEMO_SCENARIO);
    for (const t of ['office-floor-deep', 'manual-sun', 'blue-blocking', 'from-work', 'jfk99-x7-sh07', 'tpm-kss']) expect(tokens).toContain(t);
  });

  it('describe every strategy change without an id, a format value or an arrow', () => {
    for (const s of DEMO_SCENARIO.strategies ?? []) {
      for (const line of strategyChangeWords(DEMO_SCENARIO, s)) expect(internalCodesIn(line, DEMO_SCENARIO), line).toEqual([]);
    }
  });

  it('describe every place without an id or a format value', () => {
    for (const p of DEMO_SCENARIO.places) expect(internalCodesIn(placeWords(p), DEMO_SCENARIO), p.id).toEqual([]);
  });

  it('would catch the old wordings', () => {
    expect(internalCodesIn('nurse: eyewear → amber (commute journey home on night days)', DEMO_SCENARIO)).toContain('→');
    expect(internalCodesIn('Luminaire "panels" in office-floor: 450 lx', DEMO_SCENARIO)).toEqual(expect.arrayContaining(['office-floor', '"panels"']));
    expect(internalCodesIn('blinds: manual-sun; see docs/methods/circadian.md §4.4', DEMO_SCENARIO)).toEqual(expect.arrayContaining(['manual-sun', 'docs/methods/circadian.md']));
    expect(internalCodesIn('pacemaker: jfk99-x7-sh07', DEMO_SCENARIO)).toContain('jfk99-x7-sh07');
  });
});
