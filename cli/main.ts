/**
 * `zeitlight` command-line entry. Parses the command and its options, runs it, and maps
 * failures to one message on stderr and a non-zero exit code. Never imports electron/react.
 */
import { parseArgs } from 'node:util';
import { CliError, UsageError } from './cli-error.js';
import type { Command, CommandContext } from './command.js';
import { COMMANDS } from './registry.js';
import { VERSION } from './version.js';

function helpText(): string {
  const lines = [`zeitlight ${VERSION} — light at the eye, body clock, melatonin and sleepiness`, '', 'Commands:'];
  for (const c of COMMANDS) lines.push(`  ${c.name.padEnd(10)} ${c.summary}`, `  ${''.padEnd(10)} zeitlight ${c.name} ${c.usage}`);
  lines.push('', 'Every command takes --json to print exactly one JSON document on stdout.');
  return lines.join('\n') + '\n';
}

/**
 * `--lon -105.2` would be refused by node's parseArgs (a value starting with "-" looks like an
 * option); rewrite such pairs as `--lon=-105.2` so negative numbers work as users type them.
 */
function joinNegativeNumberValues(args: readonly string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    const next = args[i + 1];
    if (a.startsWith('--') && !a.includes('=') && next !== undefined && /^-(\d|\.\d)/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

export interface Io {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
}

export async function runCli(argv: readonly string[], io: Io): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === 'help' || name === '--help' || name === '-h') {
    io.stdout(helpText());
    if (name === undefined) io.stderr('zeitlight: expected a command (the commands are listed above), e.g. zeitlight demo --out demo\n');
    return name === undefined ? 2 : 0;
  }
  if (name === '--version' || name === 'version') {
    io.stdout(`${VERSION}\n`);
    return 0;
  }
  const command: Command | undefined = COMMANDS.find((c) => c.name === name);
  try {
    if (command === undefined) throw new UsageError(`unknown command "${name}". Run "zeitlight help" for the list.`);
    let parsed;
    try {
      parsed = parseArgs({
        args: joinNegativeNumberValues(rest),
        options: { ...command.options, json: { type: 'boolean' }, help: { type: 'boolean' } },
        allowPositionals: true,
        strict: true,
        allowNegative: false,
      });
    } catch (err) {
      throw new UsageError(`${(err as Error).message}\nusage: zeitlight ${command.name} ${command.usage}`);
    }
    if (parsed.values.help === true) {
      io.stdout(`usage: zeitlight ${command.name} ${command.usage}\n${command.summary}\n`);
      return 0;
    }
    const ctx: CommandContext = {
      positionals: parsed.positionals,
      values: parsed.values,
      json: parsed.values.json === true,
      stdout: io.stdout,
      stderr: io.stderr,
    };
    return await command.run(ctx);
  } catch (err) {
    const prefix = command ? `zeitlight ${command.name}: ` : 'zeitlight: ';
    if (err instanceof CliError) {
      const msg = err.message.startsWith('zeitlight') ? err.message : prefix + err.message;
      io.stderr(msg + '\n');
      return err.exitCode;
    }
    io.stderr(`${prefix}internal error: ${(err as Error)?.stack ?? String(err)}\n`);
    return 70;
  }
}
