import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../demo/demo-scenario.js';
import { SCENARIO_FORMAT_VERSION } from '../schema/scenario-schema.js';
import { validateScenarioValue } from '../validation/validate-scenario.js';
import { MIGRATIONS, migrateScenario } from './migrate.js';
import { migrateV1ToV2 } from './v1-to-v2.js';

/** A version-1 file written by hand in the old field names (site.timezone, tau_h, from/to). */
function versionOneFile(): Record<string, unknown> {
  const doc = structuredClone(DEMO_SCENARIO) as unknown as Record<string, unknown> & {
    site: Record<string, unknown>;
    personas: (Record<string, unknown> & { templates?: Record<string, Record<string, unknown>[]> })[];
    strategies: { changes: Record<string, unknown>[] }[];
  };
  doc.version = 1;
  doc.site.timezone = doc.site.timeZone;
  delete doc.site.timeZone;
  for (const p of doc.personas) {
    p.tau_h = 24.3;
    for (const segs of Object.values(p.templates ?? {})) {
      for (const seg of segs) {
        seg.from = seg.start;
        seg.to = seg.end;
        delete seg.start;
        delete seg.end;
      }
    }
  }
  for (const st of doc.strategies) {
    for (const c of st.changes) {
      const seg = c.segment as Record<string, unknown> | undefined;
      if (seg !== undefined) {
        seg.from = seg.start;
        seg.to = seg.end;
        delete seg.start;
        delete seg.end;
      }
    }
  }
  return doc;
}

describe('format migration', () => {
  it('has a migration for every older version', () => {
    for (let v = 1; v < SCENARIO_FORMAT_VERSION; v++) expect(MIGRATIONS[v]).toBeTypeOf('function');
  });

  it('1 → 2 renames timezone, tau_h and segment from/to, and the result validates cleanly', () => {
    const v1 = versionOneFile();
    const v2 = migrateV1ToV2(v1);
    expect(v2.version).toBe(2);
    expect((v2.site as Record<string, unknown>).timeZone).toBe('Europe/Berlin');
    const p = (v2.personas as Record<string, unknown>[])[1] as { intrinsicPeriod_h: number; templates: Record<string, { start: string; end: string }[]> };
    expect(p.intrinsicPeriod_h).toBe(24.3);
    expect(p.templates.workday?.[0]).toMatchObject({ start: '06:45', end: '07:30' });
    expect((v1.site as Record<string, unknown>).timezone).toBe('Europe/Berlin'); // input untouched
    const v = validateScenarioValue(v1);
    expect(v.problems).toEqual([]);
    expect(v.migratedFrom).toBe(1);
    expect(v.migrations).toEqual(['1 → 2']);
    expect(v.scenario?.personas[0]?.intrinsicPeriod_h).toBe(24.3);
  });

  it('leaves a current-version file as it is', () => {
    const r = migrateScenario(structuredClone(DEMO_SCENARIO));
    expect(r.applied).toEqual([]);
    expect(r.value).toEqual(DEMO_SCENARIO);
  });

  it('refuses files that are not scenarios, with a fix', () => {
    expect(migrateScenario([1, 2]).problems[0]?.path).toBe('');
    expect(migrateScenario({ version: 2 }).problems[0]?.path).toBe('format');
    expect(migrateScenario({ format: 'zeitlight-scenario', version: 'two' }).problems[0]?.path).toBe('version');
  });
});
