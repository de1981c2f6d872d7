/** "Did you mean …?" suggestions for misspelt field names, identifiers and time-zone names. */

/** Edit distance (Levenshtein, case-insensitive). */
export function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let prev = row[0] ?? 0;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const tmp = row[j] ?? 0;
      row[j] = Math.min((row[j] ?? 0) + 1, (row[j - 1] ?? 0) + 1, prev + (a[i - 1]?.toLowerCase() === b[j - 1]?.toLowerCase() ? 0 : 1));
      prev = tmp;
    }
  }
  return row[b.length] ?? 0;
}

/** The closest candidate, when it is close enough to be a likely misspelling. */
export function nearest(key: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestD = Infinity;
  for (const c of candidates) {
    // A field written without its unit suffix (latitude for latitude_deg) counts as a near miss.
    const d = c.toLowerCase().startsWith(key.toLowerCase() + '_') ? 1 : editDistance(key, c);
    if (d < bestD) {
      bestD = d;
      best = c;
    }
  }
  return best !== undefined && bestD <= Math.max(2, Math.floor(key.length / 3)) ? best : undefined;
}

/** "Did you mean "x"? " or "". */
export function didYouMean(key: string, candidates: Iterable<string>): string {
  const guess = nearest(key, candidates);
  return guess === undefined ? '' : `Did you mean "${guess}"? `;
}

/** Time-zone names the runtime knows (empty where Intl cannot list them). */
export function knownTimeZones(): readonly string[] {
  try {
    return Intl.supportedValuesOf('timeZone');
  } catch {
    return [];
  }
}
