/** A refused scene description: `field` names the offending input (e.g. "windows[1].width_m"). */
export class SceneInputError extends Error {
  readonly field: string;
  constructor(field: string, problem: string) {
    super(`${field}: ${problem}`);
    this.name = 'SceneInputError';
    this.field = field;
  }
}

export function requireFinite(field: string, value: number): number {
  if (!Number.isFinite(value)) throw new SceneInputError(field, `must be a finite number (got ${String(value)})`);
  return value;
}

export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (!(value > 0)) throw new SceneInputError(field, `must be greater than 0 (got ${value})`);
  return value;
}

export function requireFraction(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0 || value > 1) throw new SceneInputError(field, `must lie between 0 and 1 (got ${value})`);
  return value;
}

export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) throw new SceneInputError(field, `must not be negative (got ${value})`);
  return value;
}
