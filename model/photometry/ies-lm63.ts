/**
 * Reader for IES LM-63 photometric files ("IESNA LM-63-2002 Standard File Format for the
 * Electronic Transfer of Photometric Data" and its 2019 edition "ANSI/IES LM-63-19"); the
 * 1991 and 1995 first lines are accepted too. Written from the format descriptions; pure.
 *
 * Order of a file (LM-63-2002 §5):
 *   1. first line: `IESNA:LM-63-2002` (2019: `IES:LM-63-2019`)
 *   2. keyword lines `[KEYWORD] text` (`[MORE]` continues the previous keyword)
 *   3. `TILT=NONE` or `TILT=INCLUDE` (a separate tilt file name is refused: readers take one text)
 *   4. with TILT=INCLUDE: lamp-to-luminaire geometry, number of tilt angles, the angles, the
 *      multiplying factors
 *   5. number of lamps, lumens per lamp (−1 = absolute photometry), candela multiplier, number of
 *      vertical angles, number of horizontal angles, photometric type (1 = C, 2 = B, 3 = A),
 *      units type (1 = feet, 2 = metres), width, length, height of the luminous opening
 *   6. ballast factor, ballast-lamp factor (2002) / future use (2019), input watts
 *   7. vertical angles, horizontal angles, then the candela values: all vertical angles for the
 *      first horizontal angle, then for the second, …
 * From step 4 on, values are separated by blanks, commas or line ends.
 *
 * Angle ranges accepted (LM-63-2002 §5.14–5.15; LM-63-2019 adds type C horizontal 90–270):
 *   type C vertical 0–90, 90–180 or 0–180; horizontal 0 (rotational), 0–90 (quadrant),
 *   0–180 (plane C0–C180), 90–270 (plane C90–C270), 0 to more than 180 up to 360 (none);
 *   types A and B vertical −90–90 or 0–90 (mirrored), horizontal −90–90 or 0–90 (lateral).
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
  type PhotometryType,
  type TiltTable,
} from './candela-table.js';

const FEET_TO_M = 0.3048; // exact, international foot

const FIRST_LINES: readonly [RegExp, string][] = [
  [/^IES:LM-63-2019\b/i, 'LM-63-2019'],
  [/^IESNA:LM-63-2002\b/i, 'LM-63-2002'],
  [/^IESNA:LM-63-1995\b/i, 'LM-63-1995'],
  [/^IESNA91\b/i, 'LM-63-1991'],
];

/** True when the text looks like an LM-63 file (known first line, or a TILT= line). */
export function looksLikeLm63(text: string): boolean {
  const head = text.replace(/^\uFEFF/, '').slice(0, 20000);
  const first = head.split(/\r\n|\r|\n/, 1)[0] ?? '';
  return FIRST_LINES.some(([re]) => re.test(first.trim())) || /^\s*TILT\s*=/im.test(head);
}

class Tokens {
  private i = 0;
  constructor(
    private readonly tokens: readonly NumberToken[],
    private readonly lastLine: number,
  ) {}
  private take(field: string): NumberToken {
    const t = this.tokens[this.i++];
    if (t === undefined) throw new PhotometricFileError(this.lastLine, field, 'missing value: the file ends early');
    return t;
  }
  number(field: string): number {
    const t = this.take(field);
    return parseNumber(t.text, t.line, field);
  }
  integer(field: string, min: number, max: number): number {
    const t = this.take(field);
    return parseInteger(t.text, t.line, field, min, max);
  }
  /** n numbers with their lines. */
  list(n: number, field: (k: number) => string): { values: number[]; lines: number[] } {
    const values: number[] = [];
    const lines: number[] = [];
    for (let k = 0; k < n; k++) {
      const t = this.take(field(k));
      values.push(parseNumber(t.text, t.line, field(k)));
      lines.push(t.line);
    }
    return { values, lines };
  }
  line(): number {
    return this.tokens[this.i]?.line ?? this.lastLine;
  }
  rest(): NumberToken | undefined {
    return this.tokens[this.i];
  }
}

