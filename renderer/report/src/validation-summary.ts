// Validation for the briefing, read from the project's validation records (docs/validation/*.md):
//  - the plain-language page (docs/validation/summary.md): what was checked, against which
//    published data, how close it came, and where the models fall short — printed as the
//    briefing's "How these numbers were checked";
//  - per technical record: its title and number of checks (table rows under a
//    "| what | source | tolerance | result |" header), for the count the page gives.
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

export interface PlainCheck {
  readonly what: string;
  readonly against: string;
  readonly close: string;
  /** The detailed record the figures come from (file name in docs/validation). */
  readonly record: string;
}

export interface PlainValidation {
  readonly checks: readonly PlainCheck[];
  /** "Where the models fall short", one plain sentence each. */
  readonly shortfalls: readonly string[];
}

/** The plain-language validation page: its table ("| what was checked | against published data | how close | record |") and the list under "Where the models fall short". */
export function plainValidation(text: string): PlainValidation {
  const lines = text.split(/\r?\n/);
  const checks: PlainCheck[] = [];
  let inTable = false;
  for (const line of lines) {
    if (!line.trim().startsWith('|')) {
      inTable = false;
      continue;
    }
    const row = cells(line);
    if (!inTable) {
      inTable = (row[0] ?? '').toLowerCase() === 'what was checked';
      continue;
    }
    if (row.every((c) => /^:?-+:?$/.test(c))) continue;
    checks.push({ what: plainText(row[0] ?? ''), against: plainText(row[1] ?? ''), close: plainText(row[2] ?? ''), record: row[3] ?? '' });
  }
  const shortfalls: string[] = [];
  const at = lines.findIndex((l) => /^##\s+where the models fall short/i.test(l));
  if (at >= 0) {
    let item: string | null = null;
    for (const line of lines.slice(at + 1)) {
      if (/^#/.test(line)) break;
      if (/^\s*-\s+/.test(line)) {
        if (item !== null) shortfalls.push(plainText(item));
        item = line.replace(/^\s*-\s+/, '');
      } else if (item !== null && line.trim() !== '') item += ` ${line.trim()}`;
      else if (item !== null) {
        shortfalls.push(plainText(item));
        item = null;
      }
    }
    if (item !== null) shortfalls.push(plainText(item));
  }
  return { checks, shortfalls };
}
