/**
 * Response of the eye-level quantities to one source spectrum, per photopic lux of the source as
 * it would arrive without filters: photopic lux after the filters (glazing, eyewear) and the five
 * CIE S 026 α-opic EDIs after the filters. Computed once per spectrum and filter combination, so
 * per-minute work is a multiplication (EDI_α = E_v · DER_α, CIE S 026:2018).
 */
import { ALPHA_OPIC_KEYS } from '../photometry/action-spectra.js';
import { alphaOpicQuantities, photopicIlluminance_lx } from '../photometry/alpha-opic.js';
import { applyTransmittance, type Spectrum, type Transmittance } from '../photometry/spectrum.js';
import { GRID_LENGTH } from '../photometry/wavelength-grid.js';
import { cieDaylightSpectrum, DAYLIGHT_CCT_MAX_K, DAYLIGHT_CCT_MIN_K } from '../sources/cie-daylight.js';

/** [photopic lux, sc, mc, lc, rh, mel EDI] per unfiltered photopic lux. */
export type SourceResponse = Float64Array;

export const RESPONSE_LENGTH = 1 + ALPHA_OPIC_KEYS.length;

export function sourceResponse(source: Spectrum, filters: readonly Transmittance[]): SourceResponse {
  const ev0 = photopicIlluminance_lx(source);
  if (!(ev0 > 0)) throw new Error('source spectrum has no photopic content (380–780 nm)');
  let s = source;
  for (const f of filters) s = applyTransmittance(s, f);
  const q = alphaOpicQuantities(s);
  const out = new Float64Array(RESPONSE_LENGTH);
  out[0] = q.illuminance_lx / ev0;
  ALPHA_OPIC_KEYS.forEach((k, i) => {
    out[i + 1] = q.alpha_opic[k].edi_lx / ev0;
  });
  return out;
}

/** CIE daylight responses by CCT, rounded to `step_K` and cached (daylight CCT changes slowly). */
export class DaylightResponses {
  private readonly cache = new Map<number, SourceResponse>();
  private lastCct = Number.NaN;
  private last: SourceResponse | undefined;
  constructor(
    private readonly filters: readonly Transmittance[],
    private readonly step_K = 100,
  ) {}

  at(cct_K: number): SourceResponse {
    if (cct_K === this.lastCct && this.last !== undefined) return this.last;
    const c = Math.min(DAYLIGHT_CCT_MAX_K, Math.max(DAYLIGHT_CCT_MIN_K, Number.isFinite(cct_K) ? cct_K : 6504));
    const key = Math.round(c / this.step_K) * this.step_K;
    let r = this.cache.get(key);
    if (r === undefined) {
      r = sourceResponse(cieDaylightSpectrum(key), this.filters);
      this.cache.set(key, r);
    }
    this.lastCct = cct_K;
    this.last = r;
    return r;
  }
}

/** A flat (spectrally neutral) transmittance, e.g. a glazing known only by τ_v. */
export function flatTransmittance(value: number, label: string): Transmittance {
  return { values: new Float64Array(GRID_LENGTH).fill(value), label };
}
