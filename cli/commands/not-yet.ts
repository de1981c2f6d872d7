import { CliError } from '../cli-error.js';
import type { Command } from '../command.js';

/** Placeholder for a command whose capability has not landed yet. */
export function notYetAvailable(name: string, summary: string, usage: string): Command {
  return {
    name,
    summary: `${summary} (not available yet)`,
    usage,
    options: {},
    async run() {
      throw new CliError(`zeitlight ${name}: this command is not available in this version yet`);
    },
  };
}
