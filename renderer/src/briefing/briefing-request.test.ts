import { describe, expect, it } from 'vitest';
import { briefingRequest, localDate } from './briefing-request.js';
import { syntheticResultsView } from '../results/synthetic-view.js';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { checkBriefingDocument } from '../../report/src/briefing-document.js';

describe('briefing handed to the report page', () => {
  it('is a document the report page accepts, dated with the local date, cohort ranges only when given', () => {
    const doc = briefingRequest(structuredClone(DEMO_SCENARIO), syntheticResultsView(7), { now: new Date(2026, 2, 30, 23, 59) });
    expect(doc.generatedOn).toBe('2026-03-30');
    expect(localDate(new Date(2026, 0, 5))).toBe('2026-01-05');
    expect(checkBriefingDocument(doc)).toMatchObject({ ok: true });
    expect('cohort' in doc).toBe(false);
    const withCohort = briefingRequest(structuredClone(DEMO_SCENARIO), syntheticResultsView(7), { now: new Date(), cohort: { occupants: 20, seed: 1, ranges: [] } });
    expect(withCohort.cohort).toEqual({ occupants: 20, seed: 1, ranges: [] });
  });
});
