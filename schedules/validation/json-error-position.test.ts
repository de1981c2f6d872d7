import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonErrorOffset, positionAt } from './json-error-position.js';

describe('where a JSON text stops being JSON', () => {
  it('finds nothing wrong in any text JSON.stringify writes (the JavaScript engine as reference)', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.constantFrom(0, 2), (v, indent) => {
        expect(jsonErrorOffset(JSON.stringify(v, null, indent))).toBeUndefined();
      }),
      { numRuns: 300, seed: 7 },
    );
  });

  it('agrees with JSON.parse on whether damaged texts are JSON', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.nat(), fc.constantFrom(',', '}', ']', '"', ':', 'x', 'NaN', '\u0000', ' '), (v, at, stray) => {
        const text = JSON.stringify(v);
        const k = at % (text.length + 1);
        const damaged = text.slice(0, k) + stray + text.slice(k);
        let parses = true;
        try {
          JSON.parse(damaged);
        } catch {
          parses = false;
        }
        expect(jsonErrorOffset(damaged) === undefined).toBe(parses);
      }),
      { numRuns: 500, seed: 11 },
    );
  });

  it('points at the first wrong character, with its line and column', () => {
    const text = '{\n  "a": 1,\n  "b": 2,\n}\n';
    const offset = jsonErrorOffset(text);
    expect(offset).toBe(text.indexOf('}'));
    expect(positionAt(text, offset ?? 0)).toMatchObject({ line: 4, column: 1 });
    expect(jsonErrorOffset('{"a": [1, 2}')).toBe(11);
    expect(jsonErrorOffset('{"a": 1')).toBe(7);
    expect(jsonErrorOffset('[' .repeat(100_000))).toBe(100_000);
  });
});
