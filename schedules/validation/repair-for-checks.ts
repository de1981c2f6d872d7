/**
 * Stand-in values for the fields of one scenario item (a place, a persona, the run settings …)
 * that failed the schema, so that the sense checks (references, template names, timing) can still
 * look at the rest of the item in the same pass. The stand-ins are never used for a run: the
 * item's schema problems are reported as they are, and the caller drops every sense-check
 * problem at or under a replaced field.
 *
 * Method: parse, replace the value at each issue's path by the simplest value of the expected
 * shape (the bound for a number out of range, the first allowed value of a list of choices, an
 * empty list …), and parse again, a few rounds at most. Items that still fail are left out.
 */
import type { z } from 'zod';
import { formatPath } from './problem.js';

export interface RepairedItem<T> {
  readonly data: T;
  /** Paths (relative to the item) whose values were replaced or removed. */
  readonly replaced: readonly (readonly PropertyKey[])[];
}

const MAX_ROUNDS = 8;
/** Plain values tried where the schema says only "not valid" (formats, unions, refinements). */
const CANDIDATES: readonly unknown[] = [[], 'x', '00:00', '2026-01-01', '2026-01-01T00:00', 1, 0, {}, false];

type Container = Record<PropertyKey, unknown> | unknown[];

function isContainer(v: unknown): v is Container {
  return v !== null && typeof v === 'object';
}

function parentOf(root: unknown, path: readonly PropertyKey[]): Container | undefined {
  let node: unknown = root;
  for (const key of path.slice(0, -1)) {
    if (!isContainer(node)) return undefined;
    node = (node as Record<PropertyKey, unknown>)[key];
  }
  return isContainer(node) ? node : undefined;
}

function setAt(root: unknown, path: readonly PropertyKey[], value: unknown): boolean {
  const parent = parentOf(root, path);
  const key = path[path.length - 1];
  if (parent === undefined || key === undefined) return false;
  (parent as Record<PropertyKey, unknown>)[key] = value;
  return true;
}

function deleteAt(root: unknown, path: readonly PropertyKey[]): boolean {
  const parent = parentOf(root, path);
  const key = path[path.length - 1];
  if (parent === undefined || key === undefined || Array.isArray(parent)) return false;
  delete (parent as Record<PropertyKey, unknown>)[key];
  return true;
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let node: unknown = root;
  for (const key of path) {
    if (!isContainer(node)) return undefined;
    node = (node as Record<PropertyKey, unknown>)[key];
  }
  return node;
}

const EMPTY_OF: Readonly<Record<string, unknown>> = { number: 1, int: 1, string: 'x', boolean: false, array: [], object: {} };

/** The stand-in for one issue, or undefined when there is none to try directly. */
function directStandIn(issue: z.core.$ZodIssue, found: unknown): { value: unknown } | undefined {
  switch (issue.code) {
    case 'invalid_type': {
      const expected = String(issue.expected);
      if (expected in EMPTY_OF) return { value: structuredClone(EMPTY_OF[expected]) };
      return undefined;
    }
    case 'too_small':
    case 'too_big': {
      const limit = Number(issue.code === 'too_small' ? issue.minimum : issue.maximum);
      if (!Number.isFinite(limit)) return undefined;
      if (issue.origin === 'number' || issue.origin === 'int') {
        const nudge = issue.inclusive === false ? (issue.code === 'too_small' ? 1 : -1) * Math.max(1e-6, Math.abs(limit) * 1e-6) : 0;
        return { value: limit + nudge };
      }
      if (issue.origin === 'string') return { value: issue.code === 'too_small' ? 'x'.repeat(Math.max(1, limit)) : String(found).slice(0, limit) };
      if (issue.origin === 'array' && issue.code === 'too_big' && Array.isArray(found)) return { value: found.slice(0, limit) };
      return undefined;
    }
    case 'invalid_value':
      return issue.values.length > 0 ? { value: issue.values[0] } : undefined;
    default:
      return undefined;
  }
}

function issuesAt(error: z.ZodError, path: readonly PropertyKey[]): number {
  const key = formatPath(path);
  return error.issues.filter((i) => formatPath(i.path).startsWith(key)).length;
}

/**
 * The item with stand-ins for its invalid fields, or undefined when it cannot be made to pass
 * the schema (then the caller leaves it out of the sense checks).
 */
export function repairForChecks<T>(item: unknown, schema: z.ZodType<T>): RepairedItem<T> | undefined {
  if (!isContainer(item)) return undefined;
  const work: unknown = structuredClone(item);
  const replaced: PropertyKey[][] = [];
  for (let round = 0; round < MAX_ROUNDS; round++) {
    const r = schema.safeParse(work);
    if (r.success) return { data: r.data, replaced };
    let changed = false;
    for (const issue of r.error.issues) {
      if (issue.code === 'unrecognized_keys') {
        for (const k of issue.keys) changed = deleteAt(work, [...issue.path, k]) || changed;
        continue;
      }
      const path = issue.path;
      if (path.length === 0) return undefined;
      const found = valueAt(work, path);
      const direct = directStandIn(issue, found);
      let ok = false;
      if (direct !== undefined) ok = setAt(work, path, direct.value);
      else {
        // Try plain values until one clears this field's issues.
        const before = issuesAt(r.error, path);
        for (const candidate of CANDIDATES) {
          if (!setAt(work, path, structuredClone(candidate))) break;
          const again = schema.safeParse(work);
          if (again.success || issuesAt(again.error, path) < before) {
            ok = true;
            break;
          }
        }
        if (!ok) setAt(work, path, found);
      }
      if (ok) {
        if (!replaced.some((p) => formatPath(p) === formatPath(path))) replaced.push([...path]);
        changed = true;
      }
    }
    if (!changed) return undefined;
  }
  return undefined;
}
