/**
 * Periodic-term tables of the NREL Solar Position Algorithm (Reda & Andreas 2004, Tables A4.2
 * and A4.3), parsed once from the embedded `spa_periodic_terms.csv`.
 * Earth terms: A·cos(B + C·JME). Nutation: coefficients a, b, c, d (0.0001″) and the integer
 * multipliers Y0..Y4 of the fundamental arguments X0..X4.
 */
import { datasetText } from '../data/datasets.js';

export interface EarthTerm {
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

export interface NutationTerm {
  readonly a: number;
  readonly b: number;
  readonly c: number;
  readonly d: number;
  readonly y: readonly [number, number, number, number, number];
}

export interface SpaTerms {
  /** L0..L5 (heliocentric longitude series). */
  readonly L: readonly (readonly EarthTerm[])[];
  /** B0..B1 (heliocentric latitude series). */
  readonly B: readonly (readonly EarthTerm[])[];
  /** R0..R4 (radius vector series). */
  readonly R: readonly (readonly EarthTerm[])[];
  readonly nutation: readonly NutationTerm[];
}

const DATASET = 'spa_periodic_terms.csv';
let cached: SpaTerms | undefined;

function num(cell: string | undefined, where: string): number {
  const v = Number(cell);
  if (cell === undefined || cell.trim() === '' || !Number.isFinite(v)) throw new Error(`${DATASET}: bad number at ${where}`);
  return v;
}

/** The SPA term tables; throws naming the row if the embedded table is damaged. */
export function spaTerms(): SpaTerms {
  if (cached !== undefined) return cached;
  const earth = new Map<string, EarthTerm[]>();
  const abcd: (readonly [number, number, number, number])[] = [];
  const yTerms: (readonly [number, number, number, number, number])[] = [];
  for (const raw of datasetText(DATASET).split('\n')) {
    const line = raw.trim();
    if (line === '' || line.startsWith('#') || line.startsWith('table,')) continue;
    const cells = line.split(',');
    const table = cells[0] ?? '';
    const index = num(cells[1], `${line}`);
    const where = `${table}[${index}]`;
    if (table === 'NUTATION_ABCD_ARRAY') {
      abcd[index] = [num(cells[2], where), num(cells[3], where), num(cells[4], where), num(cells[5], where)];
    } else if (table === 'NUTATION_YTERM_ARRAY') {
      yTerms[index] = [num(cells[2], where), num(cells[3], where), num(cells[4], where), num(cells[5], where), num(cells[6], where)];
    } else {
      const list = earth.get(table) ?? [];
      list[index] = { a: num(cells[2], where), b: num(cells[3], where), c: num(cells[4], where) };
      earth.set(table, list);
    }
  }
  const series = (prefix: string, count: number) =>
    Array.from({ length: count }, (_, i) => {
      const list = earth.get(`${prefix}${i}`);
      if (list === undefined || list.length === 0) throw new Error(`${DATASET}: table ${prefix}${i} missing`);
      return list;
    });
  if (abcd.length !== 63 || yTerms.length !== 63) throw new Error(`${DATASET}: expected 63 nutation terms`);
  const nutation = abcd.map((row, i) => {
    const y = yTerms[i];
    if (y === undefined) throw new Error(`${DATASET}: nutation term ${i} has no multipliers`);
    return { a: row[0], b: row[1], c: row[2], d: row[3], y };
  });
  cached = { L: series('L', 6), B: series('B', 2), R: series('R', 5), nutation };
  return cached;
}
