import { describe, expect, it } from 'vitest';
import { filterTransmittance, listFilters } from './filters.js';
import { alphaOpicDer, illuminantD65 } from '../photometry/alpha-opic.js';
import { applyTransmittance } from '../photometry/spectrum.js';

describe('parametric spectral filters', () => {
  it('every built-in filter is a transmittance between 0 and 1 and is marked parametric', () => {
    for (const f of listFilters()) {
      expect(f.parametric).toBe(true);
      for (const v of filterTransmittance(f.id).values) {
        expect(v).toBeGreaterThanOrEqual(0);
        expect(v).toBeLessThanOrEqual(1);
      }
    }
  });

  it('neutral filters keep the melanopic DER of daylight; amber eyewear cuts it below 0.3', () => {
    const d65 = illuminantD65();
    expect(alphaOpicDer(applyTransmittance(d65, filterTransmittance('glazing-grey'))).mel).toBeCloseTo(1, 3);
    expect(alphaOpicDer(applyTransmittance(d65, filterTransmittance('eyewear-amber'))).mel).toBeLessThan(0.3);
  });

  it('names the known filters when asked for an unknown one', () => {
    expect(() => filterTransmittance('rose-tinted')).toThrow(/known filters: glazing-clear/);
  });
});
