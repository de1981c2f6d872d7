import { UsageError } from './cli-error.js';
import type { CommandContext } from './command.js';

/** A string option, or undefined when absent. */
export function stringOption(ctx: CommandContext, name: string): string | undefined {
  const v = ctx.values[name];
  if (v === undefined) return undefined;
  if (typeof v !== 'string') throw new UsageError(`--${name} needs a value`);
  return v;
}

/** A finite number option; the message names the option and the bad text. */
export function numberOption(ctx: CommandContext, name: string): number | undefined {
  const text = stringOption(ctx, name);
  if (text === undefined) return undefined;
  const n = Number(text);
  if (text.trim() === '' || !Number.isFinite(n)) throw new UsageError(`--${name}: "${text}" is not a number`);
  return n;
}

export function requiredNumberOption(ctx: CommandContext, name: string): number {
  const n = numberOption(ctx, name);
  if (n === undefined) throw new UsageError(`--${name} is required`);
  return n;
}

/** Exactly `count` positional arguments, described by `names` for the message. */
export function positionals(ctx: CommandContext, names: readonly string[]): string[] {
  if (ctx.positionals.length !== names.length) {
    throw new UsageError(`expected ${names.map((n) => `<${n}>`).join(' ') || 'no arguments'}, got ${ctx.positionals.length} argument(s)`);
  }
  return [...ctx.positionals];
}
