import type { ParseArgsConfig } from 'node:util';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

export interface CommandContext {
  readonly positionals: readonly string[];
  readonly values: Readonly<Record<string, string | boolean | (string | boolean)[] | undefined>>;
  /** True when `--json` was given: print exactly one JSON document on stdout. */
  readonly json: boolean;
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
}

export interface Command {
  readonly name: string;
  readonly summary: string;
  /** One usage line after `zeitlight <name>`, e.g. `<spd.csv> [--illuminance <lx>]`. */
  readonly usage: string;
  readonly options: OptionSpec;
  /** Returns the process exit code. Throw CliError for user-facing failures. */
  run(ctx: CommandContext): Promise<number>;
}
