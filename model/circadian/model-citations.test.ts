import { describe, expect, it } from 'vitest';
import { melatoninCitation, PACEMAKER_PAPERS, pacemakerCitation, PAPERS, SLEEPINESS_PAPERS, sleepinessCitation } from './model-citations.js';
import { createPacemaker, PACEMAKER_IDS } from './registry.js';
import { SLEEPINESS_MODEL_IDS, SLEEPINESS_MODELS } from './sleepiness-registry.js';

describe('model citations', () => {
  it('cite, for every body-clock model, only papers its technical source names (year and journal volume:page)', () => {
    for (const id of PACEMAKER_IDS) {
      const source = createPacemaker(id).source;
      for (const p of PACEMAKER_PAPERS[id]) {
        expect(source, id).toContain(`${p.year} ${p.journal}`);
      }
    }
  });

  it('cite, for every sleepiness model, only papers its technical source names', () => {
    for (const id of SLEEPINESS_MODEL_IDS) {
      for (const p of SLEEPINESS_PAPERS[id]) expect(SLEEPINESS_MODELS[id].source, id).toContain(`${p.year} ${p.journal}`);
    }
  });

  it('write every citation as "Authors Year, Journal Volume:Page" joined by semicolons', () => {
    expect(pacemakerCitation('jfk99-x7-sh07')).toBe('Jewett, Forger & Kronauer 1999, J Biol Rhythms 14:493; St Hilaire, Klerman, Khalsa, Wright, Czeisler & Kronauer 2007, J Theor Biol 247:583');
    expect(sleepinessCitation('postnova18-kss')).toBe('Postnova, Lockley & Robinson 2018, J Biol Rhythms 33:203');
    expect(melatoninCitation()).toBe('St Hilaire, Gronfier, Zeitzer & Klerman 2007, J Pineal Res 43:294');
  });

  it('keep the two St Hilaire et al. 2007 papers apart by authors and journal', () => {
    expect(PAPERS.stHilaireLight07.authors).not.toBe(PAPERS.stHilaireMelatonin07.authors);
    expect(PAPERS.stHilaireLight07.journal).toMatch(/^J Theor Biol/);
    expect(PAPERS.stHilaireMelatonin07.journal).toMatch(/^J Pineal Res/);
  });
});
