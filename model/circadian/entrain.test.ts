import { describe, expect, it } from 'vitest';
import { entrain } from './entrain.js';
import { lightFromSteps } from './light-series.js';
import { createJfkX7 } from './jfk-x7.js';

describe('entrainment to a repeated day', () => {
  it('survives breakpoints that are not exact in binary (24 k + s − 24 k comes back a few ulps off)', () => {
    const light = lightFromSteps([0, 7.1, 13.3, 22.7], [0, 120.5, 333, 7], 'native_lx', 24);
    const e = entrain({ model: createJfkX7(), light, sleep: { mode: 'prescribed', episodes: [{ start_h: 23.3, end_h: 31.1 }] } });
    expect(e.converged).toBe(true);
    expect(e.state.t_h).toBe(0);
  });
});
