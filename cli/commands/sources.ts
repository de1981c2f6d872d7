/** `zeitlight sources` — the built-in light-source and filter library with CCT and melanopic DER. */
import type { Command, CommandContext } from '../command.js';
import { positionals } from '../args.js';
import { HEALTH_CAUTION, printJson } from '../output.js';
import { listFilters } from '../../model/sources/filters.js';
import { listSources, PARAMETERISED_SOURCE_FORMS } from '../../model/sources/source-library.js';

/** Plain-text table; columns listed in `right` are right-aligned (numbers), the rest left-aligned. */
function textTable(header: readonly string[], rows: readonly (readonly string[])[], right: ReadonlySet<number>): string {
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => (r[j] ?? '').length)));
  const line = (cells: readonly string[]) =>
    cells.map((c, j) => (right.has(j) ? c.padStart(widths[j] ?? 0) : c.padEnd(widths[j] ?? 0))).join('  ').trimEnd();
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n') + '\n';
}

export const sourcesCommand: Command = {
  name: 'sources',
  summary: 'List the built-in light sources (CCT, melanopic DER) and spectral filters',
  usage: '[--json]',
  options: {},
  async run(ctx: CommandContext): Promise<number> {
    positionals(ctx, []);
    const sources = listSources();
    const filters = listFilters();
    if (ctx.json) {
      printJson(ctx, { sources, parameterised_forms: PARAMETERISED_SOURCE_FORMS, filters, caution: HEALTH_CAUTION });
      return 0;
    }
    const rows = sources.map((s) => [s.id, s.kind, s.cct_K.toFixed(0), s.duv.toFixed(4), s.melanopic_der.toFixed(3), s.parametric ? 'parametric' : 'published', s.name]);
    ctx.stdout(textTable(['id', 'kind', 'CCT (K)', 'Duv', 'mel DER', 'data', 'name'], rows, new Set([2, 3, 4])));
    ctx.stdout(`\nParameterised ids (any value): ${PARAMETERISED_SOURCE_FORMS.join(', ')}\n\nFilters (for --filter; all parametric):\n`);
    ctx.stdout(textTable(['id', 'kind', 'description'], filters.map((f) => [f.id, f.kind, f.description]), new Set()));
    ctx.stdout(`\n${HEALTH_CAUTION}\n`);
    return 0;
  },
};
