/**
 * Correlated colour temperature of daylight components, to pick a CIE D-series spectrum
 * (`cieDaylightSpectrum`). No single published rule exists; this rule is COMMON PRACTICE, with
 * values from memory of the usual ranges (Wyszecki & Stiles, "Color Science", 2nd ed., daylight
 * chapter; Hernández-Andrés et al. 2001, JOSA A 18(6):1325 — both from memory, not re-checked):
 *  - direct sun: ≈ 5700 K at high elevation, reddening toward the horizon. We interpolate in
 *    mired (10⁶/T) from 5700 K at ≥ 40° to 4000 K at ≤ 5°; 4000 K is also the lower end of the
 *    D-series, so a horizon sun (really ≈ 2000–3000 K) is represented too blue.
 *  - sky (diffuse) light: 6500 K under overcast (Perez ε < 1.2), ≈ 11000 K from a clear blue
 *    sky (ε ≥ 4.5), mired-linear in ε between; the same rule holds in twilight.
 *  - ground-reflected and global light: mix the component spectra by illuminance
 *    (`daylightMixSpectrum`) rather than mixing CCTs.
 */
import { scaleToIlluminance } from '../photometry/alpha-opic.js';
import { addSpectra, type Spectrum } from '../photometry/spectrum.js';
import { cieDaylightSpectrum } from '../sources/cie-daylight.js';

export const SUN_CCT_HIGH_K = 5700;
export const SUN_CCT_LOW_K = 4000;
export const SKY_CCT_OVERCAST_K = 6500;
export const SKY_CCT_CLEAR_K = 11000;

const mired = (k: number) => 1e6 / k;
const fromMired = (m: number) => 1e6 / m;
const clamp01 = (x: number) => Math.max(0, Math.min(1, x));

/** CCT (K) of direct sunlight at solar elevation e (deg). */
export function sunCct_K(sunElevation_deg: number): number {
  const s = clamp01((sunElevation_deg - 5) / (40 - 5));
  return fromMired(mired(SUN_CCT_LOW_K) + s * (mired(SUN_CCT_HIGH_K) - mired(SUN_CCT_LOW_K)));
}

/** CCT (K) of skylight for Perez clearness ε. */
export function skyCct_K(clearness: number): number {
  const s = clamp01((clearness - 1.2) / (4.5 - 1.2));
  return fromMired(mired(SKY_CCT_OVERCAST_K) + s * (mired(SKY_CCT_CLEAR_K) - mired(SKY_CCT_OVERCAST_K)));
}

/** Spectral irradiance of daylight parts, each a D-series spectrum scaled to its illuminance (lx). */
export function daylightMixSpectrum(parts: readonly { readonly illuminance_lx: number; readonly cct_K: number }[]): Spectrum {
  const spectra = parts.filter((p) => p.illuminance_lx > 0).map((p) => scaleToIlluminance(cieDaylightSpectrum(p.cct_K), p.illuminance_lx));
  if (spectra.length === 0) return scaleToIlluminance(cieDaylightSpectrum(6500), 0);
  return addSpectra(...spectra);
}
