/**
 * Reader for EULUMDAT (.ldt) luminaire files, written from the published line-by-line
 * description of the format (A. W. Stockmar, "EULUMDAT – ein Leuchtendatenformat für den
 * europäischen Beleuchtungsplaner", Licht '90, and "EULUMDAT/2 – Extended Version of a Well
 * Established Luminaire Data Format", CIBSE National Lighting Conference 1998). Pure.
 *
 * Line order (1-based):
 *   1 company / data bank / version        2 Ityp type indicator (0–3)
 *   3 Isym symmetry indicator (0–4)        4 Mc number of C planes in 0–360°
 *   5 Dc distance between C planes         6 Ng number of intensities per C plane
 *   7 Dg distance between intensities      8 measurement report number
 *   9 luminaire name                       10 luminaire number
 *   11 file name                           12 date / user
 *   13–15 length (diameter), width, height of the luminaire, mm
 *   16–17 length (diameter), width of the luminous area, mm (width 0 = round)
 *   18–21 height of the luminous area in the C0, C90, C180, C270 planes, mm
 *   22 downward flux fraction DFF %        23 light output ratio LORL %
 *   24 conversion factor for intensities   25 tilt during measurement, degrees
 *   26 n, number of standard lamp sets; then, n lines each: 26a number of lamps, 26b lamp
 *      type, 26c total lamp flux (lm), 26d colour appearance, 26e colour rendering, 26f watts
 *   27 ten direct ratios (room indices 0.6 … 5)
 *   28 Mc C angles, 29 Ng γ angles, 30 intensities in cd per 1000 lm of lamp flux, plane by
 *      plane, γ ascending within a plane, for the planes Isym stores:
 *      Isym 0: all Mc planes; 1: one plane; 2: C0–C180 (Mc/2 + 1 planes);
 *      3: the planes Mc1 = 3·Mc/4 + 1 to Mc2 = Mc1 + Mc/2 (1-based, counted on past C360), i.e.
 *      C270 through C0 to C90; 4: C0–C90 (Mc/4 + 1 planes).
 *      Isym 3 planes are kept as their mirror images about the C90–C270 plane (C → 180 − C),
 *      so the table holds C90–C270 like an LM-63 file with that symmetry; every direction has
 *      the same intensity.
 * One value a line is the format; from field 27 on, values split across or joined on lines are
 * accepted. A decimal comma is read as a point (common practice in files from German sources).
 * Candela = value × lamp flux of the first set / 1000 × conversion factor; the stated luminaire
 * flux = first set's lamp flux × LORL / 100.
 */
import {
  checkIncreasing,
  MAX_ANGLES,
  parseInteger,
  parseNumber,
  PhotometricFileError,
  type CandelaTable,
  type HorizontalSymmetry,
  type NumberToken,
} from './candela-table.js';

const SYMMETRY: readonly HorizontalSymmetry[] = ['none', 'rotational', 'plane-C0-C180', 'plane-C90-C270', 'quadrant'];
const MAX_LAMP_SETS = 20;