function horizontalSymmetry(type: PhotometryType, h: readonly number[], line: number): HorizontalSymmetry {
  const first = h[0] as number;
  const last = h[h.length - 1] as number;
  if (type === 'C') {
    if (first === 0 && h.length === 1) return 'rotational';
    if (first === 0 && last === 90) return 'quadrant';
    if (first === 0 && last === 180) return 'plane-C0-C180';
    if (first === 90 && last === 270) return 'plane-C90-C270';
    if (first === 0 && last > 180 && last <= 360) return 'none';
    throw new PhotometricFileError(line, 'horizontal angles', `type C horizontal angles must run 0 (alone), 0–90, 0–180, 90–270 or 0–360 (got ${first}–${last})`);
  }
  if (first === 0 && last === 90) return 'lateral';
  if (first === -90 && last === 90) return 'none';
  throw new PhotometricFileError(line, 'horizontal angles', `type ${type} horizontal angles must run −90–90 or 0–90 (got ${first}–${last})`);
}

function checkVertical(type: PhotometryType, v: readonly number[], line: number): void {
  const first = v[0] as number;
  const last = v[v.length - 1] as number;
  const ok = type === 'C' ? (first === 0 || first === 90) && (last === 90 || last === 180) && first < last : (first === -90 || first === 0) && last === 90;
  if (!ok) {
    const want = type === 'C' ? '0–90, 90–180 or 0–180' : '−90–90 or 0–90';
    throw new PhotometricFileError(line, 'vertical angles', `type ${type} vertical angles must run ${want} (got ${first}–${last})`);
  }
}

