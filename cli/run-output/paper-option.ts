import { UsageError } from '../cli-error.js';
import { stringOption } from '../args.js';
import type { CommandContext } from '../command.js';

/** `--paper A4|Letter` for the PDF briefing; A4 when absent. */
export function paperOption(ctx: CommandContext): 'A4' | 'Letter' {
  const text = stringOption(ctx, 'paper');
  if (text === undefined) return 'A4';
  const lower = text.toLowerCase();
  if (lower === 'a4') return 'A4';
  if (lower === 'letter') return 'Letter';
  throw new UsageError(`--paper must be A4 or Letter, not "${text}"`);
}