/** Reads an EULUMDAT file's text into a candela table, or throws PhotometricFileError. */
export function readEulumdat(text: string): CandelaTable {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const at = (n: number, field: string): string => {
    const l = lines[n - 1];
    if (l === undefined) throw new PhotometricFileError(n, field, 'missing line: the file ends early');
    return l.trim();
  };
  const num = (n: number, field: string): number => parseNumber(at(n, field).replace(',', '.'), n, field);
  const int = (n: number, field: string, min: number, max: number): number => parseInteger(at(n, field), n, field, min, max);

  at(1, 'company identification');
  const ityp = int(2, 'Ityp (type indicator)', 0, 3);
  const isym = int(3, 'Isym (symmetry indicator)', 0, 4);
  const mc = int(4, 'Mc (number of C planes)', 1, MAX_ANGLES);
  num(5, 'Dc (distance between C planes)');
  const ng = int(6, 'Ng (number of intensities per C plane)', 2, MAX_ANGLES);
  num(7, 'Dg (distance between intensities)');
  const labels: Record<string, string> = {
    company: at(1, 'company identification'),
    report: at(8, 'measurement report number'),
    name: at(9, 'luminaire name'),
    number: at(10, 'luminaire number'),
    file: at(11, 'file name'),
    date: at(12, 'date / user'),
    ityp: String(ityp),
  };
  const mm = (n: number, field: string): number => {
    const v = num(n, field);
    if (v < 0) throw new PhotometricFileError(n, field, `must not be negative (got ${v})`);
    return v / 1000;
  };
  mm(13, 'length of luminaire');
  mm(14, 'width of luminaire');
  mm(15, 'height of luminaire');
  const areaLength = mm(16, 'length of luminous area');
  const areaWidth = mm(17, 'width of luminous area');
  const heights = [mm(18, 'height of luminous area C0'), mm(19, 'height of luminous area C90'), mm(20, 'height of luminous area C180'), mm(21, 'height of luminous area C270')];
  num(22, 'DFF (downward flux fraction)');
  const lorl = num(23, 'LORL (light output ratio)');
  if (!(lorl >= 0 && lorl <= 100)) throw new PhotometricFileError(23, 'LORL (light output ratio)', `must be from 0 to 100 % (got ${lorl})`);
  const conversion = num(24, 'conversion factor');
  if (!(conversion > 0)) throw new PhotometricFileError(24, 'conversion factor', `must be greater than 0 (got ${conversion})`);
  num(25, 'tilt during measurement');
  const sets = int(26, 'n (number of lamp sets)', 1, MAX_LAMP_SETS);
  const setLine = (field: number, k: number) => 27 + field * sets + k;
  const lampCount = int(setLine(0, 0), 'number of lamps (set 1)', 1, 10_000);
  const lampType = at(setLine(1, 0), 'type of lamps (set 1)');
  const lampFlux = num(setLine(2, 0), 'total lamp flux (set 1)');
  if (!(lampFlux > 0)) throw new PhotometricFileError(setLine(2, 0), 'total lamp flux (set 1)', `must be greater than 0 lm (got ${lampFlux})`);
  for (let k = 0; k < sets; k++) {
    int(setLine(0, k), `number of lamps (set ${k + 1})`, 1, 10_000);
    at(setLine(1, k), `type of lamps (set ${k + 1})`);
    num(setLine(2, k), `total lamp flux (set ${k + 1})`);
    at(setLine(3, k), `colour appearance (set ${k + 1})`);
    at(setLine(4, k), `colour rendering (set ${k + 1})`);
  }
  const watts = num(setLine(5, 0), 'wattage including ballast (set 1)');
  for (let k = 1; k < sets; k++) num(setLine(5, k), `wattage including ballast (set ${k + 1})`);
  labels.colour = at(setLine(3, 0), 'colour appearance (set 1)');
  labels.colour_rendering = at(setLine(4, 0), 'colour rendering (set 1)');

  const tokens: NumberToken[] = [];
  for (let i = 27 + 6 * sets; i <= lines.length; i++) {
    for (const t of (lines[i - 1] as string).split(/[\s;]+/)) if (t !== '') tokens.push({ text: t.replace(',', '.'), line: i });
  }
  let ti = 0;
  const take = (field: string): { value: number; line: number } => {
    const t = tokens[ti++];
    if (t === undefined) throw new PhotometricFileError(lines.length, field, 'missing value: the file ends early');
    return { value: parseNumber(t.text, t.line, field), line: t.line };
  };
  for (let k = 0; k < 10; k++) take(`direct ratio ${k + 1}`);
  const cAngles: number[] = [];
  const cLines: number[] = [];
  for (let k = 0; k < mc; k++) {
    const t = take(`C angle ${k + 1}`);
    cAngles.push(t.value);
    cLines.push(t.line);
  }
  checkIncreasing(cAngles, cLines, 'C angles');
  const gAngles: number[] = [];
  const gLines: number[] = [];
  for (let k = 0; k < ng; k++) {
    const t = take(`γ angle ${k + 1}`);
    gAngles.push(t.value);
    gLines.push(t.line);
  }
  checkIncreasing(gAngles, gLines, 'γ angles');
  if (!((gAngles[0] as number) >= 0 && (gAngles[ng - 1] as number) <= 180)) throw new PhotometricFileError(gLines[0] ?? 0, 'γ angles', `must lie within 0–180° (got ${gAngles[0]}–${gAngles[ng - 1]})`);
  if (!((cAngles[0] as number) >= 0 && (cAngles[mc - 1] as number) < 360)) throw new PhotometricFileError(cLines[0] ?? 0, 'C angles', `must lie within 0–360° (360 excluded; got ${cAngles[0]}–${cAngles[mc - 1]})`);

  // Planes stored for each Isym (indices into the C angles, wrapping past C360) and the angles they must span.
  let indices = cAngles.map((_, k) => k);
  let span: [number, number] | undefined;
  if (isym >= 2) {
    const div = isym === 2 ? 2 : 4;
    if (mc % div !== 0) throw new PhotometricFileError(4, 'Mc (number of C planes)', `Isym ${isym} needs Mc divisible by ${div} (got ${mc})`);
    const first = isym === 3 ? (3 * mc) / 4 : 0;
    const count = isym === 4 ? mc / 4 + 1 : mc / 2 + 1;
    indices = Array.from({ length: count }, (_, k) => (first + k) % mc);
    span = isym === 2 ? [0, 180] : isym === 3 ? [270, 90] : [0, 90];
  }
  const fileAngles = isym === 1 ? [0] : indices.map((k) => cAngles[k] as number);
  if (span !== undefined && (fileAngles[0] !== span[0] || fileAngles[fileAngles.length - 1] !== span[1])) {
    throw new PhotometricFileError(cLines[indices[0] as number] ?? 0, 'C angles', `Isym ${isym} stores the planes C${span[0]} to C${span[1]}, but the C angles give ${fileAngles[0]} to ${fileAngles[fileAngles.length - 1]}`);
  }
  if (isym === 0 && cAngles[0] !== 0) throw new PhotometricFileError(cLines[0] ?? 0, 'C angles', `the first C plane must be C0 (got ${cAngles[0]})`);

  const scale = (lampFlux / 1000) * conversion;
  const rows: number[][] = [];
  for (const c of fileAngles) {
    const row: number[] = [];
    for (let i = 0; i < ng; i++) {
      const field = `intensity at C${c}, γ ${gAngles[i]}°`;
      const t = take(field);
      if (t.value < 0) throw new PhotometricFileError(t.line, field, `must not be negative (got ${t.value})`);
      row.push(t.value * scale);
    }
    rows.push(row);
  }
  const extra = tokens[ti];
  if (extra !== undefined) throw new PhotometricFileError(extra.line, 'end of data', `unexpected value "${extra.text.slice(0, 40)}" after the last intensity (${fileAngles.length} planes × ${ng} expected for Isym ${isym})`);
  // Isym 3: C270 … C0 … C90 mirrored (C → 180 − C) to C270 … C180 … C90, then put in increasing order.
  const stored = isym === 3 ? fileAngles.map((c) => (((180 - c) % 360) + 360) % 360).reverse() : fileAngles;
  const candela = isym === 3 ? rows.reverse() : rows;

  return {
    format: 'EULUMDAT',
    edition: 'EULUMDAT',
    photometryType: 'C',
    symmetry: SYMMETRY[isym] as HorizontalSymmetry,
    horizontal_deg: stored,
    vertical_deg: gAngles,
    candela_cd: candela,
    statedFlux_lm: (lampFlux * lorl) / 100,
    absolutePhotometry: false,
    multiplier: scale,
    opening: { width_m: areaWidth, length_m: areaLength, height_m: heights.reduce((a, b) => a + b, 0) / 4 },
    lamps: { count: lampCount, lumensPerLamp: lampFlux / lampCount, description: lampType, watts },
    ballastFactor: 1,
    tilt: undefined,
    labels,
  };
}
