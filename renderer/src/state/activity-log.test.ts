import { describe, expect, it } from 'vitest';
import { ActivityLog } from './activity-log.js';

describe('activity log', () => {
  it('keeps entries in order with increasing sequence numbers', () => {
    const log = new ActivityLog();
    log.record('results', { status: 'running' });
    log.record('results', { status: 'ready' });
    log.record('notice', { text: 'Saved.' });
    expect(log.entries().map((e) => [e.seq, e.kind])).toEqual([
      [1, 'results'],
      [2, 'results'],
      [3, 'notice'],
    ]);
    expect(log.count('results')).toBe(2);
  });

  it('drops the oldest entries beyond its capacity and keeps counting', () => {
    const log = new ActivityLog();
    for (let i = 0; i < 2500; i++) log.record('tick', { i });
    const kept = log.entries();
    expect(kept).toHaveLength(2000);
    expect(kept[0]?.detail.i).toBe(500);
    expect(kept.at(-1)?.seq).toBe(2500);
  });

  it('hands out copies that later records do not change', () => {
    const log = new ActivityLog();
    log.record('a');
    const before = log.entries();
    log.record('b');
    expect(before).toHaveLength(1);
  });
});
