/**
 * Fast α-opic DER of CIE D-series daylight by CCT, for per-minute use. A table of the five
 * DERs of cieDaylightSpectrum (unrounded M1, M2) is computed once at every 0.5 mired
 * (mired = 1e6/CCT) from 40 mired (25 000 K) to 250 mired (4000 K) and interpolated linearly
 * in mired, in which the DER varies smoothly. The interpolation error against a direct
 * computation is bounded in tests (daylight-der.test.ts).
 */
import { alphaOpicDer } from '../photometry/alpha-opic.js';
import { ALPHA_OPIC_KEYS, type AlphaOpicKey } from '../photometry/action-spectra.js';
import { cieDaylightSpectrum, DAYLIGHT_CCT_MAX_K, DAYLIGHT_CCT_MIN_K } from './cie-daylight.js';

const MIRED_MIN = 1e6 / DAYLIGHT_CCT_MAX_K; // 40
const MIRED_MAX = 1e6 / DAYLIGHT_CCT_MIN_K; // 250
const MIRED_STEP = 0.5;
const COUNT = Math.round((MIRED_MAX - MIRED_MIN) / MIRED_STEP) + 1;

let table: Record<AlphaOpicKey, Float64Array> | undefined;

function derTable(): Record<AlphaOpicKey, Float64Array> {
  if (table === undefined) {
    const t = { sc: new Float64Array(COUNT), mc: new Float64Array(COUNT), lc: new Float64Array(COUNT), rh: new Float64Array(COUNT), mel: new Float64Array(COUNT) };
    for (let i = 0; i < COUNT; i++) {
      const mired = Math.min(MIRED_MIN + i * MIRED_STEP, MIRED_MAX);
      const der = alphaOpicDer(cieDaylightSpectrum(1e6 / mired));
      for (const k of ALPHA_OPIC_KEYS) t[k][i] = der[k];
    }
    table = t;
  }
  return table;
}

export interface DaylightDerOptions {
  /** Clamp CCTs outside 4000–25 000 K to the nearest end instead of throwing. */
  readonly clamp?: boolean;
}

function position(cct_K: number, options: DaylightDerOptions): { i: number; frac: number } {
  let cct = cct_K;
  if (!(cct >= DAYLIGHT_CCT_MIN_K && cct <= DAYLIGHT_CCT_MAX_K)) {
    if (options.clamp !== true || Number.isNaN(cct)) {
      throw new RangeError(`daylight CCT ${cct_K} K is outside the CIE D-series range ${DAYLIGHT_CCT_MIN_K}–${DAYLIGHT_CCT_MAX_K} K`);
    }
    cct = Math.min(Math.max(cct, DAYLIGHT_CCT_MIN_K), DAYLIGHT_CCT_MAX_K);
  }
  const x = (1e6 / cct - MIRED_MIN) / MIRED_STEP;
  const i = Math.min(Math.floor(x), COUNT - 2);
  return { i, frac: x - i };
}

/** Melanopic DER of CIE daylight at `cct_K` (table lookup). */
export function daylightMelanopicDer(cct_K: number, options: DaylightDerOptions = {}): number {
  const { i, frac } = position(cct_K, options);
  const col = derTable().mel;
  return (col[i] as number) + frac * ((col[i + 1] as number) - (col[i] as number));
}

/** All five α-opic DERs of CIE daylight at `cct_K` (table lookup). */
export function daylightAlphaOpicDer(cct_K: number, options: DaylightDerOptions = {}): Readonly<Record<AlphaOpicKey, number>> {
  const { i, frac } = position(cct_K, options);
  const t = derTable();
  const at = (k: AlphaOpicKey) => (t[k][i] as number) + frac * ((t[k][i + 1] as number) - (t[k][i] as number));
  return { sc: at('sc'), mc: at('mc'), lc: at('lc'), rh: at('rh'), mel: at('mel') };
}
