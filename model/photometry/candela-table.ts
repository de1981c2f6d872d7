/**
 * One typed candela table for a luminaire read from a photometric file (IES LM-63 or EULUMDAT),
 * and the typed refusal every reader throws. Pure: readers take the file's text.
 *
 * Angles (degrees) follow the file's photometry type:
 *  - type C: `horizontal` is the C angle (0–360°, counter-clockwise seen from above), `vertical`
 *    is γ (0° = nadir, 180° = zenith). EULUMDAT is always type C.
 *  - types A and B: `horizontal` is H and `vertical` is V, both −90…90°, V measured from the
 *    photometric horizontal (IES LM-63-2002 §3, "photometric horizontal").
 * Intensities are absolute candela: the file's values times its candela multiplier (LM-63) or
 * times lamp flux / 1000 and the conversion factor (EULUMDAT, which stores cd/klm).
 */

export type PhotometricFormat = 'LM-63' | 'EULUMDAT';
export type PhotometryType = 'A' | 'B' | 'C';

/**
 * How the stored horizontal planes extend to the full circle:
 *  rotational      – one plane stands for all (LM-63 last angle 0; EULUMDAT Isym 1)
 *  quadrant        – 0–90° mirrored into every quadrant (LM-63 0–90; EULUMDAT Isym 4)
 *  plane-C0-C180   – mirror about the C0–C180 plane (LM-63 0–180; EULUMDAT Isym 2)
 *  plane-C90-C270  – mirror about the C90–C270 plane (LM-63-2019 90–270; EULUMDAT Isym 3)
 *  none            – the full circle is stored (LM-63 0–360; EULUMDAT Isym 0)
 *  lateral         – types A and B: H 0–90° mirrored to −90…0° (LM-63 lateral symmetry)
 * Types A and B given from V = 0° are mirrored about the photometric horizontal (V → −V).
 */
export type HorizontalSymmetry = 'rotational' | 'quadrant' | 'plane-C0-C180' | 'plane-C90-C270' | 'lateral' | 'none';

export interface LuminousOpening_m {
  /** LM-63: width (Y), length (X), height (Z), in metres, signs kept (negative = round, LM-63-2019). EULUMDAT: luminous area width, length/diameter, and mean of the four C-plane heights. */
  readonly width_m: number;
  readonly length_m: number;
  readonly height_m: number;
}

export interface LampData {
  /** Number of lamps (LM-63 first field; EULUMDAT field 26a of the first lamp set). */
  readonly count: number;
  /** Lumens of one lamp (LM-63) or of the lamp set (EULUMDAT field 26c ÷ count); undefined for absolute photometry. */
  readonly lumensPerLamp: number | undefined;
  readonly description: string;
  /** Input watts (LM-63) or wattage including ballast (EULUMDAT field 26f). */
  readonly watts: number;
}

export interface TiltTable {
  /** LM-63 lamp-to-luminaire geometry: 1 vertical base-up/down, 2 horizontal stays horizontal, 3 horizontal tilts with the luminaire. */
  readonly geometry: number;
  readonly angles_deg: readonly number[];
  readonly factors: readonly number[];
}

export interface CandelaTable {
  readonly format: PhotometricFormat;
  /** e.g. 'LM-63-2002', 'LM-63-2019', 'EULUMDAT'. */
  readonly edition: string;
  readonly photometryType: PhotometryType;
  readonly symmetry: HorizontalSymmetry;
  /** Stored horizontal angles (C or H), increasing, degrees. */
  readonly horizontal_deg: readonly number[];
  /** Stored vertical angles (γ or V), increasing, degrees. */
  readonly vertical_deg: readonly number[];
  /** candela_cd[h][v], absolute candela. */
  readonly candela_cd: readonly (readonly number[])[];
  /** Luminaire flux the file states (lm): LM-63 lamps × lumens per lamp; EULUMDAT lamp flux × LORL. Undefined for LM-63 absolute photometry. */
  readonly statedFlux_lm: number | undefined;
  /** True when LM-63 lumens per lamp is −1 (absolute photometry: candela are the luminaire's own). */
  readonly absolutePhotometry: boolean;
  /** Candela multiplier applied (LM-63 multiplier; EULUMDAT lamp flux / 1000 × conversion factor). */
  readonly multiplier: number;
  readonly opening: LuminousOpening_m;
  readonly lamps: LampData;
  /** LM-63 ballast factor; 1 for EULUMDAT. Not applied to the candela. */
  readonly ballastFactor: number;
  readonly tilt: TiltTable | undefined;
  /** LM-63 keywords (upper case, without brackets) or EULUMDAT text fields. */
  readonly labels: Readonly<Record<string, string>>;
}

/** A refused photometric file: the 1-based line and the field that is wrong. */
export class PhotometricFileError extends Error {
  constructor(
    readonly line: number,
    readonly field: string,
    readonly reason: string,
  ) {
    super(`line ${line}, ${field}: ${reason}`);
    this.name = 'PhotometricFileError';
  }
}

/** A number token of a photometric file with the line it came from. */
export interface NumberToken {
  readonly text: string;
  readonly line: number;
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** Parses one token as a finite number or refuses it, naming line and field. */
export function parseNumber(text: string, line: number, field: string): number {
  const t = text.trim();
  if (!NUMBER.test(t)) throw new PhotometricFileError(line, field, t === '' ? 'missing value' : `"${t.slice(0, 40)}" is not a number`);
  const v = Number(t);
  if (!Number.isFinite(v)) throw new PhotometricFileError(line, field, `"${t.slice(0, 40)}" is out of range`);
  return v;
}

/** Parses an integer within [min, max] or refuses it. */
export function parseInteger(text: string, line: number, field: string, min: number, max: number): number {
  const v = parseNumber(text, line, field);
  if (!Number.isInteger(v) || v < min || v > max) throw new PhotometricFileError(line, field, `must be a whole number from ${min} to ${max} (got ${text.trim()})`);
  return v;
}

/** Largest number of angles accepted on either axis (a 0.1° grid over 360° is 3601). */
export const MAX_ANGLES = 3601;

/** Refuses angle lists that are not strictly increasing. */
export function checkIncreasing(angles: readonly number[], lines: readonly number[], field: string): void {
  for (let i = 1; i < angles.length; i++) {
    if (!((angles[i] as number) > (angles[i - 1] as number))) throw new PhotometricFileError(lines[i] ?? 0, field, `angles must increase (${angles[i - 1]} then ${angles[i]})`);
  }
}
