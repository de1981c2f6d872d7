// Undo/redo history of immutable document states. Every edit goes through `edit`; edits with
// the same coalescing key in quick succession (typing in one field) become one undo step.

export interface History<T> {
  readonly past: readonly T[];
  readonly present: T;
  readonly future: readonly T[];
  /** Coalescing key and time of the last edit, if it may absorb the next one. */
  readonly lastKey: string | null;
  readonly lastAt_ms: number;
}

/** Undo depth kept; older steps are dropped. */
export const HISTORY_LIMIT = 200;
/** Edits with the same key closer together than this merge into one undo step. */
export const COALESCE_WINDOW_MS = 1000;

export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], lastKey: null, lastAt_ms: 0 };
}

export function applyEdit<T>(history: History<T>, next: T, key: string | null = null, at_ms = 0): History<T> {
  if (Object.is(next, history.present)) return history;
  const merge = key !== null && key === history.lastKey && at_ms - history.lastAt_ms < COALESCE_WINDOW_MS && history.past.length > 0;
  const past = merge ? history.past : [...history.past, history.present].slice(-HISTORY_LIMIT);
  return { past, present: next, future: [], lastKey: key, lastAt_ms: at_ms };
}

export function undo<T>(history: History<T>): History<T> {
  const previous = history.past[history.past.length - 1];
  if (previous === undefined) return history;
  return { past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future], lastKey: null, lastAt_ms: 0 };
}

export function redo<T>(history: History<T>): History<T> {
  const [next, ...rest] = history.future;
  if (next === undefined) return history;
  return { past: [...history.past, history.present], present: next, future: rest, lastKey: null, lastAt_ms: 0 };
}

export const canUndo = <T>(h: History<T>): boolean => h.past.length > 0;
export const canRedo = <T>(h: History<T>): boolean => h.future.length > 0;
