import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { validateScenarioValue } from '../../../schedules/validation/validate-scenario.js';
import { addSegment, daySegments, dayTemplateName, moveSegment, removeSegment, resizeSegment, timelinePieces } from './routine-edits.js';
import { durationMin } from './clock-minutes.js';
import type { ScenarioInput } from './scenario-types.js';

const scenario: ScenarioInput = structuredClone(DEMO_SCENARIO);
const desk = () => scenario.personas.find((p) => p.id === 'desk-worker')!;

describe('routine edits', () => {
  it('resolves day templates and copies a day inline before editing it, leaving other days on the template', () => {
    expect(dayTemplateName(desk(), 'tue')).toBe('workday');
    const edited = addSegment(scenario, 'desk-worker', 'tue', { start: '12:35', end: '12:55', place: 'park', activity: 'exercise' });
    const p = edited.personas.find((x) => x.id === 'desk-worker')!;
    expect(dayTemplateName(p, 'tue')).toBeNull();
    expect(dayTemplateName(p, 'wed')).toBe('workday');
    expect(daySegments(p, 'tue').map((s) => s.start)).toContain('12:35');
    expect(daySegments(p, 'tue').length).toBe(daySegments(desk(), 'tue').length + 1);
    // Starts stay sorted.
    const starts = daySegments(p, 'tue').map((s) => s.start);
    expect([...starts].sort()).toEqual(starts);
    // The original is untouched.
    expect(dayTemplateName(desk(), 'tue')).toBe('workday');
  });

  it('keeps the edited demo scenario valid under the scenario format', () => {
    const edited = addSegment(scenario, 'desk-worker', 'sat', { start: '14:00', end: '15:00', place: 'park', activity: 'exercise' });
    expect(validateScenarioValue(edited).problems.filter((p) => p.severity === 'error')).toEqual([]);
  });

  it('moves a segment keeping its length, and wraps its end past midnight', () => {
    const day = daySegments(desk(), 'mon');
    const last = day.length - 1; // the sleep 23:15–06:45
    const moved = moveSegment(scenario, 'desk-worker', 'mon', last, 30);
    const seg = daySegments(moved.personas.find((p) => p.id === 'desk-worker')!, 'mon')[last]!;
    expect([seg.start, seg.end]).toEqual(['23:45', '07:15']);
    expect(durationMin(seg.start, seg.end)).toBe(durationMin(day[last]!.start, day[last]!.end));
  });

  it('resizes either edge without dropping below the minimum length', () => {
    const grown = resizeSegment(scenario, 'desk-worker', 'mon', 0, 'end', 15);
    expect(daySegments(grown.personas.find((p) => p.id === 'desk-worker')!, 'mon')[0]).toMatchObject({ start: '06:45', end: '07:45' });
    const early = resizeSegment(scenario, 'desk-worker', 'mon', 0, 'start', -45);
    expect(daySegments(early.personas.find((p) => p.id === 'desk-worker')!, 'mon')[0]).toMatchObject({ start: '06:00', end: '07:30' });
    const tiny = resizeSegment(scenario, 'desk-worker', 'mon', 0, 'end', -600);
    const seg = daySegments(tiny.personas.find((p) => p.id === 'desk-worker')!, 'mon')[0]!;
    expect(durationMin(seg.start, seg.end)).toBe(5);
  });

  it('removes a segment', () => {
    const removed = removeSegment(scenario, 'desk-worker', 'sun', 1);
    expect(daySegments(removed.personas.find((p) => p.id === 'desk-worker')!, 'sun').map((s) => s.place)).not.toContain('park');
  });

  it('draws a past-midnight segment on its day and continues it on the next', () => {
    const pieces = timelinePieces(desk()).filter((p) => p.segment.activity === 'sleep');
    const sunday = pieces.filter((p) => p.day === 'sun' && !p.continued)[0]!;
    expect([sunday.from_min, sunday.to_min]).toEqual([23 * 60 + 15, 1440]);
    const mondayMorning = pieces.find((p) => p.day === 'mon' && p.continued)!;
    expect([mondayMorning.from_min, mondayMorning.to_min]).toEqual([0, 6 * 60 + 45]);
  });
});
