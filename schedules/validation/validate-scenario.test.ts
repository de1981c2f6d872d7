import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { validateScenarioText, validateScenarioValue } from './validate-scenario.js';

/** The demo as a scenario file gives it: a JSON round trip, so no two people share an object. */
function demoCopy(): Record<string, unknown> {
  return JSON.parse(JSON.stringify(DEMO_SCENARIO)) as Record<string, unknown>;
}

describe('scenario validation', () => {
  it('accepts the built-in demo with no problems at all', () => {
    const v = validateScenarioValue(demoCopy());
    expect(v.problems).toEqual([]);
    expect(v.ok).toBe(true);
    expect(v.scenario?.personas).toHaveLength(3);
  });

  it('names the exact path of a bad segment end and says how to fix it', () => {
    const doc = demoCopy() as { personas: { templates: Record<string, { end: string }[]> }[] };
    const seg = doc.personas[1]?.templates.workday?.[3];
    if (seg === undefined) throw new Error('demo changed');
    seg.end = '25:00';
    const v = validateScenarioValue(doc);
    expect(v.ok).toBe(false);
    expect(v.problems).toHaveLength(1);
    expect(v.problems[0]?.path).toBe('personas[1].templates.workday[3].end');
    expect(v.problems[0]?.fix).toMatch(/HH:MM/);
  });

  it('uses the week path form personas[1].week.tue[3].end for inline day plans', () => {
    const doc = demoCopy() as { personas: { week: Record<string, unknown>; templates: Record<string, unknown[]> }[] };
    const p = doc.personas[1];
    if (p === undefined) throw new Error('demo changed');
    const inline = structuredClone(p.templates.workday) as { end: string }[];
    const s3 = inline[3];
    if (s3 === undefined) throw new Error('demo changed');
    s3.end = 'noon';
    p.week.tue = inline;
    const v = validateScenarioValue(doc);
    expect(v.problems.map((x) => x.path)).toEqual(['personas[1].week.tue[3].end']);
  });

  it('lists every problem, not only the first', () => {
    const doc = demoCopy() as { site: Record<string, unknown>; personas: Record<string, unknown>[] };
    doc.site.latitude_deg = 123;
    doc.site.timeZone = 42;
    const p0 = doc.personas[0];
    if (p0 === undefined) throw new Error('demo changed');
    delete p0.age_y;
    const v = validateScenarioValue(doc);
    expect(v.problems.map((x) => x.path).sort()).toEqual(['personas[0].age_y', 'site.latitude_deg', 'site.timeZone']);
    expect(v.problems.every((x) => x.message.length > 0 && x.fix.length > 0)).toBe(true);
  });

  it('suggests the intended name of a misspelt field', () => {
    const doc = demoCopy() as { site: Record<string, unknown> };
    doc.site.latitude = doc.site.latitude_deg;
    delete doc.site.latitude_deg;
    const v = validateScenarioValue(doc);
    const unknown = v.problems.find((x) => x.path === 'site.latitude');
    expect(unknown?.fix).toContain('latitude_deg');
  });

  it('catches references to places, screens and templates that do not exist', () => {
    const doc = demoCopy() as { personas: { templates: Record<string, { place: string; screen?: string }[]>; week: Record<string, unknown> }[] };
    const p = doc.personas[1];
    const seg = p?.templates.workday?.[0];
    if (p === undefined || seg === undefined) throw new Error('demo changed');
    seg.place = 'kitchen';
    seg.screen = 'laptop';
    p.week.wed = 'holiday';
    const paths = validateScenarioValue(doc).problems.map((x) => x.path);
    expect(paths).toContain('personas[1].templates.workday[0].place');
    expect(paths).toContain('personas[1].templates.workday[0].screen');
    expect(paths).toContain('personas[1].week.wed');
  });

  it('refuses an unknown time zone and warns on a longitude with the wrong sign', () => {
    const a = demoCopy() as { site: Record<string, unknown> };
    a.site.timeZone = 'CET/Berlin';
    expect(validateScenarioValue(a).problems.map((x) => x.path)).toEqual(['site.timeZone']);
    const b = demoCopy() as { site: Record<string, unknown> };
    b.site.longitude_deg = -100;
    const vb = validateScenarioValue(b);
    expect(vb.ok).toBe(true);
    expect(vb.problems.map((x) => [x.severity, x.path])).toEqual([['warning', 'site.longitude_deg']]);
  });

  it('warns about too little rest between shifts (11 h, EU Working Time Directive 2003/88/EC Art. 3)', () => {
    const doc = demoCopy() as { rosters: { cycle: string[] }[] };
    const r = doc.rosters[0];
    if (r === undefined) throw new Error('demo changed');
    r.cycle = ['late', 'early', 'rest'];
    const v = validateScenarioValue(doc);
    expect(v.problems.some((x) => x.severity === 'warning' && x.path === 'rosters[0].cycle[1]')).toBe(true);
  });

  it('reports a JSON syntax error with its line', () => {
    const v = validateScenarioText('{\n  "format": "zeitlight-scenario",\n  "version": 2,,\n}');
    expect(v.ok).toBe(false);
    expect(v.problems[0]?.message).toMatch(/line 3/);
  });

  it('refuses a file from a newer format version', () => {
    const doc = demoCopy();
    doc.version = 99;
    const v = validateScenarioValue(doc);
    expect(v.problems.map((x) => x.path)).toEqual(['version']);
  });
});

