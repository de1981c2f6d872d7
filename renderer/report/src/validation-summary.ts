// Validation summary for the briefing, read from the project's validation records
// (docs/validation/*.md): each record's title, its number of checks (table rows under a
// "| what | source | tolerance | result |" header) and a few checks quoted as written.
export interface ValidationCheck {
  readonly what: string;
  readonly source: string;
  readonly result: string;
}

export interface ValidationRecordSummary {
  readonly file: string;
  readonly title: string;
  readonly checks: number;
  readonly examples: readonly ValidationCheck[];
}

function cells(line: string): string[] {
  return line
    .trim()
    .replace(/^\|/, '')
    .replace(/\|$/, '')
    .split(/(?<!\\)\|/)
    .map((c) => c.trim());
}

/** Removes Markdown emphasis and code marks for print. */
export function plainText(markdown: string): string {
  return markdown.replace(/\*\*([^*]+)\*\*/g, '$1').replace(/`([^`]+)`/g, '$1').replace(/\\\|/g, '|');
}

export function summariseValidationRecord(file: string, text: string, examples = 3): ValidationRecordSummary {
  const lines = text.split(/\r?\n/);
  const title = plainText((lines.find((l) => l.startsWith('# ')) ?? file).replace(/^#\s+/, '')).replace(/\s*[—:-]\s*validation record$/i, '').replace(/^validation record:\s*/i, '');
  const titled = title.charAt(0).toUpperCase() + title.slice(1);
  const found: ValidationCheck[] = [];
  let columns: string[] | null = null;
  let count = 0;
  for (const line of lines) {
    if (!line.trim().startsWith('|')) {
      columns = null;
      continue;
    }
    const row = cells(line);
    if (columns === null) {
      const lower = row.map((c) => c.toLowerCase());
      if (lower[0] === 'what' && lower.some((c) => c.startsWith('result'))) columns = lower;
      continue;
    }
    if (row.every((c) => /^:?-+:?$/.test(c))) continue;
    count += 1;
    const at = (name: string) => row[columns?.findIndex((c) => c.startsWith(name)) ?? -1] ?? '';
    if (found.length < examples) found.push({ what: plainText(at('what')), source: plainText(at('source')), result: plainText(at('result')) });
  }
  return { file, title: titled, checks: count, examples: found };
}
