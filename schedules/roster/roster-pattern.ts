/**
 * Roster patterns: a compact text for a roster's cycle, one code per day, read and written
 * without loss. "2D 2E 3N 4rest" and "D D E E N N N . . . ." are the same eleven-day cycle
 * ["D","D","E","E","N","N","N","rest","rest","rest","rest"].
 *
 * Grammar (the notation is Zeitlight's own; docs/scenario-format.md#roster-patterns):
 *
 *   pattern   = separator* item (separator+ item)* separator*
 *   separator = " " | tab | ","
 *   item      = count? code
 *   count     = digit 1–9, then digits        (1 to 366 days, no leading zero)
 *   code      = shift id | "rest" | "."      ("." is one day off, like "rest")
 *   shift id  = letter, then up to 63 letters, digits, "-" or "_" (the scenario's identifier rule)
 *
 * A count must touch its code ("3N", not "3 N"). A cycle holds 1 to 366 days. Positions in
 * errors are 0-based offsets into the text (UTF-16 code units, as JavaScript indexes strings).
 */
import { REST_DAY } from '../schema/roster-schema.js';

/** Longest cycle a roster may have, in days (schedules/schema/roster-schema.ts). */
export const MAX_CYCLE_DAYS = 366;
const MAX_CODE_LENGTH = 64;
const REST_SHORTHAND = '.';

/** A pattern that cannot be read: where (0-based offset) and what was expected there. */
export class RosterPatternError extends Error {
  override readonly name = 'RosterPatternError';
  constructor(
    readonly position: number,
    readonly expected: string,
    readonly found: string,
  ) {
    super(`roster pattern, character ${position + 1}: expected ${expected}, found ${found}`);
  }
}

export interface RosterPatternOptions {
  /** When given, every code other than rest must be one of these shift ids. */
  readonly shiftIds?: Iterable<string>;
}

const isSeparator = (ch: string | undefined): boolean => ch === ' ' || ch === '\t' || ch === ',';
const isDigit = (ch: string | undefined): boolean => ch !== undefined && ch >= '0' && ch <= '9';
const isLetter = (ch: string | undefined): boolean => ch !== undefined && ((ch >= 'A' && ch <= 'Z') || (ch >= 'a' && ch <= 'z'));
const isIdChar = (ch: string | undefined): boolean => isLetter(ch) || isDigit(ch) || ch === '-' || ch === '_';

function foundAt(text: string, i: number): string {
  if (i >= text.length) return 'the end of the pattern';
  const ch = text.codePointAt(i) ?? 0;
  return JSON.stringify(String.fromCodePoint(ch));
}

function list(ids: readonly string[]): string {
  return ids.map((s) => `"${s}"`).join(', ');
}

/** The cycle a pattern describes; throws RosterPatternError at the first character that does not fit. */
export function parseRosterPattern(text: string, options: RosterPatternOptions = {}): string[] {
  const known = options.shiftIds === undefined ? undefined : [...options.shiftIds];
  const fail = (i: number, expected: string): never => {
    throw new RosterPatternError(i, expected, foundAt(text, i));
  };
  const cycle: string[] = [];
  let i = 0;
  const skipSeparators = (): void => {
    while (isSeparator(text[i])) i++;
  };
  skipSeparators();
  if (i >= text.length) fail(i, 'a shift code, or "rest" for a day off');
  while (i < text.length) {
    const itemStart = i;
    let count = 1;
    if (isDigit(text[i])) {
      if (text[i] === '0') fail(i, 'a count from 1 to 366 (no leading zero)');
      const from = i;
      while (isDigit(text[i])) i++;
      count = Number(text.slice(from, i));
      if (count > MAX_CYCLE_DAYS) fail(from, `a count from 1 to ${MAX_CYCLE_DAYS}`);
      if (!isLetter(text[i]) && text[i] !== REST_SHORTHAND) fail(i, 'a shift code right after the count (as in "3N")');
    }
    let code: string;
    const codeStart = i;
    if (text[i] === REST_SHORTHAND) {
      i++;
      code = REST_DAY;
    } else if (isLetter(text[i])) {
      while (isIdChar(text[i])) i++;
      code = text.slice(codeStart, i);
      if (code.length > MAX_CODE_LENGTH) fail(codeStart + MAX_CODE_LENGTH, `a shift code of at most ${MAX_CODE_LENGTH} characters`);
      if (known !== undefined && code !== REST_DAY && !known.includes(code)) {
        throw new RosterPatternError(codeStart, `"${REST_DAY}" or one of the shifts ${list(known)}`, JSON.stringify(code));
      }
    } else {
      code = fail(i, 'a shift code (a letter first), "rest" or "." for a day off, or a count');
    }
    if (cycle.length + count > MAX_CYCLE_DAYS) fail(itemStart, `at most ${MAX_CYCLE_DAYS} days in the cycle`);
    for (let k = 0; k < count; k++) cycle.push(code);
    if (i < text.length && !isSeparator(text[i])) fail(i, 'a space or comma before the next day');
    skipSeparators();
  }
  return cycle;
}

/** The shortest pattern for a cycle: runs of the same code as "3N", days off as "rest", items spaced. */
export function formatRosterPattern(cycle: readonly string[]): string {
  const items: string[] = [];
  let k = 0;
  while (k < cycle.length) {
    const code = cycle[k] ?? REST_DAY;
    let n = 1;
    while (cycle[k + n] === code) n++;
    items.push(n === 1 ? code : `${n}${code}`);
    k += n;
  }
  return items.join(' ');
}
