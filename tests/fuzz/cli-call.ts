/**
 * Calling the `zeitlight` command in-process for the robustness checks, with what each property
 * needs to see: exit code, stdout and stderr, an exception that escaped the command, and every
 * number the command tried to write as JSON that was not finite (JSON would silently write it as
 * null, so the check looks at the values before they are written).
 */
import { runCli } from '../../cli/main.js';

export interface CliCall {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
  /** An exception that escaped runCli (never expected). */
  readonly escaped: string | null;
  /** Paths of non-finite numbers in any JSON the command wrote (results.json, --json output). */
  readonly nonFinite: readonly string[];
}

const originalStringify = JSON.stringify;
let watching: string[] | null = null;

function findNonFinite(value: unknown, path: string, out: string[], seen: Set<unknown>): void {
  if (out.length >= 5) return;
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path || '(top)'} = ${String(value)}`);
    return;
  }
  if (value === null || typeof value !== 'object' || seen.has(value)) return;
  seen.add(value);
  if (ArrayBuffer.isView(value)) return;
  if (Array.isArray(value)) value.forEach((v, i) => findNonFinite(v, `${path}[${i}]`, out, seen));
  else for (const [k, v] of Object.entries(value as Record<string, unknown>)) findNonFinite(v, path === '' ? k : `${path}.${k}`, out, seen);
}

/** JSON.stringify that records non-finite numbers while a call is being watched. */
function watchingStringify(value: unknown, replacer?: unknown, space?: string | number): string {
  if (watching !== null) findNonFinite(value, '', watching, new Set());
  return (originalStringify as (v: unknown, r?: unknown, s?: string | number) => string)(value, replacer, space);
}

export async function callCli(argv: readonly string[]): Promise<CliCall> {
  let stdout = '';
  let stderr = '';
  const nonFinite: string[] = [];
  watching = nonFinite;
  JSON.stringify = watchingStringify as typeof JSON.stringify;
  let code = -1;
  let escaped: string | null = null;
  try {
    code = await runCli(argv, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  } catch (err) {
    escaped = err instanceof Error ? (err.stack ?? err.message) : String(err);
  } finally {
    JSON.stringify = originalStringify;
    watching = null;
  }
  return { code, stdout, stderr, escaped, nonFinite };
}
