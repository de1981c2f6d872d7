import { describe, expect, it } from 'vitest';
import { personaSchema } from '../schema/personas-schema.js';
import { runSettingsSchema } from '../schema/scenario-schema.js';
import { repairForChecks } from './repair-for-checks.js';

describe('stand-ins for fields that failed the schema', () => {
  it('replaces a number out of range by its bound and a wrong type by a plain value, and says where', () => {
    const r = repairForChecks({ startDate: 20260101, days: 0 }, runSettingsSchema);
    expect(r?.data.days).toBe(1);
    expect(typeof r?.data.startDate).toBe('string');
    expect(r?.replaced.map((p) => p.join('.')).sort()).toEqual(['days', 'startDate']);
  });

  it('keeps every valid field of a persona as written, so its references can still be checked', () => {
    const persona = { id: 'ana', name: 'Ana', age_y: 'forty', home: 'flat', templates: { work: [] }, week: { mon: 'wrok', tue: 'work', wed: 'work', thu: 'work', fri: 'work', sat: 'work', sun: 'work' } };
    const r = repairForChecks(persona, personaSchema);
    expect(r?.data.week?.mon).toBe('wrok');
    expect(r?.data.home).toBe('flat');
    expect(r?.replaced).toEqual([['age_y']]);
  });

  it('gives up on a value that is not an object at all', () => {
    expect(repairForChecks('a persona', personaSchema)).toBeUndefined();
  });
});
