import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatRosterPattern, MAX_CYCLE_DAYS, parseRosterPattern, RosterPatternError } from './roster-pattern.js';

const LETTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';
const ID_CHARS = `${LETTERS}0123456789-_`;
const letter = fc.constantFrom(...LETTERS.split(''));
const shiftId = fc
  .tuple(letter, fc.array(fc.constantFrom(...ID_CHARS.split('')), { maxLength: 10 }))
  .map(([first, rest]) => first + rest.join(''));
const cycleArb = fc.array(fc.oneof(shiftId, fc.constant('rest')), { minLength: 1, maxLength: 60 });
const separatorRun = fc.array(fc.constantFrom(' ', '\t', ','), { minLength: 1, maxLength: 3 }).map((a) => a.join(''));
const optionalSeparators = fc.array(fc.constantFrom(' ', '\t', ','), { maxLength: 3 }).map((a) => a.join(''));

/** A well-formed pattern written in any of the accepted ways: counts or repeats, "rest" or ".", any separators. */
const patternArb = fc
  .tuple(
    fc.array(fc.tuple(fc.integer({ min: 1, max: 5 }), fc.oneof(shiftId, fc.constant('rest'), fc.constant('.')), fc.boolean(), separatorRun), { minLength: 1, maxLength: 20 }),
    optionalSeparators,
    optionalSeparators,
  )
  .map(([items, lead, trail]) => {
    const parts = items.map(([n, code, withCount, sep]) => ({ text: withCount || n === 1 ? `${n === 1 && !withCount ? '' : n}${code}` : Array.from({ length: n }, () => code).join(' '), sep }));
    return lead + parts.map((p, k) => (k === 0 ? p.text : p.sep + p.text)).join('') + trail;
  });

function errorOf(text: string, shiftIds?: readonly string[]): RosterPatternError {
  try {
    parseRosterPattern(text, shiftIds === undefined ? {} : { shiftIds });
  } catch (err) {
    if (err instanceof RosterPatternError) return err;
    throw err;
  }
  throw new Error(`"${text}" was accepted`);
}

describe('roster pattern grammar', () => {
  it('reads counted codes, repeated codes and "." for a day off as the same cycle', () => {
    const cycle = ['D', 'D', 'E', 'E', 'N', 'N', 'N', 'rest', 'rest', 'rest', 'rest'];
    expect(parseRosterPattern('2D 2E 3N 4rest')).toEqual(cycle);
    expect(parseRosterPattern('D D E E N N N R R R R').slice(7)).toEqual(['R', 'R', 'R', 'R']);
    expect(parseRosterPattern(' D,D E\tE N N N . . . . ')).toEqual(cycle);
    expect(parseRosterPattern('2D,2E,3N,4.')).toEqual(cycle);
  });

  it('writes runs of one code as a count and days off as "rest"', () => {
    expect(formatRosterPattern(['early', 'early', 'late', 'night', 'night', 'night', 'rest', 'rest'])).toBe('2early late 3night 2rest');
  });

  it('round trip: cycle → pattern → cycle gives the same cycle', () => {
    fc.assert(
      fc.property(cycleArb, (cycle) => {
        expect(parseRosterPattern(formatRosterPattern(cycle))).toEqual(cycle);
      }),
    );
  });

  it('round trip: pattern → cycle → pattern → cycle gives the same cycle, however the pattern was written', () => {
    fc.assert(
      fc.property(patternArb, (pattern) => {
        const cycle = parseRosterPattern(pattern);
        const printed = formatRosterPattern(cycle);
        expect(parseRosterPattern(printed)).toEqual(cycle);
        expect(formatRosterPattern(parseRosterPattern(printed))).toBe(printed);
      }),
    );
  });

  it('refuses a character that no pattern may hold at exactly its position, wherever it is put', () => {
    const bad = fc.constantFrom(';', '#', '!', '(', '+', '/', '*', 'é', '"', '\n');
    fc.assert(
      fc.property(patternArb, bad, fc.nat(), (pattern, ch, at) => {
        const i = at % (pattern.length + 1);
        const err = errorOf(pattern.slice(0, i) + ch + pattern.slice(i));
        expect(err.position).toBe(i);
        expect(err.message).toContain(`character ${i + 1}: expected`);
      }),
    );
  });

  it('refuses a count that does not touch its code at the character after the count', () => {
    fc.assert(
      fc.property(patternArb, fc.integer({ min: 1, max: 366 }), fc.constantFrom(' ', ',', '\t', ''), (pattern, n, after) => {
        const text = `${pattern} ${n}${after}`;
        const err = errorOf(text);
        expect(err.position).toBe(pattern.length + 1 + String(n).length);
        expect(err.expected).toContain('shift code right after the count');
      }),
    );
  });

  it('refuses an empty pattern, a zero or too large count and a too long cycle with their positions', () => {
    expect(errorOf('').position).toBe(0);
    expect(errorOf(' ,\t').position).toBe(3);
    expect(errorOf('2D 0N').position).toBe(3);
    expect(errorOf('2D 03N').expected).toContain('no leading zero');
    expect(errorOf('D 367N').position).toBe(2);
    const tooLong = errorOf(`300D 60E 7N`);
    expect(tooLong.position).toBe(9);
    expect(tooLong.expected).toContain(`at most ${MAX_CYCLE_DAYS} days`);
    expect(errorOf(`D ${'x'.repeat(70)}`).position).toBe(2 + 64);
  });

  it('refuses a code that is not one of the given shifts at the code, naming the shifts it expected', () => {
    const err = errorOf('2early 3nite rest', ['early', 'night']);
    expect(err.position).toBe(8);
    expect(err.message).toBe('roster pattern, character 9: expected "rest" or one of the shifts "early", "night", found "nite"');
    expect(parseRosterPattern('2early 3night .', { shiftIds: ['early', 'night'] })).toHaveLength(6);
  });

  it('reads any text either into a cycle that prints back the same, or refuses it with a position inside the text', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom(...`${ID_CHARS} ,\t.;0`.split('')), maxLength: 40 }), (text) => {
        let cycle: string[];
        try {
          cycle = parseRosterPattern(text);
        } catch (err) {
          expect(err).toBeInstanceOf(RosterPatternError);
          const e = err as RosterPatternError;
          expect(e.position).toBeGreaterThanOrEqual(0);
          expect(e.position).toBeLessThanOrEqual(text.length);
          expect(e.message).toContain('expected');
          return;
        }
        expect(cycle.length).toBeGreaterThan(0);
        expect(parseRosterPattern(formatRosterPattern(cycle))).toEqual(cycle);
      }),
    );
  });
});
