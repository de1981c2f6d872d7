import { describe, expect, test } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { validateScenarioValue } from '../validation/validate-scenario.js';
import { WEEKDAYS } from '../schema/primitives.js';
import type { Luminaire } from '../schema/scenario-types.js';
import { luminaireOutputAt } from '../timeline/exposure-context.js';
import { luminaireWeek } from './luminaire-levels.js';

describe('luminaire schedule laid out per weekday', () => {
  test('equals the minute-by-minute reading of luminaireOutputAt for every demo luminaire (baseline and strategies), weekday and minute', () => {
    const s = validateScenarioValue(DEMO_SCENARIO).scenario;
    if (s === undefined) throw new Error('demo does not validate');
    const lums: Luminaire[] = s.places.flatMap((p) => (p.kind === 'room' ? p.luminaires : []));
    for (const st of s.strategies) for (const c of st.changes) if (c.op === 'add-luminaire') lums.push(c.luminaire);
    lums.push({ id: 'overlap', spectrum: { kind: 'cct', cct_K: 3000 }, eyeIlluminance_lx: 100, schedule: [{ start: '20:00', end: '02:00', level: 0.5, days: ['fri'] }, { start: '01:00', end: '03:00', level: 1, cct_K: 2700 }] });
    let compared = 0;
    for (const l of lums) {
      const w = luminaireWeek(l);
      for (const d of WEEKDAYS) {
        for (let m = 0; m < 1440; m++) {
          const ref = luminaireOutputAt(l, d, m);
          expect(w.level[d][m]).toBeCloseTo(ref.level, 6);
          const cct = w.cct_K[d][m] ?? Number.NaN;
          if (ref.cct_K === undefined) expect(Number.isNaN(cct)).toBe(true);
          else expect(cct).toBe(ref.cct_K);
          compared++;
        }
      }
    }
    expect(compared).toBeGreaterThan(70_000);
  });
});
