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
});
