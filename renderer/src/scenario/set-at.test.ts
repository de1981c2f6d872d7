import { describe, expect, it } from 'vitest';
import { getAt, setAt } from './set-at.js';

describe('path updates', () => {
  it('changes one value and shares every untouched branch', () => {
    const doc = { site: { name: 'A', ground: { reflectance: 0.2 } }, places: [{ id: 'x' }, { id: 'y' }] };
    const next = setAt(doc, ['places', 1, 'id'], 'z');
    expect(next.places[1]).toEqual({ id: 'z' });
    expect(doc.places[1]).toEqual({ id: 'y' });
    expect(next.site).toBe(doc.site);
    expect(next.places[0]).toBe(doc.places[0]);
    expect(getAt(next, ['places', 1, 'id'])).toBe('z');
  });

  it('removes a key when set to undefined', () => {
    expect(setAt({ a: 1, b: 2 }, ['b'], undefined)).toEqual({ a: 1 });
  });
});
