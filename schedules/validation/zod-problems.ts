/** Turns schema issues into problems with a path and a plain-language fix. */
import type { z } from 'zod';
import { problem, type ScenarioProblem } from './problem.js';
import { nearest } from './suggest.js';

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = root;
  for (const key of path) {
    if (v === null || typeof v !== 'object') return undefined;
    v = (v as Record<PropertyKey, unknown>)[key];
  }
  return v;
}

function describeValue(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'string') return `the text ${JSON.stringify(v.length > 40 ? v.slice(0, 40) + '…' : v)}`;
  if (typeof v === 'number') return `the number ${v}`;
  if (typeof v === 'boolean') return `${v}`;
  if (typeof v === 'object') return 'an object';
  return typeof v;
}

const EXAMPLES: Record<string, string> = {
  number: 'a number such as 42.5',
  int: 'a whole number such as 7',
  string: 'text in double quotes',
  array: 'a list in square brackets [ … ]',
  object: 'an object in braces { … }',
  boolean: 'true or false',
};

function issueToProblems(issue: z.core.$ZodIssue, input: unknown, knownKeys: (path: readonly PropertyKey[]) => readonly string[]): ScenarioProblem[] {
  const path = issue.path;
  const found = valueAt(input, path);
  switch (issue.code) {
    case 'invalid_type': {
      const expected = String(issue.expected);
      if (found === undefined) {
        const field = path[path.length - 1];
        return [problem('error', path, `required field "${String(field)}" is missing`, `Add "${String(field)}" with ${EXAMPLES[expected] ?? 'a ' + expected}.`)];
      }
      return [problem('error', path, `expected ${EXAMPLES[expected] ?? expected} but found ${describeValue(found)}`, `Replace it with ${EXAMPLES[expected] ?? 'a ' + expected}.`)];
    }
    case 'too_small':
    case 'too_big': {
      const limit = issue.code === 'too_small' ? issue.minimum : issue.maximum;
      const isLength = issue.origin === 'array' || issue.origin === 'string';
      const bound = issue.code === 'too_small' ? 'at least' : 'at most';
      const strict = issue.inclusive === false ? (issue.code === 'too_small' ? 'more than' : 'less than') : bound;
      if (isLength) {
        const unit = issue.origin === 'array' ? 'item(s)' : 'character(s)';
        return [problem('error', path, `needs ${strict} ${String(limit)} ${unit}`, issue.origin === 'array' ? `Give ${strict} ${String(limit)} ${unit} in this list.` : `Write ${strict} ${String(limit)} ${unit}.`)];
      }
      return [problem('error', path, `${describeValue(found)} is out of range: it must be ${strict} ${String(limit)}`, `Use a value ${strict} ${String(limit)}.`)];
    }
    case 'invalid_value': {
      const options = issue.values.map((v) => JSON.stringify(v)).join(', ');
      return [problem('error', path, `${describeValue(found)} is not allowed here`, issue.values.length === 1 ? `Write ${options}.` : `Use one of: ${options}.`)];
    }
    case 'invalid_union': {
      const disc = (issue as { discriminator?: string; options?: unknown[] }).discriminator;
      const opts = (issue as { options?: unknown[] }).options;
      if (disc !== undefined && Array.isArray(opts)) {
        const list = opts.map((v) => JSON.stringify(v)).join(', ');
        return [problem('error', path, `${describeValue(found)} is not a known "${disc}"`, `Set "${disc}" to one of: ${list}.`)];
      }
      // A field that takes one of several shapes: report the closest shape's problems.
      const branches = issue.errors.map((errs) => errs.map((e) => ({ ...e, path: [...path, ...e.path] })));
      const best = branches.length > 0 ? branches.reduce((a, b) => (b.length < a.length ? b : a)) : [];
      if (best.length > 0 && best.length <= 3) return best.flatMap((e) => issueToProblems(e as z.core.$ZodIssue, input, knownKeys));
      return [problem('error', path, `${describeValue(found)} does not match any accepted form`, 'Check this field against docs/scenario-format.md.')];
    }
    case 'unrecognized_keys':
      return issue.keys.map((key) => {
        const guess = nearest(key, knownKeys(path));
        return problem(
          'error',
          [...path, key],
          `unknown field "${key}"`,
          guess !== undefined ? `Did you mean "${guess}"? Rename it, or remove it.` : 'Remove it or check its spelling against docs/scenario-format.md.',
        );
      });
    case 'invalid_format':
      return [problem('error', path, `${describeValue(found)} is not valid: ${issue.message}`, `Rewrite it: ${issue.message}.`)];
    case 'invalid_key':
      return [problem('error', path, `a key here is not valid: ${issue.message}`, 'Rename the key to a plain identifier (letters, digits, "-" or "_").')];
    default:
      return [problem('error', path, issue.message, 'Correct this field; see docs/scenario-format.md.')];
  }
}

/**
 * Problems for every schema issue. `knownKeys` lists the fields allowed at an object path,
 * used to suggest the intended name for a misspelt field.
 */
export function schemaProblems(error: z.ZodError, input: unknown, knownKeys: (path: readonly PropertyKey[]) => readonly string[] = () => []): ScenarioProblem[] {
  return error.issues.flatMap((issue) => issueToProblems(issue, input, knownKeys));
}