describe('week plan sense checks', () => {
  it('warns when a segment running past midnight collides with the next day\'s plan', () => {
    const doc = demoCopy() as { personas: { week: Record<string, unknown> }[] };
    const p = doc.personas[1];
    if (p === undefined) throw new Error('demo changed');
    p.week.sun = 'weekend'; // weekend sleep runs to 08:30 but Monday's workday starts 06:45
    const v = validateScenarioValue(doc);
    expect(v.ok).toBe(true);
    expect(v.problems.map((x) => [x.severity, x.path])).toEqual([['warning', 'personas[1].templates.weekend[4].end']]);
  });
});

describe('measured light periods', () => {
  it('accepts local and offset date-times and refuses a date-time that is not one', () => {
    const doc = demoCopy() as { lightLogs?: unknown[]; personas: { measuredLight?: unknown[] }[] };
    doc.lightLogs = [{ id: 'w', file: 'w.csv', quantity: { kind: 'photopic-lux' } }];
    const p = doc.personas[1];
    if (p === undefined) throw new Error('demo changed');
    p.measuredLight = [{ log: 'w', from: '2026-03-24T00:00', to: '2026-03-25T06:30:00Z' }];
    expect(validateScenarioValue(doc).problems).toEqual([]);
    p.measuredLight = [{ log: 'w', from: '24.03.2026' }];
    expect(validateScenarioValue(doc).problems.map((x) => x.path)).toEqual(['personas[1].measuredLight[0].from']);
  });
});

describe('schema and sense problems in one pass', () => {
  it('reports schema errors together with sense errors in the parts that passed the schema', () => {
    const doc = demoCopy() as {
      site: Record<string, unknown>;
      personas: (Record<string, unknown> & { templates: Record<string, { place: string }[]> })[];
      rosters: { cycle: string[] }[];
    };
    const nurse = doc.personas[0];
    const worker = doc.personas[1];
    const seg = worker?.templates.workday?.[2];
    const roster = doc.rosters[0];
    if (nurse === undefined || seg === undefined || roster === undefined) throw new Error('demo changed');
    nurse.age_y = -3; // schema error: the nurse is set aside, references to her are not repeated
    doc.site.timeZone = 'Europe/Berln';
    seg.place = 'trm';
    roster.cycle[3] = 'lat';
    const v = validateScenarioValue(doc);
    expect(v.problems.map((p) => [p.severity, p.path])).toEqual([
      ['error', 'personas[0].age_y'],
      ['error', 'site.timeZone'],
      ['error', 'personas[1].templates.workday[2].place'],
      ['error', 'rosters[0].cycle[3]'],
    ]);
  });

  it('keeps the original list positions in the paths when an earlier item failed the schema', () => {
    const doc = demoCopy() as { places: Record<string, unknown>[] };
    const first = doc.places[0];
    const office = doc.places[4];
    if (first === undefined || office === undefined) throw new Error('demo changed');
    first.width_m = -1;
    office.reflectances = { ceiling: 0.2, walls: 0.5, floor: 0.4 };
    const v = validateScenarioValue(doc);
    expect(v.problems.map((p) => [p.severity, p.path])).toEqual([
      ['error', 'places[0].width_m'],
      ['warning', 'places[4].reflectances.floor'],
    ]);
  });
});

describe('suggestions', () => {
  it('suggests the intended time zone, place and shift for misspelt names', () => {
    const doc = demoCopy() as { site: Record<string, unknown>; personas: { templates: Record<string, { place: string }[]> }[]; rosters: { cycle: string[] }[] };
    doc.site.timeZone = 'Europe/Berln';
    const seg = doc.personas[1]?.templates.workday?.[2];
    const r = doc.rosters[0];
    if (seg === undefined || r === undefined) throw new Error('demo changed');
    seg.place = 'trm';
    r.cycle[3] = 'lat';
    const fixes = validateScenarioValue(doc).problems.map((p) => p.fix);
    expect(fixes[0]).toMatch(/^Did you mean "Europe\/Berlin"\?/);
    expect(fixes[1]).toMatch(/^Did you mean "tram"\?/);
    expect(fixes[2]).toMatch(/^Did you mean "late"\?/);
  });
});
