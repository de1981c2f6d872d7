import { describe, expect, it } from 'vitest';
import { PROGRESS_DELAY_MS, RERUN_DEBOUNCE_MS, RunScheduler, type SchedulerClock } from './run-scheduler.js';
import { handleRunRequest } from './run-in-worker.js';
import type { WorkerToPage } from './simulation-protocol.js';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';

function fakeClock() {
  let now = 0;
  const timers = new Map<number, { at: number; cb: () => void }>();
  let next = 1;
  const clock: SchedulerClock = {
    setTimeout: (cb, ms) => {
      const id = next++;
      timers.set(id, { at: now + ms, cb });
      return id;
    },
    clearTimeout: (h) => void timers.delete(h as number),
  };
  const advance = (ms: number) => {
    const until = now + ms;
    for (;;) {
      const due = [...timers.entries()].filter(([, t]) => t.at <= until).sort((a, b) => a[1].at - b[1].at)[0];
      if (due === undefined) break;
      timers.delete(due[0]);
      now = due[1].at;
      due[1].cb();
    }
    now = until;
  };
  return { clock, advance };
}

describe('re-running after edits', () => {
  it('waits for edits to pause, then runs once with the latest scenario', () => {
    const { clock, advance } = fakeClock();
    const started: unknown[] = [];
    const s = new RunScheduler(clock, { start: (_id, sc) => started.push(sc), cancel: () => {} }, () => {});
    s.requestRun('v1');
    advance(RERUN_DEBOUNCE_MS - 50);
    s.requestRun('v2');
    advance(RERUN_DEBOUNCE_MS - 50);
    expect(started).toEqual([]);
    advance(100);
    expect(started).toEqual(['v2']);
  });

  it('abandons a running simulation when a newer one starts and ignores its late messages', () => {
    const { clock, advance } = fakeClock();
    const ids: number[] = [];
    let cancels = 0;
    const s = new RunScheduler(clock, { start: (id) => ids.push(id), cancel: () => (cancels += 1) }, () => {});
    s.requestRun('a', true);
    s.requestRun('b', true);
    advance(1);
    expect(cancels).toBe(1);
    expect(s.isCurrent(ids[0]!)).toBe(false);
    expect(s.isCurrent(ids[1]!)).toBe(true);
  });

  it('shows progress only for runs longer than 0.3 s', () => {
    const { clock, advance } = fakeClock();
    const shown: boolean[] = [];
    const ids: number[] = [];
    const s = new RunScheduler(clock, { start: (id) => ids.push(id), cancel: () => {} }, (v) => shown.push(v));
    s.requestRun('quick', true);
    advance(PROGRESS_DELAY_MS - 100);
    s.finished(ids[0]!);
    advance(1000);
    expect(shown).toEqual([]);
    s.requestRun('slow', true);
    advance(PROGRESS_DELAY_MS + 1);
    expect(shown).toEqual([true]);
    s.finished(ids[1]!);
    expect(shown).toEqual([true, false]);
  });
});

describe('worker run handling', () => {
  it('validates the scenario and reports problems with paths before running', async () => {
    const messages: WorkerToPage[] = [];
    const broken = { ...structuredClone(DEMO_SCENARIO), run: { startDate: '2026-13-40', days: 14 } };
    await handleRunRequest({ type: 'run', runId: 7, scenario: broken }, (m) => messages.push(m));
    expect(messages[0]?.type).toBe('problems');
    if (messages[0]?.type === 'problems') expect(messages[0].problems.some((p) => p.path.startsWith('run.startDate') && p.severity === 'error')).toBe(true);
    expect(messages).toHaveLength(1);
  });

  it('runs a valid scenario through the results adapter', async () => {
    const messages: WorkerToPage[] = [];
    await handleRunRequest({ type: 'run', runId: 3, scenario: structuredClone(DEMO_SCENARIO) }, (m) => messages.push(m));
    expect(messages.map((m) => m.type)).toContain('problems');
    expect(messages.every((m) => m.runId === 3)).toBe(true);
    const types = messages.map((m) => m.type);
    expect(types.includes('results') || types.includes('unavailable')).toBe(true);
    // the model ensemble's ranges come after the results, never before
    if (types.includes('ensemble')) expect(types.indexOf('ensemble')).toBeGreaterThan(types.indexOf('results'));
  });
});
