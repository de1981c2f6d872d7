// Names on chart axes and in legends wrapped over lines at spaces instead of cut short.

/** Splits a name into lines of at most `width` characters at spaces (a word longer than that stays whole). */
export function wrapWords(name: string, width: number): string[] {
  const lines: string[] = [];
  for (const word of name.split(/\s+/).filter((w) => w !== '')) {
    const last = lines[lines.length - 1];
    if (last !== undefined && last.length + 1 + word.length <= width) lines[lines.length - 1] = `${last} ${word}`;
    else lines.push(word);
  }
  return lines;
}
