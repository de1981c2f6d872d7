import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../schema/scenario-schema.js';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { expandScenario } from './expand-scenario.js';
import { clockWindowHolds, exposureContext, luminaireOutputAt } from './exposure-context.js';
import type { Luminaire } from '../schema/scenario-types.js';

const lum: Luminaire = {
  id: 'x',
  spectrum: { kind: 'cct', cct_K: 4000 },
  eyeIlluminance_lx: 100,
  schedule: [
    { start: '07:00', end: '19:00', level: 1, days: ['mon', 'tue', 'wed', 'thu', 'fri'] },
    { start: '22:00', end: '02:00', level: 0.5, days: ['fri'] },
  ],
};

describe('luminaire schedule', () => {
  it('is on during a weekday entry and off at the weekend', () => {
    expect(luminaireOutputAt(lum, 'mon', 8 * 60).level).toBe(1);
    expect(luminaireOutputAt(lum, 'sat', 8 * 60).level).toBe(0);
  });
  it('carries an entry past midnight into the next day with the weekday it started on', () => {
    expect(luminaireOutputAt(lum, 'sat', 60).level).toBe(0.5);
    expect(luminaireOutputAt(lum, 'fri', 60).level).toBe(0);
  });
  it('reads clock windows across midnight', () => {
    expect(clockWindowHolds('20:00', '07:00', 23 * 60)).toBe(true);
    expect(clockWindowHolds('20:00', '07:00', 6 * 60)).toBe(true);
    expect(clockWindowHolds('20:00', '07:00', 12 * 60)).toBe(false);
  });
});

describe('exposure context', () => {
  it('resolves the amber glasses of the journey home after a night shift to a melanopic filter', () => {
    const s = scenarioSchema.parse(DEMO_SCENARIO);
    const ex = expandScenario(s);
    const t = ex.timelines.find((x) => x.strategyId === 'ward-amber-drive-home');
    const v = ex.variants.find((x) => x.id === 'ward-amber-drive-home');
    const nurse = v?.scenario.personas.find((p) => p.id === 'nurse');
    const slice = t?.slices.find((x) => x.eyewearId === 'amber');
    if (slice === undefined || v === undefined || nurse === undefined) throw new Error('demo changed');
    const ctx = exposureContext(v.scenario, nurse, slice, 7 * 60 + 10);
    expect(ctx.place.kind).toBe('vehicle');
    expect(ctx.eyewear?.melanopicTransmittance).toBeLessThan(ctx.eyewear?.photopicTransmittance ?? 0);
  });
});
