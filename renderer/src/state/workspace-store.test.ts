import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../schedules/demo/demo-scenario.js';
import { isDirty, WorkspaceStore } from './workspace-store.js';
import { setAt } from '../scenario/set-at.js';

describe('workspace store', () => {
  it('tracks unsaved edits through undo, redo and save', () => {
    let t = 0;
    const store = new WorkspaceStore(() => (t += 5000));
    store.load(DEMO_SCENARIO, 'demo.zeitlight', null);
    expect(isDirty(store.getSnapshot())).toBe(false);
    store.edit((s) => setAt(s, ['site', 'latitude_deg'], 48), 'lat');
    expect(isDirty(store.getSnapshot())).toBe(true);
    store.undo();
    expect(isDirty(store.getSnapshot())).toBe(false);
    store.redo();
    expect(store.getSnapshot().history.present?.site.latitude_deg).toBe(48);
    store.markSaved('demo.zeitlight', '/x/demo.zeitlight');
    expect(isDirty(store.getSnapshot())).toBe(false);
  });

  it('treats a recovered draft as unsaved from the start', () => {
    const store = new WorkspaceStore();
    store.load(DEMO_SCENARIO, 'Untitled', null, true);
    expect(isDirty(store.getSnapshot())).toBe(true);
  });

  it('notifies subscribers on every change', () => {
    const store = new WorkspaceStore();
    let calls = 0;
    store.subscribe(() => (calls += 1));
    store.load(DEMO_SCENARIO, 'd', null);
    store.edit((s) => ({ ...s, name: 'Renamed' }));
    expect(calls).toBe(2);
  });

  it('records each finished run and each notice in its activity log, after the screen has moved on', () => {
    const store = new WorkspaceStore();
    store.setResults({ status: 'running', fraction: 0, stage: 'Starting', previous: null });
    store.setResults({ status: 'running', fraction: 0.5, stage: 'Light at the eye', previous: null });
    store.setResults({ status: 'failed', message: 'Fix the problems listed below to see results.' });
    store.notify('Exported the briefing.');
    store.clearNotice();
    expect(store.getSnapshot().notice).toBeNull();
    expect(store.activity.entries().map((e) => [e.kind, e.detail.status ?? e.detail.text])).toEqual([
      ['results', 'running'],
      ['results', 'failed'],
      ['notice', 'Exported the briefing.'],
    ]);
  });
});
