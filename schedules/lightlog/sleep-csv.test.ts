import { describe, expect, it } from 'vitest';
import { readSleepCsv } from './sleep-csv.js';

describe('sleep episodes file', () => {
  it('reads any delimiter with decimal commas, and joins episodes that touch', () => {
    expect(readSleepCsv('# nights\nstart_h;end_h\n23;31\n31;31,5\n47;54,25\n', 's.csv')).toEqual([
      { start_h: 23, end_h: 31.5 },
      { start_h: 47, end_h: 54.25 },
    ]);
  });

  it('names the file and line of every refusal, quoting the header with the file\'s delimiter', () => {
    const error = (text: string) => {
      try {
        readSleepCsv(text, 's.csv');
      } catch (e) {
        return (e as Error).message;
      }
      return '';
    };
    expect(error('')).toMatch(/^s\.csv, line 1: the file is empty/);
    expect(error('start;end\n1;2\n')).toMatch(/^s\.csv, line 1: header must be "start_h;end_h"/);
    expect(error('start_h,end_h\n23,22\n')).toMatch(/^s\.csv, line 2: end_h \(22\) must be after/);
    expect(error('start_h,end_h\n23,31\n30,33\n')).toMatch(/^s\.csv, line 3: .*overlaps.*line 2/);
    expect(error('start_h,end_h\n0,100\n')).toMatch(/^s\.csv, line 2: an episode of 100 h/);
    expect(error('start_h,end_h\n')).toMatch(/^s\.csv, line 1: no sleep episodes/);
  });
});
