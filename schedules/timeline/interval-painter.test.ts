import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { IntervalPainter } from './interval-painter.js';

describe('interval painter', () => {
  it('lets a later paint overwrite the middle of an earlier one', () => {
    const p = new IntervalPainter<string>();
    p.paint(0, 100, 'a');
    p.paint(40, 60, 'b');
    expect(p.intervals()).toEqual([
      { start: 0, end: 40, value: 'a' },
      { start: 40, end: 60, value: 'b' },
      { start: 60, end: 100, value: 'a' },
    ]);
  });
  it('agrees with a naive per-unit array for random paints (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 50 }), fc.integer({ min: 0, max: 50 })), { maxLength: 20 }), (paints) => {
        const p = new IntervalPainter<number>();
        const naive: (number | undefined)[] = Array.from({ length: 50 }, () => undefined);
        paints.forEach(([a, b], k) => {
          p.paint(a, b, k);
          for (let x = a; x < b; x++) naive[x] = k;
        });
        const fromPainter: (number | undefined)[] = Array.from({ length: 50 }, () => undefined);
        let prevEnd = -1;
        for (const it of p.intervals()) {
          expect(it.start).toBeGreaterThanOrEqual(prevEnd);
          prevEnd = it.end;
          for (let x = it.start; x < it.end; x++) fromPainter[x] = it.value;
        }
        expect(fromPainter).toEqual(naive);
      }),
    );
  });
});