/** Reads an LM-63 file's text into a candela table, or throws PhotometricFileError. */
export function readLm63(text: string): CandelaTable {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const firstLine = (lines[0] ?? '').trim();
  const known = FIRST_LINES.find(([re]) => re.test(firstLine));
  const edition = known?.[1] ?? 'LM-63-1986';
  const labels: Record<string, string> = {};
  let tiltIndex = -1;
  let lastKey: string | undefined;
  for (let i = known === undefined ? 0 : 1; i < lines.length; i++) {
    const l = (lines[i] as string).trim();
    if (/^TILT\s*=/i.test(l)) {
      tiltIndex = i;
      break;
    }
    const kw = /^\[([^\]]+)\]\s*(.*)$/.exec(l);
    if (kw !== null) {
      const key = (kw[1] as string).toUpperCase();
      const value = (kw[2] as string).trim();
      if (key === 'MORE' && lastKey !== undefined) labels[lastKey] = `${labels[lastKey] ?? ''}\n${value}`;
      else {
        labels[key] = labels[key] === undefined ? value : `${labels[key]}\n${value}`;
        lastKey = key;
      }
    } else if (l !== '') labels.TEXT = labels.TEXT === undefined ? l : `${labels.TEXT}\n${l}`;
  }
  if (tiltIndex < 0) throw new PhotometricFileError(lines.length, 'TILT', 'no TILT= line (TILT=NONE or TILT=INCLUDE) before the photometric data');
  const tiltValue = (lines[tiltIndex] as string).trim().replace(/^TILT\s*=\s*/i, '');
  const tiltLine = tiltIndex + 1;
  if (!/^(NONE|INCLUDE)$/i.test(tiltValue)) {
    throw new PhotometricFileError(tiltLine, 'TILT', `a separate tilt file ("${tiltValue.slice(0, 60)}") cannot be read; give TILT=NONE or the tilt table inline with TILT=INCLUDE`);
  }

  const tokens: NumberToken[] = [];
  for (let i = tiltIndex + 1; i < lines.length; i++) {
    for (const t of (lines[i] as string).split(/[\s,]+/)) if (t !== '') tokens.push({ text: t, line: i + 1 });
  }
  const tk = new Tokens(tokens, lines.length);

  let tilt: TiltTable | undefined;
  if (/^INCLUDE$/i.test(tiltValue)) {
    const geometry = tk.integer('lamp-to-luminaire geometry', 1, 3);
    const n = tk.integer('number of tilt angles', 1, MAX_ANGLES);
    const a = tk.list(n, (k) => `tilt angle ${k + 1}`);
    checkIncreasing(a.values, a.lines, 'tilt angles');
    const f = tk.list(n, (k) => `tilt multiplying factor ${k + 1}`);
    f.values.forEach((v, k) => {
      if (v < 0) throw new PhotometricFileError(f.lines[k] ?? 0, `tilt multiplying factor ${k + 1}`, `must not be negative (got ${v})`);
    });
    tilt = { geometry, angles_deg: a.values, factors: f.values };
  }

  const lampCount = tk.integer('number of lamps', 1, 10_000);
  const lumensLine = tk.line();
  const lumensPerLamp = tk.number('lumens per lamp');
  if (!(lumensPerLamp > 0 || lumensPerLamp === -1)) throw new PhotometricFileError(lumensLine, 'lumens per lamp', `must be greater than 0, or −1 for absolute photometry (got ${lumensPerLamp})`);
  const multLine = tk.line();
  const multiplier = tk.number('candela multiplier');
  if (!(multiplier > 0)) throw new PhotometricFileError(multLine, 'candela multiplier', `must be greater than 0 (got ${multiplier})`);
  const nv = tk.integer('number of vertical angles', 1, MAX_ANGLES);
  const nh = tk.integer('number of horizontal angles', 1, MAX_ANGLES);
  const type = (['C', 'B', 'A'] as const)[tk.integer('photometric type', 1, 3) - 1] as PhotometryType;
  const units = tk.integer('units type', 1, 2);
  const toM = units === 1 ? FEET_TO_M : 1;
  const width = tk.number('width') * toM;
  const length = tk.number('length') * toM;
  const height = tk.number('height') * toM;
  const ballastLine = tk.line();
  const ballastFactor = tk.number('ballast factor');
  if (!(ballastFactor > 0)) throw new PhotometricFileError(ballastLine, 'ballast factor', `must be greater than 0 (got ${ballastFactor})`);
  tk.number(edition === 'LM-63-2019' ? 'future use' : 'ballast-lamp photometric factor');
  const wattsLine = tk.line();
  const watts = tk.number('input watts');
  if (watts < 0) throw new PhotometricFileError(wattsLine, 'input watts', `must not be negative (got ${watts})`);

  const v = tk.list(nv, (k) => `vertical angle ${k + 1}`);
  checkIncreasing(v.values, v.lines, 'vertical angles');
  if (type === 'C' && nv < 2) throw new PhotometricFileError(v.lines[0] ?? 0, 'vertical angles', 'need at least two vertical angles');
  checkVertical(type, v.values, v.lines[0] ?? 0);
  const h = tk.list(nh, (k) => `horizontal angle ${k + 1}`);
  checkIncreasing(h.values, h.lines, 'horizontal angles');
  const symmetry = horizontalSymmetry(type, h.values, h.lines[0] ?? 0);

  const candela: number[][] = [];
  for (let j = 0; j < nh; j++) {
    const row: number[] = [];
    for (let i = 0; i < nv; i++) {
      const field = `candela at horizontal ${h.values[j]}°, vertical ${v.values[i]}°`;
      const line = tk.line();
      const c = tk.number(field);
      if (c < 0) throw new PhotometricFileError(line, field, `must not be negative (got ${c})`);
      row.push(c * multiplier);
    }
    candela.push(row);
  }
  const extra = tk.rest();
  if (extra !== undefined) throw new PhotometricFileError(extra.line, 'end of data', `unexpected value "${extra.text.slice(0, 40)}" after the last candela value (${nh} × ${nv} expected)`);

  const absolute = lumensPerLamp === -1;
  return {
    format: 'LM-63',
    edition,
    photometryType: type,
    symmetry,
    horizontal_deg: h.values,
    vertical_deg: v.values,
    candela_cd: candela,
    statedFlux_lm: absolute ? undefined : lampCount * lumensPerLamp,
    absolutePhotometry: absolute,
    multiplier,
    opening: { width_m: width, length_m: length, height_m: height },
    lamps: { count: lampCount, lumensPerLamp: absolute ? undefined : lumensPerLamp, description: labels.LAMP ?? '', watts },
    ballastFactor,
    tilt,
    labels,
  };
}
