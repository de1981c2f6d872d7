/** A problem found in a scenario: where (path), what is wrong, and how to fix it. */

export type ProblemSeverity = 'error' | 'warning';

export interface ScenarioProblem {
  readonly severity: ProblemSeverity;
  /** Path into the scenario, e.g. `personas[1].week.tue[3].end`; "" for the whole file. */
  readonly path: string;
  /** What is wrong, in plain language. */
  readonly message: string;
  /** What to do about it, in plain language. */
  readonly fix: string;
}

export type PathPart = string | number;

/** `["personas", 1, "week", "tue", 3, "end"]` → `personas[1].week.tue[3].end`. */
export function formatPath(parts: readonly PropertyKey[]): string {
  let out = '';
  for (const p of parts) {
    if (typeof p === 'number') out += `[${p}]`;
    else {
      const key = String(p);
      if (/^[A-Za-z_$][\w$-]*$/.test(key)) out += out === '' ? key : `.${key}`;
      else out += `[${JSON.stringify(key)}]`;
    }
  }
  return out;
}

export function problem(severity: ProblemSeverity, path: readonly PropertyKey[] | string, message: string, fix: string): ScenarioProblem {
  return { severity, path: typeof path === 'string' ? path : formatPath(path), message, fix };
}

/** One line per problem, for terminal output. */
export function formatProblem(p: ScenarioProblem): string {
  return `${p.severity}: ${p.path === '' ? '(file)' : p.path}: ${p.message} — ${p.fix}`;
}
