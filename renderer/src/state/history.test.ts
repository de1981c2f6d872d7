import { describe, expect, it } from 'vitest';
import { applyEdit, canRedo, canUndo, HISTORY_LIMIT, redo, startHistory, undo } from './history.js';

describe('undo/redo history', () => {
  it('undoes and redoes edits in order', () => {
    let h = startHistory('a');
    h = applyEdit(h, 'b');
    h = applyEdit(h, 'c');
    h = undo(h);
    expect(h.present).toBe('b');
    h = undo(h);
    expect(h.present).toBe('a');
    expect(canUndo(h)).toBe(false);
    h = redo(redo(h));
    expect(h.present).toBe('c');
    expect(canRedo(h)).toBe(false);
  });

  it('drops the redo branch when a new edit follows an undo', () => {
    let h = applyEdit(applyEdit(startHistory(1), 2), 3);
    h = applyEdit(undo(h), 9);
    expect(canRedo(h)).toBe(false);
    expect(undo(h).present).toBe(2);
  });

  it('merges rapid edits of the same field into one step, but not edits of different fields', () => {
    let h = startHistory('');
    h = applyEdit(h, 'L', 'site.name', 0);
    h = applyEdit(h, 'Li', 'site.name', 300);
    h = applyEdit(h, 'Lin', 'site.name', 600);
    expect(undo(h).present).toBe('');
    h = applyEdit(h, 'Lin!', 'site.latitude', 700);
    expect(undo(h).present).toBe('Lin');
    h = applyEdit(startHistory('x'), 'xy', 'k', 0);
    h = applyEdit(h, 'xyz', 'k', 5000);
    expect(undo(h).present).toBe('xy');
  });

  it('ignores an edit that leaves the document unchanged', () => {
    const h = startHistory({ a: 1 });
    expect(applyEdit(h, h.present)).toBe(h);
  });

  it('keeps at most the configured number of undo steps', () => {
    let h = startHistory(0);
    for (let i = 1; i <= HISTORY_LIMIT + 50; i++) h = applyEdit(h, i);
    expect(h.past.length).toBe(HISTORY_LIMIT);
  });
});
