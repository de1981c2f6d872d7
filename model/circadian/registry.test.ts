import { describe, expect, it } from 'vitest';
import { createPacemaker, DEFAULT_ENSEMBLE_PACEMAKERS, DEFAULT_PACEMAKER_ID, isPacemakerId, PACEMAKER_IDS } from './registry.js';

describe('pacemaker registry', () => {
  it('keeps the published ids and adds the St Hilaire 2007 front-end variants under their own ids', () => {
    for (const id of ['jfk99-x7', 'fjk99-cubic', 'fjk99-cubic-sf14', 'hfb19-sp', 'jfk99-x7-sh07', 'fjk99-cubic-sh07']) expect(isPacemakerId(id)).toBe(true);
    for (const id of PACEMAKER_IDS) expect(createPacemaker(id).id).toBe(id);
  });

  it('names the light front end and its source in every model', () => {
    expect(createPacemaker('jfk99-x7').processL.source).toMatch(/Kronauer, Forger & Jewett 1999/);
    expect(createPacemaker('jfk99-x7-sh07').processL.source).toMatch(/St Hilaire et al\. 2007 J Theor Biol/);
    expect(createPacemaker('fjk99-cubic-sh07').label).toMatch(/not published/);
    for (const id of PACEMAKER_IDS) expect(createPacemaker(id).source.length).toBeGreaterThan(20);
  });

  it('exports a default ensemble of at least three pacemakers of different oscillator families, the default first', () => {
    expect(DEFAULT_ENSEMBLE_PACEMAKERS.length).toBeGreaterThanOrEqual(3);
    expect(DEFAULT_ENSEMBLE_PACEMAKERS[0]).toBe(DEFAULT_PACEMAKER_ID);
    const families = new Set(DEFAULT_ENSEMBLE_PACEMAKERS.map((id) => createPacemaker(id).oscillator));
    expect(families.size).toBe(DEFAULT_ENSEMBLE_PACEMAKERS.length);
    expect(DEFAULT_ENSEMBLE_PACEMAKERS).not.toContain('fjk99-cubic-sh07');
  });
});
