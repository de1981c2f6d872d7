import type { CommandContext } from './command.js';

/** Prints one JSON document (two-space indent, trailing newline). */
export function printJson(ctx: CommandContext, value: unknown): void {
  ctx.stdout(JSON.stringify(value, null, 2) + '\n');
}

/** Right-aligned plain-text table for human output. */
export function formatTable(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => (r[j] ?? '').length)));
  const line = (cells: readonly string[]) =>
    cells.map((c, j) => (j === 0 ? c.padEnd(widths[j] ?? 0) : c.padStart(widths[j] ?? 0))).join('  ');
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n') + '\n';
}

export const HEALTH_CAUTION =
  'Caution: model estimates for planning and comparing lighting options, not diagnosis or treatment. ' +
  'People differ widely. Follow local codes, lighting standards and photobiological safety limits; ' +
  'consult qualified clinicians for any therapeutic use of light.';
