/**
 * What the robustness properties check in every command's answer (docs/validation/robustness.md):
 *  - crash: an exception escaped the command, an "internal error", exit code 70, or a stack trace
 *    in its output;
 *  - unlocated: a refusal (non-zero exit) whose message does not name the file and the line or
 *    field it is about (or, for a command-line mistake, the option or argument);
 *  - non-finite: a number that is not finite in any JSON the command wrote;
 *  - hang: a case that took longer than the bound per case (checked by the runner).
 */
import type { CliCall } from './cli-call.js';

export type FindingKind = 'crash' | 'unlocated' | 'non-finite' | 'hang';

export interface Finding {
  readonly kind: FindingKind;
  readonly detail: string;
}

/** A line of a JavaScript stack trace, as Node prints it. */
const STACK_LINE = /^\s+at .+(:\d+:\d+\)?|\(native\)|<anonymous>\)?)$/m;

export function crashFindings(call: CliCall): Finding[] {
  const out: Finding[] = [];
  if (call.escaped !== null) out.push({ kind: 'crash', detail: `exception escaped: ${call.escaped.slice(0, 400)}` });
  if (call.code === 70 || /internal error/.test(call.stderr)) out.push({ kind: 'crash', detail: `internal error: ${call.stderr.slice(0, 400)}` });
  for (const [name, text] of [['stdout', call.stdout], ['stderr', call.stderr]] as const) {
    const m = STACK_LINE.exec(text);
    if (m !== null) out.push({ kind: 'crash', detail: `stack trace on ${name}: ${text.slice(Math.max(0, m.index - 200), m.index + 100)}` });
  }
  if (call.nonFinite.length > 0) out.push({ kind: 'non-finite', detail: call.nonFinite.join('; ') });
  return out;
}

/**
 * A place in a file: a line, a column, a field path (a scenario section, a problem listed as
 * `error: <path>: …`, or `the first is at <path>`), an option, or the whole file named as such.
 */
const PLACE = /\bthe first is at (?!\(file\))\S+|^\s*error: (?!\(file\))[^\s:]+: |\bline \d+|\bcolumn "|\b(?:run|site|places|personas|rosters|strategies|lightLogs|format|version|name|description)\b(?:[.[]|\b)|--[a-z][\w-]*|whole file|\bis empty\b|\bno such file\b|\bit is a folder\b|\bpermission denied\b|\bis \d[\d.,]* MB, more than\b/;

/**
 * Whether a refusal is located: it names one of the files (by base name) and a place in it — or,
 * for a mistake on the command line, the option or argument.
 */
export function locatedRefusal(message: string, files: readonly string[]): boolean {
  if (/^zeitlight( \w+)?: (unknown command|expected |--|zeitlight \w+ takes no file|unknown option|option )/m.test(message)) return true;
  if (/\busage: zeitlight /.test(message) && /(--[a-z]|argument|option|positional)/i.test(message)) return true;
  const namesFile = files.length === 0 || files.some((f) => message.includes(f));
  return namesFile && new RegExp(PLACE.source, 'm').test(message);
}

export function refusalFindings(call: CliCall, files: readonly string[]): Finding[] {
  if (call.code === 0 || call.code === 70 || call.escaped !== null) return [];
  const message = call.stderr.trim();
  if (message === '') return [{ kind: 'unlocated', detail: `exit ${call.code} with nothing on stderr` }];
  return locatedRefusal(message, files) ? [] : [{ kind: 'unlocated', detail: message.slice(0, 400) }];
}
