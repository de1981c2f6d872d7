// Reads the scenario files and the demo switch from the process arguments (the OS passes the
// file path when a scenario is opened from the file manager).
import { SCENARIO_EXTENSION } from '../files/scenario-file.js';

export function scenarioFilesInArgs(args: readonly string[]): { files: string[]; demo: boolean } {
  const files = args.filter((a) => !a.startsWith('-') && (a.toLowerCase().endsWith(`.${SCENARIO_EXTENSION}`) || a.toLowerCase().endsWith('.json')));
  const demo = args.includes('--demo') || args.includes('--open=demo');
  return { files, demo };
}
