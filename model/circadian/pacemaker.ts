/**
 * Common shape of the light-driven circadian pacemakers (Process P + Process L). Each model
 * owns the first `stateSize` entries of the simulation state vector: its oscillator variables
 * followed by n of Process L. Native light input: photopic lux of the calibration source.
 */
import type { ProcessLParams } from './process-l.js';

/**
 * Oscillator family: which published equations the state variables belong to. Pieces written
 * in one family's letters (melatonin synthesis angles: x⁷; HCL sleep thresholds: cubic; KSS
 * circadian drive: x⁷) use the raw state for that family and a carried-over phase otherwise.
 */
export type OscillatorFamily = 'x7' | 'cubic' | 'macroscopic';

/** How the daily phase marker of a model is found. */
export type MarkerRule =
  | { readonly kind: 'x-min'; readonly cbtminOffset_h: number }
  | { readonly kind: 'angle'; readonly angle_rad: number; readonly cbtminOffset_h: number };

export interface PersonParams {
  /** Intrinsic (free-running, darkness) period, h. Default: the model's own. */
  readonly tau_h?: number;
  /**
   * Light-sensitivity multiplier (dimensionless, default 1). It scales the native-lux input
   * before Process L, I_eff = s · I, i.e. it shifts the whole illuminance–response curve along
   * the lux axis by a factor s (s = 2: a person responds to 100 lx as the average person to 200 lx).
   */
  readonly lightSensitivity?: number;
}

export interface Pacemaker {
  readonly id: string;
  readonly label: string;
  readonly source: string;
  readonly oscillator: OscillatorFamily;
  readonly stateNames: readonly string[];
  readonly stateSize: number;
  /** Index of n (Process L) in the state. */
  readonly nIndex: number;
  readonly processL: ProcessLParams;
  /** Published parameters of the oscillator, with units in the names where they have one. */
  readonly parameters: Readonly<Record<string, number>>;
  readonly tau_h: number;
  /** Per-person light-sensitivity multiplier on the native-lux input (PersonParams). */
  readonly lightSensitivity: number;
  readonly marker: MarkerRule;
  /** A state on or near the limit cycle, used to seed entrainment. */
  readonly seedState: readonly number[];
  /**
   * Writes the pacemaker derivatives (per hour) into dydt[0..stateSize) for native light I
   * (already gated by sleep and scaled by light sensitivity). Returns B̂ for downstream use.
   */
  derivatives(y: ArrayLike<number>, I_lx: number, dydt: number[]): number;
  /** Phase angle (rad) that decreases with time (clockwise in the (x, xc) plane). */
  angle(y: ArrayLike<number>): number;
  /** Amplitude (√(x² + xc²), or R). */
  amplitude(y: ArrayLike<number>): number;
}
